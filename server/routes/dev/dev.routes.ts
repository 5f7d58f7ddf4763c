import { Router } from "express";
import type { AppDeps } from "../../deps";
import { requireRole } from "../../middleware/session";

/**
 * The local SMTP fake's mailbox (no SMTP_URL set): every e-mail the server sent, reset links included, so only
 * a signed-in admin may read it, in every mode.
 */
export function devRoutes({ smtpFake }: AppDeps) {
  const router = Router();
  router.get("/dev/mail", requireRole("admin"), (_req, res) => {
    res.json({ messages: [...(smtpFake?.messages ?? [])].reverse() });
  });
  return router;
}
