import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Round, RoundInput } from "#shared/schemas/rounds";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** POST /api/rounds → 201 with the round (holes may follow one by one). */
export function createRound(input: RoundInput): Promise<Round> {
  return api.post<Round>(apiPaths.rounds, input);
}

export function useCreateRound() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRound,
    meta: { errorToast: false },
    onSuccess: (round) => {
      queryClient.setQueryData(practiceKeys.round(round.id), round);
      return queryClient.invalidateQueries({ queryKey: practiceKeys.rounds() });
    },
  });
}
