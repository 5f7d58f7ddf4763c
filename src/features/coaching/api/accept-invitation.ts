import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { AcceptedInvitation } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

export type { AcceptedInvitation };

/** POST /api/invitations/:token/accept → the squad joined. 409 used/expired/withdrawn, 403 wrong e-mail or role. */
export function acceptInvitation(token: string): Promise<AcceptedInvitation> {
  return api.post<AcceptedInvitation>(apiPaths.invitationAccept(token));
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // The join page shows why it did not work.
    meta: { errorToast: false },
    onSettled: (_data, _error, token) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: coachingKeys.invitationPreview(token) }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.assignments() }),
      ]),
  });
}
