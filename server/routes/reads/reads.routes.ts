import { idSchema } from "../../../shared/schemas/common";
import {
  chartRequestSchema,
  chartResponseSchema,
  readRequestSchema,
  readResponseSchema,
  savedReadListSchema,
  savedReadSchema,
  saveReadSchema,
} from "../../../shared/schemas/reads";
import { z } from "zod";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { limiter } from "../../middleware/rate-limit";
import { requireUser } from "../../middleware/session";
import { chart, deleteRead, listReads, saveRead, solve } from "./reads.handlers";

const idParams = z.object({ id: idSchema });

/** The read calculator is public (a golfer on the course needs no account) and rate-limited; saving needs one. */
export function readsRoutes({ database, config }: AppDeps) {
  const db = database.db;
  const readLimit = limiter(config.rateLimits.reads, "read");
  return [
    defineRoute({ method: "post", path: "/reads/solve", use: [readLimit], body: readRequestSchema, response: readResponseSchema }, solve),
    defineRoute({ method: "post", path: "/reads/chart", use: [readLimit], body: chartRequestSchema, response: chartResponseSchema }, chart),
    defineRoute({ method: "get", path: "/reads", use: [requireUser], response: savedReadListSchema }, listReads(db)),
    defineRoute(
      { method: "post", path: "/reads", use: [requireUser], body: saveReadSchema, response: savedReadSchema, status: 201 },
      saveRead(db),
    ),
    defineRoute({ method: "delete", path: "/reads/:id", use: [requireUser], params: idParams, response: noContent }, deleteRead(db)),
  ];
}
