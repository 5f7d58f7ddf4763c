import {
  dispersionQuerySchema,
  dispersionResponseSchema,
  makeProbabilityRequestSchema,
  makeProbabilityResponseSchema,
} from "../../../shared/schemas/make-probability";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { limiter } from "../../middleware/rate-limit";
import { requireUser } from "../../middleware/session";
import { getDispersion, postMakeProbability } from "./make-probability.handlers";

/** A player's dispersion from their own putts, and the Monte Carlo make probability of a read (CPU-bound: rate-limited). */
export function makeProbabilityRoutes({ database, config }: AppDeps) {
  const readLimit = limiter(config.rateLimits.reads, "make-probability");
  return [
    defineRoute(
      {
        method: "get",
        path: "/players/me/dispersion",
        use: [requireUser],
        query: dispersionQuerySchema,
        response: dispersionResponseSchema,
      },
      getDispersion(database.db),
    ),
    defineRoute(
      {
        method: "post",
        path: "/reads/make-probability",
        use: [requireUser, readLimit],
        body: makeProbabilityRequestSchema,
        response: makeProbabilityResponseSchema,
      },
      postMakeProbability(database.db),
    ),
  ];
}
