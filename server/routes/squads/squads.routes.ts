import { Router } from "express";
import { squadInputSchema, squadPatchSchema } from "../../../shared/schemas/squads";
import type { AppDeps } from "../../deps";
import { requireRole, requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { createSquad, deleteSquad, getSquad, leaveSquad, listSquads, removeMember, updateSquad } from "./squads.handlers";

const coach = requireRole("coach", "admin");

export function squadRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.post("/squads", coach, validateBody(squadInputSchema), createSquad(db));
  router.get("/squads", requireUser, listSquads(db));
  router.get("/squads/:id", coach, getSquad(db));
  router.patch("/squads/:id", coach, validateBody(squadPatchSchema), updateSquad(db));
  router.delete("/squads/:id", coach, deleteSquad(db));
  router.delete("/squads/:id/members/:playerId", coach, removeMember(db));
  router.post("/squads/:id/leave", requireUser, leaveSquad(db));
  return router;
}
