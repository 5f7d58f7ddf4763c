import type { z } from "zod";
import { and, count, eq, gt, inArray } from "drizzle-orm";
import { idSchema } from "../../../shared/schemas/common";
import { squadInputSchema, squadPatchSchema, userIdSchema, type Squad, type SquadMembership } from "../../../shared/schemas/squads";
import type { Db } from "../../db/client";
import { invitations, ladderAssignments, squadMembers, squads, user } from "../../db/schema";
import { notFound } from "../../lib/http-error";
import { currentUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import type { Ctx } from "../../lib/route";
import { findOwnSquad, ownedBy } from "./squad-access";

type SquadRow = typeof squads.$inferSelect;

/** The coach's view of squads: members, and counts of pending invitations and assignments. */
async function squadViews(db: Db, rows: SquadRow[]): Promise<Squad[]> {
  if (rows.length === 0) return [];
  const ids = rows.map((s) => s.id);
  const coachIds = [...new Set(rows.map((s) => s.coachId))];
  const [coaches, members, pending, assigned] = await Promise.all([
    db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, coachIds)),
    db
      .select({ squadId: squadMembers.squadId, id: user.id, name: user.name, email: user.email, joinedAt: squadMembers.joinedAt })
      .from(squadMembers)
      .innerJoin(user, eq(user.id, squadMembers.playerId))
      .where(inArray(squadMembers.squadId, ids))
      .orderBy(user.name, user.id),
    db
      .select({ squadId: invitations.squadId, n: count() })
      .from(invitations)
      .where(and(inArray(invitations.squadId, ids), eq(invitations.status, "pending"), gt(invitations.expiresAt, new Date())))
      .groupBy(invitations.squadId),
    db
      .select({ squadId: ladderAssignments.squadId, n: count() })
      .from(ladderAssignments)
      .where(inArray(ladderAssignments.squadId, ids))
      .groupBy(ladderAssignments.squadId),
  ]);
  const coachName = new Map(coaches.map((c) => [c.id, c.name]));
  const pendingOf = new Map(pending.map((p) => [p.squadId, Number(p.n)]));
  const assignedOf = new Map(assigned.map((a) => [a.squadId, Number(a.n)]));
  return rows.map((s) => {
    const own = members
      .filter((m) => m.squadId === s.id)
      .map(({ id, name, email, joinedAt }) => ({ id, name, email, joinedAt: joinedAt.toISOString() }));
    return {
      id: s.id,
      name: s.name,
      description: s.description,
      coach: { id: s.coachId, name: coachName.get(s.coachId) ?? "" },
      createdAt: s.createdAt.toISOString(),
      members: own,
      counts: { members: own.length, pendingInvitations: pendingOf.get(s.id) ?? 0, assignments: assignedOf.get(s.id) ?? 0 },
    };
  });
}

export function createSquad(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof squadInputSchema>>) => {
    const me = currentUser(req);
    const input = body;
    const [row] = await db
      .insert(squads)
      .values({ coachId: me.id, name: input.name, description: input.description ?? null })
      .returning();
    const [view] = await squadViews(db, [row!]);
    return view!;
  };
}

/** A coach (or admin) gets the squads they run; a player gets the squads they belong to. */
export function listSquads(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    if (me.role !== "player") {
      const rows = await db.select().from(squads).where(ownedBy(squads.coachId, me)).orderBy(squads.createdAt, squads.id);
      return { squads: await squadViews(db, rows) };
    }
    const rows = await db
      .select({ squad: squads, coachName: user.name, joinedAt: squadMembers.joinedAt })
      .from(squadMembers)
      .innerJoin(squads, eq(squads.id, squadMembers.squadId))
      .innerJoin(user, eq(user.id, squads.coachId))
      .where(eq(squadMembers.playerId, me.id))
      .orderBy(squadMembers.joinedAt);
    const ids = rows.map((r) => r.squad.id);
    const sizes =
      ids.length === 0
        ? []
        : await db
            .select({ squadId: squadMembers.squadId, n: count() })
            .from(squadMembers)
            .where(inArray(squadMembers.squadId, ids))
            .groupBy(squadMembers.squadId);
    const sizeOf = new Map(sizes.map((s) => [s.squadId, Number(s.n)]));
    const memberships: SquadMembership[] = rows.map((r) => ({
      id: r.squad.id,
      name: r.squad.name,
      description: r.squad.description,
      coach: { id: r.squad.coachId, name: r.coachName },
      joinedAt: r.joinedAt.toISOString(),
      counts: { members: sizeOf.get(r.squad.id) ?? 0 },
    }));
    return { squads: memberships };
  };
}

export function getSquad(db: Db) {
  return async ({ req }: Ctx) => {
    const squad = await findOwnSquad(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
    const [view] = await squadViews(db, [squad]);
    return view!;
  };
}

export function updateSquad(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof squadPatchSchema>>) => {
    const squad = await findOwnSquad(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
    const patch = body;
    const [row] = await db
      .update(squads)
      .set({
        ...(patch.name !== undefined ? { name: patch.name } : {}),
        ...(patch.description !== undefined ? { description: patch.description } : {}),
      })
      .where(eq(squads.id, squad.id))
      .returning();
    const [view] = await squadViews(db, [row!]);
    return view!;
  };
}

/** Members and invitations go with the squad; assignments stay with their players (squad left empty). */
export function deleteSquad(db: Db) {
  return async ({ req }: Ctx) => {
    const squad = await findOwnSquad(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
    await db.delete(squads).where(eq(squads.id, squad.id));
  };
}

export function removeMember(db: Db) {
  return async ({ req }: Ctx) => {
    const squad = await findOwnSquad(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
    const playerId = parseOrThrow(userIdSchema, req.params.playerId, "playerId");
    const gone = await db
      .delete(squadMembers)
      .where(and(eq(squadMembers.squadId, squad.id), eq(squadMembers.playerId, playerId)))
      .returning({ playerId: squadMembers.playerId });
    if (gone.length === 0) throw notFound("That member");
  };
}

export function leaveSquad(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const squadId = parseOrThrow(idSchema, req.params.id, "id");
    const gone = await db
      .delete(squadMembers)
      .where(and(eq(squadMembers.squadId, squadId), eq(squadMembers.playerId, me.id)))
      .returning({ playerId: squadMembers.playerId });
    if (gone.length === 0) throw notFound("Squad membership");
  };
}
