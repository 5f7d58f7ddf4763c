// Every resource router, in one list. A new resource adds one line here.
import type { Router } from "express";
import type { RouterDeps } from "../deps";
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

export function apiRouters(deps: RouterDeps): Router[] {
  const routers = [healthRoutes(deps), meRoutes(deps), readsRoutes(deps)];
  routers.push(squadRoutes(deps));
  routers.push(invitationRoutes(deps));
  routers.push(ladderRoutes(deps));
  routers.push(assignmentRoutes(deps));
  routers.push(coachRoutes(deps));
  routers.push(greensRoutes(deps));
  routers.push(sessionsRoutes(deps));
  routers.push(puttsRoutes(deps));
  routers.push(roundsRoutes(deps));
  routers.push(statsRoutes(deps));
  routers.push(csvRoutes(deps));
  routers.push(trainingRoutes(deps));
  routers.push(makeProbabilityRoutes(deps));
  routers.push(heightMapRoutes(deps));
  routers.push(notesRoutes(deps));
  routers.push(practicePlanRoutes(deps));
  routers.push(adminRoutes(deps));
  if (deps.smtpFake) routers.push(devRoutes(deps));
  return routers;
}
