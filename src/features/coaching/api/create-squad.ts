import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Squad, SquadInput } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/squads → 201 with the squad. */
export function createSquad(input: SquadInput): Promise<Squad> {
  return api.post<Squad>(apiPaths.squads, input);
}

export function useCreateSquad() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSquad,
    // The form shows its own failure.
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
  });
}
