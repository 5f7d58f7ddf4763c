// Who may see what in coaching: a coach sees their own squads and the players in them; an admin sees all.
// Shared by the squad, invitation, assignment and coach handlers.
import { and, eq, inArray, type SQL } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import type { Db } from "../../db/client";
import { squadMembers, squads } from "../../db/schema";
import { notFound } from "../../lib/http-error";
import type { SessionUser } from "../../middleware/session";

/** The ownership filter for `column`: none for an admin, "column = me" for everyone else. */
export function ownedBy(column: AnyPgColumn, user: SessionUser): SQL | undefined {
  return user.role === "admin" ? undefined : eq(column, user.id);
}

/** The squad if the user coaches it (or is an admin); otherwise 404, as if it did not exist. */
export async function findOwnSquad(db: Db, user: SessionUser, squadId: string) {
  const [squad] = await db
    .select()
    .from(squads)
    .where(and(eq(squads.id, squadId), ownedBy(squads.coachId, user)));
  if (!squad) throw notFound("Squad");
  return squad;
}

/** For each of `playerIds`, the coach's squads it belongs to (first joined first); absent when none. */
export async function squadsOfPlayers(
  db: Db,
  user: SessionUser,
  playerIds: string[],
): Promise<Map<string, { id: string; name: string; joinedAt: Date }[]>> {
  const found = new Map<string, { id: string; name: string; joinedAt: Date }[]>();
  if (playerIds.length === 0) return found;
  const rows = await db
    .select({ playerId: squadMembers.playerId, id: squads.id, name: squads.name, joinedAt: squadMembers.joinedAt })
    .from(squadMembers)
    .innerJoin(squads, eq(squads.id, squadMembers.squadId))
    .where(and(inArray(squadMembers.playerId, playerIds), ownedBy(squads.coachId, user)))
    .orderBy(squadMembers.joinedAt);
  for (const r of rows) {
    const list = found.get(r.playerId) ?? [];
    list.push({ id: r.id, name: r.name, joinedAt: r.joinedAt });
    found.set(r.playerId, list);
  }
  return found;
}
