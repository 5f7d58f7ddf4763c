import { Router } from "express";
import { adoptPlanInputSchema, practicePlanQuerySchema, startPlanInputSchema } from "../../../shared/schemas/practice-plan";
import type { AppDeps } from "../../deps";
import { requireRole, requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { adoptPracticePlan, getPracticePlan, startPracticePlan } from "./practice-plan.handlers";

export function practicePlanRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/practice-plan", requireUser, validateQuery(practicePlanQuerySchema), getPracticePlan(db));
  router.post("/practice-plan/start", requireUser, validateBody(startPlanInputSchema), startPracticePlan(db));
  router.post("/practice-plan/adopt", requireRole("coach", "admin"), validateBody(adoptPlanInputSchema), adoptPracticePlan(db));
  return router;
}
