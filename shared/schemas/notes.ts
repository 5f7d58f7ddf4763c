import { z } from "zod";
import { text } from "./text";

export const NOTE_MAX = 2000;

/** POST /api/players/:playerId/notes — a coach's note on a player of their squads. */
export const noteInputSchema = z
  .object({ body: text({ max: NOTE_MAX, min: 1, minMessage: "Write something first", multiline: true }) })
  .strict();
export type NoteInput = z.infer<typeof noteInputSchema>;

export type PlayerNote = { id: string; playerId: string; author: { id: string; name: string }; body: string; createdAt: string };
