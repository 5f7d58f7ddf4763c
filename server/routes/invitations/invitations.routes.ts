import {
  acceptedInvitationSchema,
  invitationInputSchema,
  invitationListSchema,
  invitationPreviewSchema,
  sentInvitationSchema,
} from "../../../shared/schemas/squads";
import type { RouterDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireRole, requireUser } from "../../middleware/session";
import {
  acceptInvitation,
  createInvitation,
  listInvitations,
  previewInvitation,
  resendInvitation,
  revokeInvitation,
} from "./invitations.handlers";

const coach = [requireRole("coach", "admin")];

export function invitationRoutes(deps: RouterDeps) {
  const db = deps.database.db;
  return [
    defineRoute(
      {
        method: "post",
        path: "/squads/:id/invitations",
        use: coach,
        body: invitationInputSchema,
        after: [deps.mail.byAccount, deps.mail.byRecipient],
        response: sentInvitationSchema,
        status: 201,
      },
      createInvitation(deps),
    ),
    defineRoute({ method: "get", path: "/squads/:id/invitations", use: coach, response: invitationListSchema }, listInvitations(db)),
    defineRoute({ method: "delete", path: "/invitations/:id", use: coach, response: noContent }, revokeInvitation(db)),
    defineRoute(
      { method: "post", path: "/invitations/:id/resend", use: coach, response: sentInvitationSchema, status: 201 },
      resendInvitation(deps),
    ),
    // Public on purpose: the token itself is the secret, and the join page needs it before sign-in.
    defineRoute({ method: "get", path: "/invitations/:token", response: invitationPreviewSchema }, previewInvitation(db)),
    defineRoute(
      { method: "post", path: "/invitations/:token/accept", use: [requireUser], response: acceptedInvitationSchema },
      acceptInvitation(db),
    ),
  ];
}
