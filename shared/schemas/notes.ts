import { z } from "zod";

export const NOTE_MAX = 2000;

/** POST /api/players/:playerId/notes — a coach's note on a player of their squads. */
export const noteInputSchema = z
  .object({ body: z.string().trim().min(1, "Write something first").max(NOTE_MAX, `At most ${NOTE_MAX} characters`) })
  .strict();
export type NoteInput = z.infer<typeof noteInputSchema>;

export type PlayerNote = { id: string; playerId: string; author: { id: string; name: string }; body: string; createdAt: string };
