// Who may see and who may change a green (issue 14): a green is its owner's, and when the owner shares it with
// one of their squads, that squad's players (and its coach) see it, log sessions on it and read on its height map.
// Only the owner changes it: name, note, Stimp readings, height map, sharing.
import { and, eq, sql, type SQL } from "drizzle-orm";
import type { Db } from "../db/client";
import { greens } from "../db/schema";
import { forbidden, notFound } from "./http-error";

/**
 * SQL condition on `greens`: mine, or shared with a squad I play in or coach. Written with qualified names: in a
 * single-table select Drizzle leaves column names unqualified, which inside a subquery would bind to its own table.
 */
export function visibleGreen(userId: string): SQL {
  return sql`(${greens.ownerId} = ${userId} or "greens"."squad_id" in (select "squad_members"."squad_id" from "squad_members" where "squad_members"."player_id" = ${userId}) or "greens"."squad_id" in (select "squads"."id" from "squads" where "squads"."coach_id" = ${userId}))`;
}

/**
 * The green if I may change it. Another's green I cannot see is a 404 (as if absent); one shared with my squad
 * that I see but do not own is a 403.
 */
export async function ownGreenOr403(db: Db, userId: string, id: string): Promise<{ id: string; squadId: string | null }> {
  const [row] = await db
    .select({ id: greens.id, ownerId: greens.ownerId, squadId: greens.squadId })
    .from(greens)
    .where(and(eq(greens.id, id), visibleGreen(userId)));
  if (!row) throw notFound("That green");
  if (row.ownerId !== userId) throw forbidden("Only the person who keeps this green changes it.");
  return { id: row.id, squadId: row.squadId };
}
