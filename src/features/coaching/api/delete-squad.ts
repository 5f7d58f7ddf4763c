import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** DELETE /api/squads/:id → 204. Members and invitations go; assignments stay with their players. */
export function deleteSquad(id: string): Promise<void> {
  return api.delete<void>(apiPaths.squad(id));
}

export function useDeleteSquad() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteSquad,
    onSuccess: (_void, id) => {
      queryClient.removeQueries({ queryKey: coachingKeys.squad(id) });
      return queryClient.invalidateQueries({ queryKey: coachingKeys.all });
    },
  });
}
