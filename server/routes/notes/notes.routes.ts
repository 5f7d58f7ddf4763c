import { Router } from "express";
import { noteInputSchema } from "../../../shared/schemas/notes";
import type { AppDeps } from "../../deps";
import { requireRole, requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { addNote, listNotes } from "./notes.handlers";

export function notesRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  router.get("/players/:playerId/notes", requireUser, listNotes(db));
  router.post("/players/:playerId/notes", requireRole("coach", "admin"), validateBody(noteInputSchema), addNote(db));
  return router;
}
