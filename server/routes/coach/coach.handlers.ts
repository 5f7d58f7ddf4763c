import type { z } from "zod";
import { and, eq, inArray } from "drizzle-orm";
import { idSchema } from "../../../shared/schemas/common";
import { squadOverviewQuerySchema, userIdSchema } from "../../../shared/schemas/squads";
import type { Db } from "../../db/client";
import { ladderAssignments, squadMembers, squads, user, userPreferences } from "../../db/schema";
import { toCsv } from "../../lib/csv";
import { notFound } from "../../lib/http-error";
import { inSquadsOf } from "../../lib/player-access";
import { currentUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import type { Ctx } from "../../lib/route";
import { assignmentRows, assignmentViews, summaryOf, withoutPutts } from "../assignments/assignment-view";
import { findOwnSquad, ownedBy, squadsOfPlayers } from "../squads/squad-access";
import { overviewCsvRows, squadOverview } from "./squad-overview";

/**
 * Every player in the coach's squads with the state of each ladder this coach gave them. Players in
 * no squad of this coach do not appear (an admin sees every squad).
 */
export function listCoachedPlayers(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const members = await db
      .select({ id: user.id, name: user.name, email: user.email, squadId: squads.id, squadName: squads.name })
      .from(squadMembers)
      .innerJoin(squads, eq(squads.id, squadMembers.squadId))
      .innerJoin(user, eq(user.id, squadMembers.playerId))
      .where(ownedBy(squads.coachId, me))
      .orderBy(user.name, user.id, squads.name);
    const players = new Map<string, { id: string; name: string; email: string; squads: { id: string; name: string }[] }>();
    for (const m of members) {
      const p = players.get(m.id) ?? { id: m.id, name: m.name, email: m.email, squads: [] };
      p.squads.push({ id: m.squadId, name: m.squadName });
      players.set(m.id, p);
    }
    const ids = [...players.keys()];
    const rows =
      ids.length === 0
        ? []
        : await assignmentRows(db, and(inArray(ladderAssignments.playerId, ids), ownedBy(ladderAssignments.assignedBy, me)));
    const summaries = (await assignmentViews(db, rows)).map(summaryOf);
    return {
      players: [...players.values()].map((p) => ({ ...p, assignments: summaries.filter((s) => s.player.id === p.id).reverse() })),
    };
  };
}

/** One player of the coach's squads, read-only: their squads (with this coach) and ladder history. */
export function getCoachedPlayer(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const playerId = parseOrThrow(userIdSchema, req.params.playerId, "playerId");
    const memberships = (await squadsOfPlayers(db, me, [playerId])).get(playerId);
    if (!memberships) throw notFound("Player");
    const [player] = await db.select({ id: user.id, name: user.name, email: user.email }).from(user).where(eq(user.id, playerId));
    const rows = await assignmentRows(db, and(eq(ladderAssignments.playerId, playerId), ownedBy(ladderAssignments.assignedBy, me)));
    const views = (await assignmentViews(db, rows)).map(withoutPutts).reverse();
    return {
      player: player!,
      squads: memberships.map((s) => ({ id: s.id, name: s.name, joinedAt: s.joinedAt.toISOString() })),
      assignments: views,
    };
  };
}

export function listSquadAssignments(db: Db) {
  return async ({ req }: Ctx) => {
    const squad = await findOwnSquad(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
    // Players who have left the squad (and every other squad of its coach) are no longer shown.
    const rows = await assignmentRows(
      db,
      and(eq(ladderAssignments.squadId, squad.id), inSquadsOf(squad.coachId, ladderAssignments.playerId)),
    );
    const summaries = (await assignmentViews(db, rows)).map(summaryOf).reverse();
    return { squad: { id: squad.id, name: squad.name }, assignments: summaries };
  };
}

/** The squad at a glance (squad-overview.ts): a coach's own squad, or any for an admin. */
export function getSquadOverview(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof squadOverviewQuerySchema>>) => {
    const me = currentUser(req);
    const squad = await findOwnSquad(db, me, parseOrThrow(idSchema, req.params.id, "id"));
    const { days } = query;
    return await squadOverview(db, me, squad, days);
  };
}

/** The same overview as a CSV file (the project's CSV helper guards formula-like text cells). */
export function exportSquadOverview(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof squadOverviewQuerySchema>>) => {
    const me = currentUser(req);
    const squad = await findOwnSquad(db, me, parseOrThrow(idSchema, req.params.id, "id"));
    const { days } = query;
    const [prefs] = await db.select({ units: userPreferences.units }).from(userPreferences).where(eq(userPreferences.userId, me.id));
    const { fields, data } = overviewCsvRows(await squadOverview(db, me, squad, days), prefs?.units === "metric" ? "metric" : "imperial");
    const name =
      squad.name
        .replace(/[^A-Za-z0-9]+/g, "-")
        .replace(/^-|-$/g, "")
        .toLowerCase() || "squad";
    return { filename: `borrowline-${name}-overview.csv`, csv: toCsv(fields, data) };
  };
}
