import {
  baselineSchema,
  compareQuerySchema,
  compareSchema,
  makeRatesQuerySchema,
  makeRatesSchema,
  missesQuerySchema,
  missesSchema,
  sessionStatsQuerySchema,
  sessionStatsSchema,
  trendQuerySchema,
  trendSchema,
} from "../../../shared/schemas/stats";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { requireUser } from "../../middleware/session";
import { baseline, compare, makeRates, misses, sessionStats, trend } from "./stats.handlers";

const user = [requireUser];

export function statsRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute(
      { method: "get", path: "/stats/make-rates", use: user, query: makeRatesQuerySchema, response: makeRatesSchema },
      makeRates(db),
    ),
    defineRoute({ method: "get", path: "/stats/trend", use: user, query: trendQuerySchema, response: trendSchema }, trend(db)),
    defineRoute({ method: "get", path: "/stats/compare", use: user, query: compareQuerySchema, response: compareSchema }, compare(db)),
    defineRoute({ method: "get", path: "/stats/baseline", use: user, response: baselineSchema }, baseline),
    defineRoute(
      { method: "get", path: "/stats/sessions", use: user, query: sessionStatsQuerySchema, response: sessionStatsSchema },
      sessionStats(db),
    ),
    defineRoute({ method: "get", path: "/stats/misses", use: user, query: missesQuerySchema, response: missesSchema }, misses(db)),
  ];
}
