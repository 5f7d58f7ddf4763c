import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { HoleBody, Round } from "#shared/schemas/rounds";
import { apiPaths } from "../../../config/paths";
import { api, ApiError } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

export type HoleInput = HoleBody & { holeNumber: number };

/** PUT /api/rounds/:id/holes/:n (creates or replaces that hole) → the round with new totals. */
export function putHole(roundId: string, { holeNumber, ...body }: HoleInput): Promise<Round> {
  return api.put<Round>(apiPaths.roundHole(roundId, holeNumber), body);
}

export function useSaveHole(roundId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (hole: HoleInput) => putHole(roundId, hole),
    // Holes go in one by one and in order; a lost connection is tried again (PUT is idempotent).
    scope: { id: `round:${roundId}` },
    networkMode: "offlineFirst",
    retry: (n, error) => error instanceof ApiError && (error.status === 0 || error.status >= 500) && n < 5,
    onSuccess: (round) => {
      queryClient.setQueryData(practiceKeys.round(roundId), round);
      return queryClient.invalidateQueries({ queryKey: practiceKeys.rounds(), refetchType: "none" });
    },
  });
}
