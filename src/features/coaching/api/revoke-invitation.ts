import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** DELETE /api/invitations/:id → 204: the link stops working. */
export function revokeInvitation({ id }: { id: string; squadId: string }): Promise<void> {
  return api.delete<void>(apiPaths.invitation(id));
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: (_void, { squadId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: coachingKeys.invitations(squadId) }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
      ]),
  });
}
