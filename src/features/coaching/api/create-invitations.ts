import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Invitation } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api, ApiError } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/squads/:id/invitations {email} → 201 {invitation, link}; the server e-mails the link and gives it to the coach. */
export function createInvitation(squadId: string, email: string): Promise<{ invitation: Invitation; link: string }> {
  return api.post<{ invitation: Invitation; link: string }>(apiPaths.squadInvitations(squadId), { email });
}

export type InviteOutcome = { email: string; ok: true; link: string } | { email: string; ok: false; message: string };

/** Invites each address in turn; one refusal (already a member, a bad address) does not stop the rest. */
export async function createInvitations({ squadId, emails }: { squadId: string; emails: string[] }): Promise<InviteOutcome[]> {
  const outcomes: InviteOutcome[] = [];
  for (const email of emails) {
    try {
      const { link } = await createInvitation(squadId, email);
      outcomes.push({ email, ok: true, link });
    } catch (error) {
      const message = error instanceof ApiError ? (error.fields.email ?? error.message) : "Could not send this invitation.";
      outcomes.push({ email, ok: false, message });
    }
  }
  return outcomes;
}

export function useCreateInvitations() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitations,
    meta: { errorToast: false },
    onSettled: (_data, _error, { squadId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: coachingKeys.invitations(squadId) }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
      ]),
  });
}
