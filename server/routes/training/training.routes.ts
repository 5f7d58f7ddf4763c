import { Router } from "express";
import { createAttemptSchema, listAttemptsQuerySchema } from "../../../shared/schemas/training";
import type { AppDeps } from "../../deps";
import { requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { createAttempt, listAttempts } from "./training.handlers";

/** Read training history: anyone may train in the browser; keeping attempts needs an account. */
export function trainingRoutes({ database }: AppDeps) {
  const router = Router();
  router.post("/training/attempts", requireUser, validateBody(createAttemptSchema), createAttempt(database.db));
  router.get("/training/attempts", requireUser, validateQuery(listAttemptsQuerySchema), listAttempts(database.db));
  return router;
}
