// The route table: every resource's routes, in one list. A new resource adds one line here; a route is declared
// with its schemas by defineRoute (server/lib/route.ts) in its resource's <resource>.routes.ts.
import type { Router } from "express";
import type { RouterDeps } from "../deps";
import { routerOf, type RouteDef } from "../lib/route";
import { assignmentRoutes } from "./assignments/assignments.routes";
import { coachRoutes } from "./coach/coach.routes";
import { csvRoutes } from "./csv/csv.routes";
import { invitationRoutes } from "./invitations/invitations.routes";
import { ladderRoutes } from "./ladders/ladders.routes";
import { makeProbabilityRoutes } from "./make-probability/make-probability.routes";
import { squadRoutes } from "./squads/squads.routes";
import { devRoutes } from "./dev/dev.routes";
import { greensRoutes } from "./greens/greens.routes";
import { healthRoutes } from "./health/health.routes";
import { heightMapRoutes } from "./height-maps/height-maps.routes";
import { meRoutes } from "./me/me.routes";
import { notesRoutes } from "./notes/notes.routes";
import { adminRoutes } from "./admin/admin.routes";
import { practicePlanRoutes } from "./practice-plan/practice-plan.routes";
import { puttsRoutes } from "./putts/putts.routes";
import { readsRoutes } from "./reads/reads.routes";
import { roundsRoutes } from "./rounds/rounds.routes";
import { sessionsRoutes } from "./sessions/sessions.routes";
import { statsRoutes } from "./stats/stats.routes";
import { trainingRoutes } from "./training/training.routes";

/** Every /api route with its schemas (paths below /api), in the order Express matches them. */
export function apiRoutes(deps: RouterDeps): RouteDef[] {
  return [
    ...healthRoutes(deps),
    ...meRoutes(deps),
    ...readsRoutes(deps),
    ...squadRoutes(deps),
    ...invitationRoutes(deps),
    ...ladderRoutes(deps),
    ...assignmentRoutes(deps),
    ...coachRoutes(deps),
    ...greensRoutes(deps),
    ...sessionsRoutes(deps),
    ...puttsRoutes(deps),
    ...roundsRoutes(deps),
    ...statsRoutes(deps),
    ...csvRoutes(deps),
    ...trainingRoutes(deps),
    ...makeProbabilityRoutes(deps),
    ...heightMapRoutes(deps),
    ...notesRoutes(deps),
    ...practicePlanRoutes(deps),
    ...adminRoutes(deps),
    ...(deps.smtpFake ? devRoutes(deps) : []),
  ];
}

/** One router for the table. Outside production every answer is checked against its schema (lib/route.ts). */
export function apiRouter(routes: RouteDef[], checkResponses: boolean): Router {
  return routerOf(routes, { checkResponses });
}
