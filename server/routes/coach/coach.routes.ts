import { Router } from "express";
import type { AppDeps } from "../../deps";
import { requireRole } from "../../middleware/session";
import { squadOverviewQuerySchema } from "../../../shared/schemas/squads";
import { validateQuery } from "../../middleware/validate";
import { exportSquadOverview, getCoachedPlayer, getSquadOverview, listCoachedPlayers, listSquadAssignments } from "./coach.handlers";

const coach = requireRole("coach", "admin");

export function coachRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/coach/players", coach, listCoachedPlayers(db));
  router.get("/coach/players/:playerId", coach, getCoachedPlayer(db));
  router.get("/coach/squads/:id/assignments", coach, listSquadAssignments(db));
  router.get("/coach/squads/:id/overview", coach, validateQuery(squadOverviewQuerySchema), getSquadOverview(db));
  router.get("/coach/squads/:id/overview/export", coach, validateQuery(squadOverviewQuerySchema), exportSquadOverview(db));
  return router;
}
