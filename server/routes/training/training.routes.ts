import {
  attemptListSchema,
  createAttemptResponseSchema,
  createAttemptSchema,
  listAttemptsQuerySchema,
} from "../../../shared/schemas/training";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { requireUser } from "../../middleware/session";
import { createAttempt, listAttempts } from "./training.handlers";

/** Read training history: anyone may train in the browser; keeping attempts needs an account. */
export function trainingRoutes({ database }: AppDeps) {
  return [
    defineRoute(
      {
        method: "post",
        path: "/training/attempts",
        use: [requireUser],
        body: createAttemptSchema,
        response: createAttemptResponseSchema,
        status: 201,
      },
      createAttempt(database.db),
    ),
    defineRoute(
      { method: "get", path: "/training/attempts", use: [requireUser], query: listAttemptsQuerySchema, response: attemptListSchema },
      listAttempts(database.db),
    ),
  ];
}
