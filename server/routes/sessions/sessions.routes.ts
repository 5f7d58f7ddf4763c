import { Router } from "express";
import { sessionInputSchema, sessionListQuerySchema, sessionPatchSchema } from "../../../shared/schemas/sessions";
import type { AppDeps } from "../../deps";
import { requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { createSession, deleteSession, getSession, listSessions, updateSession } from "./sessions.handlers";

export function sessionsRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/sessions", requireUser, validateQuery(sessionListQuerySchema), listSessions(db));
  router.post("/sessions", requireUser, validateBody(sessionInputSchema), createSession(db));
  router.get("/sessions/:id", requireUser, getSession(db));
  router.patch("/sessions/:id", requireUser, validateBody(sessionPatchSchema), updateSession(db));
  router.delete("/sessions/:id", requireUser, deleteSession(db));
  return router;
}
