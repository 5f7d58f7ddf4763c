import { z } from "zod";
import { timestampSchema } from "./common";
import { text } from "./text";

export const NOTE_MAX = 2000;

/** POST /api/players/:playerId/notes — a coach's note on a player of their squads. */
export const noteInputSchema = z
  .object({ body: text({ max: NOTE_MAX, min: 1, minMessage: "Write something first", multiline: true }) })
  .strict();
export type NoteInput = z.infer<typeof noteInputSchema>;

export const playerNoteSchema = z.object({
  id: z.string(),
  playerId: z.string(),
  author: z.object({ id: z.string(), name: z.string() }),
  body: z.string(),
  createdAt: timestampSchema,
});
export type PlayerNote = z.output<typeof playerNoteSchema>;
export const playerNoteListSchema = z.object({ notes: z.array(playerNoteSchema) });
