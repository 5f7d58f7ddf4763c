import { coachedPlayerSchema, coachedPlayersSchema, squadAssignmentsSchema } from "../../../shared/schemas/assignments";
import { squadOverviewQuerySchema, squadOverviewSchema } from "../../../shared/schemas/squads";
import type { AppDeps } from "../../deps";
import { csvFile, defineRoute } from "../../lib/route";
import { requireRole } from "../../middleware/session";
import { exportSquadOverview, getCoachedPlayer, getSquadOverview, listCoachedPlayers, listSquadAssignments } from "./coach.handlers";

const coach = [requireRole("coach", "admin")];

export function coachRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute({ method: "get", path: "/coach/players", use: coach, response: coachedPlayersSchema }, listCoachedPlayers(db)),
    defineRoute({ method: "get", path: "/coach/players/:playerId", use: coach, response: coachedPlayerSchema }, getCoachedPlayer(db)),
    defineRoute(
      { method: "get", path: "/coach/squads/:id/assignments", use: coach, response: squadAssignmentsSchema },
      listSquadAssignments(db),
    ),
    defineRoute(
      { method: "get", path: "/coach/squads/:id/overview", use: coach, query: squadOverviewQuerySchema, response: squadOverviewSchema },
      getSquadOverview(db),
    ),
    defineRoute(
      { method: "get", path: "/coach/squads/:id/overview/export", use: coach, query: squadOverviewQuerySchema, response: csvFile },
      exportSquadOverview(db),
    ),
  ];
}
