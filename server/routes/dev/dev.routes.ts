import { Router } from "express";
import type { AppDeps } from "../../deps";

/** Development only: the local SMTP fake's mailbox, so sign-up and invitation e-mails can be read. */
export function devRoutes({ smtpFake }: AppDeps) {
  const router = Router();
  router.get("/dev/mail", (_req, res) => {
    res.json({ messages: [...(smtpFake?.messages ?? [])].reverse() });
  });
  return router;
}
