import { Router } from "express";
import { greenInputSchema, greenPatchSchema, greenShareSchema, stimpReadingInputSchema } from "../../../shared/schemas/greens";
import type { AppDeps } from "../../deps";
import { requireRole, requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import {
  addStimpReading,
  createGreen,
  deleteGreen,
  deleteStimpReading,
  getGreen,
  listGreens,
  shareGreen,
  updateGreen,
} from "./greens.handlers";

export function greensRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/greens", requireUser, listGreens(db));
  router.post("/greens", requireUser, validateBody(greenInputSchema), createGreen(db));
  router.get("/greens/:id", requireUser, getGreen(db));
  router.patch("/greens/:id", requireUser, validateBody(greenPatchSchema), updateGreen(db));
  router.delete("/greens/:id", requireUser, deleteGreen(db));
  // Only a coach has squads to share with (an admin too, for their own greens and squads).
  router.put("/greens/:id/squad", requireRole("coach", "admin"), validateBody(greenShareSchema), shareGreen(db));
  router.post("/greens/:id/stimp-readings", requireUser, validateBody(stimpReadingInputSchema), addStimpReading(db));
  router.delete("/greens/:id/stimp-readings/:readingId", requireUser, deleteStimpReading(db));
  return router;
}
