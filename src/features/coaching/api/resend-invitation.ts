import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Invitation } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/invitations/:id/resend → 201: a new link is e-mailed (and returned); the old one stops working. */
export function resendInvitation({ id }: { id: string; squadId: string }): Promise<{ invitation: Invitation; link: string }> {
  return api.post<{ invitation: Invitation; link: string }>(apiPaths.invitationResend(id));
}

export function useResendInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSuccess: (_r, { squadId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: coachingKeys.invitations(squadId) }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
      ]),
  });
}
