import { Router } from "express";
import { compareQuerySchema, makeRatesQuerySchema, missesQuerySchema, sessionStatsQuerySchema, trendQuerySchema } from "../../../shared/schemas/stats";
import type { AppDeps } from "../../deps";
import { requireUser } from "../../middleware/session";
import { validateQuery } from "../../middleware/validate";
import { baseline, compare, makeRates, misses, sessionStats, trend } from "./stats.handlers";

export function statsRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/stats/make-rates", requireUser, validateQuery(makeRatesQuerySchema), makeRates(db));
  router.get("/stats/trend", requireUser, validateQuery(trendQuerySchema), trend(db));
  router.get("/stats/compare", requireUser, validateQuery(compareQuerySchema), compare(db));
  router.get("/stats/baseline", requireUser, baseline);
  router.get("/stats/sessions", requireUser, validateQuery(sessionStatsQuerySchema), sessionStats(db));
  router.get("/stats/misses", requireUser, validateQuery(missesQuerySchema), misses(db));
  return router;
}
