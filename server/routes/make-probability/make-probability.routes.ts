import { Router } from "express";
import { dispersionQuerySchema, makeProbabilityRequestSchema } from "../../../shared/schemas/make-probability";
import type { AppDeps } from "../../deps";
import { limiter } from "../../middleware/rate-limit";
import { requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { getDispersion, postMakeProbability } from "./make-probability.handlers";

/** A player's dispersion from their own putts, and the Monte Carlo make probability of a read (CPU-bound: rate-limited). */
export function makeProbabilityRoutes({ database, config }: AppDeps) {
  const router = Router();
  const readLimit = limiter(config.rateLimits.reads, "make-probability");
  router.get("/players/me/dispersion", requireUser, validateQuery(dispersionQuerySchema), getDispersion(database.db));
  router.post("/reads/make-probability", requireUser, readLimit, validateBody(makeProbabilityRequestSchema), postMakeProbability(database.db));
  return router;
}
