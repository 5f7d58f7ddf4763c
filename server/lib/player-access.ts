// Whose practice data a signed-in person may read: their own; a coach also the players of their own
// squads; an admin anyone. Writes are always the owner's alone (checked in each handler's query).
import { and, eq, sql, type SQL } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import type { Db } from "../db/client";
import { squadMembers, squads, user } from "../db/schema";
import type { SessionUser } from "../middleware/session";
import { forbidden, notFound } from "./http-error";

/** The player whose data a request reads: `playerId` if the viewer may read it, else a 403/404. */
export async function targetPlayerId(db: Db, viewer: SessionUser, playerId: string | undefined): Promise<string> {
  if (playerId === undefined || playerId === viewer.id) return viewer.id;
  if (viewer.role === "player") throw forbidden("A player sees only their own practice.");
  if (viewer.role === "admin") {
    const [found] = await db.select({ id: user.id }).from(user).where(eq(user.id, playerId)).limit(1);
    if (!found) throw notFound("That player");
    return playerId;
  }
  const [member] = await db
    .select({ id: squadMembers.playerId })
    .from(squadMembers)
    .innerJoin(squads, eq(squads.id, squadMembers.squadId))
    .where(and(eq(squads.coachId, viewer.id), eq(squadMembers.playerId, playerId)))
    .limit(1);
  // Not one of this coach's players: as if there were no such player.
  if (!member) throw notFound("That player");
  return playerId;
}

/** SQL condition: the row's player column is one the viewer may read (for reads by id). */
export function readableBy(viewer: SessionUser, playerColumn: AnyPgColumn): SQL {
  if (viewer.role === "admin") return sql`true`;
  if (viewer.role === "coach") {
    return sql`(${playerColumn} = ${viewer.id} or ${playerColumn} in (select ${squadMembers.playerId} from ${squadMembers} inner join ${squads} on ${squads.id} = ${squadMembers.squadId} where ${squads.coachId} = ${viewer.id}))`;
  }
  return eq(playerColumn, viewer.id);
}

/** SQL condition: the row's player column is, right now, a member of one of `coachId`'s squads (leaving ends a coach's access). */
export function inSquadsOf(coachId: string, playerColumn: AnyPgColumn): SQL {
  return sql`${playerColumn} in (select ${squadMembers.playerId} from ${squadMembers} inner join ${squads} on ${squads.id} = ${squadMembers.squadId} where ${squads.coachId} = ${coachId})`;
}
