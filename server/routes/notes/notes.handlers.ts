import type { z } from "zod";
import { desc, eq } from "drizzle-orm";
import { noteInputSchema, type PlayerNote } from "../../../shared/schemas/notes";
import { playerIdSchema } from "../../../shared/schemas/sessions";
import type { Db } from "../../db/client";
import { playerNotes, user } from "../../db/schema";
import { notFound } from "../../lib/http-error";
import { targetPlayerId } from "../../lib/player-access";
import { currentUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import type { Ctx } from "../../lib/route";

/** A player reads the notes left on them; their coach and an admin read them too (player-access rule). */
export function listNotes(db: Db) {
  return async ({ req }: Ctx) => {
    const viewer = currentUser(req);
    const playerId = await targetPlayerId(db, viewer, parseOrThrow(playerIdSchema, req.params.playerId, "playerId"));
    const rows = await db
      .select({
        id: playerNotes.id,
        playerId: playerNotes.playerId,
        authorId: playerNotes.authorId,
        authorName: user.name,
        body: playerNotes.body,
        createdAt: playerNotes.createdAt,
      })
      .from(playerNotes)
      .innerJoin(user, eq(user.id, playerNotes.authorId))
      .where(eq(playerNotes.playerId, playerId))
      .orderBy(desc(playerNotes.createdAt), desc(playerNotes.id));
    const notes: PlayerNote[] = rows.map((r) => ({
      id: r.id,
      playerId: r.playerId,
      author: { id: r.authorId, name: r.authorName },
      body: r.body,
      createdAt: r.createdAt.toISOString(),
    }));
    return { notes };
  };
}

/** A coach (or an admin) leaves a dated note on a player of their squads; anyone else's player is a 404. */
export function addNote(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof noteInputSchema>>) => {
    const viewer = currentUser(req);
    const asked = parseOrThrow(playerIdSchema, req.params.playerId, "playerId");
    // A note is for a player from someone else: a coach's own id is not one of their players.
    if (asked === viewer.id) throw notFound("That player");
    const playerId = await targetPlayerId(db, viewer, asked);
    const { body: text } = body;
    const [row] = await db.insert(playerNotes).values({ playerId, authorId: viewer.id, body: text }).returning();
    const note: PlayerNote = {
      id: row!.id,
      playerId,
      author: { id: viewer.id, name: viewer.name },
      body: row!.body,
      createdAt: row!.createdAt.toISOString(),
    };
    return note;
  };
}
