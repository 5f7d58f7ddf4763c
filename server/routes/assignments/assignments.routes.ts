import { Router } from "express";
import { assignInputSchema, ladderPuttInputSchema } from "../../../shared/schemas/assignments";
import type { RouterDeps } from "../../deps";
import { requireRole, requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { addLadderPutt, createAssignments, getAssignment, listMyAssignments, undoLastLadderPutt } from "./assignments.handlers";

export function assignmentRoutes(deps: RouterDeps) {
  const db = deps.database.db;
  const router = Router();
  router.post("/ladders/:id/assignments", requireRole("coach", "admin"), validateBody(assignInputSchema), deps.mail.byAccount, createAssignments(deps));
  router.get("/assignments", requireUser, listMyAssignments(db));
  router.get("/assignments/:id", requireUser, getAssignment(db));
  router.post("/assignments/:id/putts", requireUser, validateBody(ladderPuttInputSchema), addLadderPutt(db));
  router.delete("/assignments/:id/putts/last", requireUser, undoLastLadderPutt(db));
  return router;
}
