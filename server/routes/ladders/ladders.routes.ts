import { Router } from "express";
import { ladderCopySchema, ladderInputSchema } from "../../../shared/schemas/ladders";
import type { AppDeps } from "../../deps";
import { requireRole } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { copyLadder, createLadder, deleteLadder, getLadder, listLadders, updateLadder } from "./ladders.handlers";

const coach = requireRole("coach", "admin");

export function ladderRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.post("/ladders", coach, validateBody(ladderInputSchema), createLadder(db));
  router.get("/ladders", coach, listLadders(db));
  router.get("/ladders/:id", coach, getLadder(db));
  router.put("/ladders/:id", coach, validateBody(ladderInputSchema), updateLadder(db));
  router.delete("/ladders/:id", coach, deleteLadder(db));
  router.post("/ladders/:id/copy", coach, validateBody(ladderCopySchema), copyLadder(db));
  return router;
}
