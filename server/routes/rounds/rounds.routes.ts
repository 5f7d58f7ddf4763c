import { Router } from "express";
import { holeBodySchema, roundInputSchema, roundListQuerySchema } from "../../../shared/schemas/rounds";
import type { AppDeps } from "../../deps";
import { requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { createRound, deleteRound, getRound, listRounds, putHole } from "./rounds.handlers";

export function roundsRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/rounds", requireUser, validateQuery(roundListQuerySchema), listRounds(db));
  router.post("/rounds", requireUser, validateBody(roundInputSchema), createRound(db));
  router.get("/rounds/:id", requireUser, getRound(db));
  router.delete("/rounds/:id", requireUser, deleteRound(db));
  router.put("/rounds/:id/holes/:n", requireUser, validateBody(holeBodySchema), putHole(db));
  return router;
}
