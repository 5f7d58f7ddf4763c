import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** DELETE /api/squads/:id/members/:playerId → 204. */
export function removeMember({ squadId, playerId }: { squadId: string; playerId: string }): Promise<void> {
  return api.delete<void>(apiPaths.squadMember(squadId, playerId));
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.coach() }),
      ]),
  });
}
