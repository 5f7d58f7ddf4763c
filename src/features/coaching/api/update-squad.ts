import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Squad, SquadPatch } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** PATCH /api/squads/:id → the squad. */
export function updateSquad({ id, patch }: { id: string; patch: SquadPatch }): Promise<Squad> {
  return api.patch<Squad>(apiPaths.squad(id), patch);
}

export function useUpdateSquad() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSquad,
    meta: { errorToast: false },
    onSuccess: (squad) => {
      queryClient.setQueryData(coachingKeys.squad(squad.id), squad);
      return queryClient.invalidateQueries({ queryKey: coachingKeys.squads() });
    },
  });
}
