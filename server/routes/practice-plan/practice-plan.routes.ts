import {
  adoptPlanInputSchema,
  adoptPlanResponseSchema,
  practicePlanQuerySchema,
  practicePlanResponseSchema,
  startPlanInputSchema,
  startPlanResponseSchema,
} from "../../../shared/schemas/practice-plan";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { requireRole, requireUser } from "../../middleware/session";
import { adoptPracticePlan, getPracticePlan, startPracticePlan } from "./practice-plan.handlers";

export function practicePlanRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute(
      { method: "get", path: "/practice-plan", use: [requireUser], query: practicePlanQuerySchema, response: practicePlanResponseSchema },
      getPracticePlan(db),
    ),
    defineRoute(
      {
        method: "post",
        path: "/practice-plan/start",
        use: [requireUser],
        body: startPlanInputSchema,
        response: startPlanResponseSchema,
        status: 201,
      },
      startPracticePlan(db),
    ),
    defineRoute(
      {
        method: "post",
        path: "/practice-plan/adopt",
        use: [requireRole("coach", "admin")],
        body: adoptPlanInputSchema,
        response: adoptPlanResponseSchema,
        status: 201,
      },
      adoptPracticePlan(db),
    ),
  ];
}
