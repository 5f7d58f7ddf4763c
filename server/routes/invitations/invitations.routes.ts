import { Router } from "express";
import { invitationInputSchema } from "../../../shared/schemas/squads";
import type { RouterDeps } from "../../deps";
import { requireRole, requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { acceptInvitation, createInvitation, listInvitations, previewInvitation, resendInvitation, revokeInvitation } from "./invitations.handlers";

const coach = requireRole("coach", "admin");

export function invitationRoutes(deps: RouterDeps) {
  const db = deps.database.db;
  const router = Router();
  router.post("/squads/:id/invitations", coach, validateBody(invitationInputSchema), deps.mail.byAccount, deps.mail.byRecipient, createInvitation(deps));
  router.get("/squads/:id/invitations", coach, listInvitations(db));
  router.delete("/invitations/:id", coach, revokeInvitation(db));
  router.post("/invitations/:id/resend", coach, resendInvitation(deps));
  // Public on purpose: the token itself is the secret, and the join page needs it before sign-in.
  router.get("/invitations/:token", previewInvitation(db));
  router.post("/invitations/:token/accept", requireUser, acceptInvitation(db));
  return router;
}
