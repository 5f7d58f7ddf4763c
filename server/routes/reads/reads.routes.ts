import { Router } from "express";
import { chartRequestSchema, readRequestSchema, saveReadSchema } from "../../../shared/schemas/reads";
import type { AppDeps } from "../../deps";
import { limiter } from "../../middleware/rate-limit";
import { requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { chart, deleteRead, listReads, saveRead, solve } from "./reads.handlers";

/** The read calculator is public (a golfer on the course needs no account) and rate-limited; saving needs one. */
export function readsRoutes({ database, config }: AppDeps) {
  const router = Router();
  const readLimit = limiter(config.rateLimits.reads, "read");
  router.post("/reads/solve", readLimit, validateBody(readRequestSchema), solve);
  router.post("/reads/chart", readLimit, validateBody(chartRequestSchema), chart);
  router.get("/reads", requireUser, listReads(database.db));
  router.post("/reads", requireUser, validateBody(saveReadSchema), saveRead(database.db));
  router.delete("/reads/:id", requireUser, deleteRead(database.db));
  return router;
}
