import { noteInputSchema, playerNoteListSchema, playerNoteSchema } from "../../../shared/schemas/notes";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { requireRole, requireUser } from "../../middleware/session";
import { addNote, listNotes } from "./notes.handlers";

export function notesRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute({ method: "get", path: "/players/:playerId/notes", use: [requireUser], response: playerNoteListSchema }, listNotes(db)),
    defineRoute(
      {
        method: "post",
        path: "/players/:playerId/notes",
        use: [requireRole("coach", "admin")],
        body: noteInputSchema,
        response: playerNoteSchema,
        status: 201,
      },
      addNote(db),
    ),
  ];
}
