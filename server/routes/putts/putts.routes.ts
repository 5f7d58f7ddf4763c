import { Router } from "express";
import { puttInputSchema, puttListQuerySchema } from "../../../shared/schemas/putts";
import type { AppDeps } from "../../deps";
import { requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { addPutt, deletePutt, getPutt, listPutts, listSessionPutts } from "./putts.handlers";

export function puttsRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.post("/sessions/:id/putts", requireUser, validateBody(puttInputSchema), addPutt(db));
  router.get("/sessions/:id/putts", requireUser, listSessionPutts(db));
  router.get("/putts", requireUser, validateQuery(puttListQuerySchema), listPutts(db));
  router.get("/putts/:id", requireUser, getPutt(db));
  router.delete("/putts/:id", requireUser, deletePutt(db));
  return router;
}
