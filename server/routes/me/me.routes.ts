import { Router } from "express";
import { preferencesSchema } from "../../../shared/schemas/me";
import type { AppDeps } from "../../deps";
import { requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { getMe, updatePreferences } from "./me.handlers";

export function meRoutes({ database }: AppDeps) {
  const router = Router();
  // Open to everyone: signed out it answers { user: null } (no 401 in the console of every signed-out page).
  router.get("/me", getMe(database.db));
  router.patch("/me/preferences", requireUser, validateBody(preferencesSchema), updatePreferences(database.db));
  return router;
}
