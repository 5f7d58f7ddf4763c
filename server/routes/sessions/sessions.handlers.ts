import type { z } from "zod";
import { and, asc, desc, eq, gte, lte, sql, type SQL } from "drizzle-orm";
import {
  sessionInputSchema,
  sessionListQuerySchema,
  sessionPatchSchema,
  type Page,
  type SessionItem,
} from "../../../shared/schemas/sessions";
import type { Db } from "../../db/client";
import { greens, practiceSessions, putts, stimpReadings } from "../../db/schema";
import { badRequest, notFound } from "../../lib/http-error";
import { visibleGreen } from "../../lib/green-access";
import { readableBy, targetPlayerId } from "../../lib/player-access";
import { pathId } from "../../lib/path-params";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

/** Putt counts per session, limited by `filter` (the player or the session) so it never scans everyone's putts. */
const counts = (db: Db, filter: SQL) =>
  db
    .select({
      sessionId: putts.sessionId,
      n: sql<number>`count(*)::int`.as("n"),
      m: sql<number>`(count(*) filter (where ${putts.holed}))::int`.as("m"),
    })
    .from(putts)
    .where(filter)
    .groupBy(putts.sessionId)
    .as("c");

function sessionSelect(db: Db, puttsFilter: SQL) {
  const c = counts(db, puttsFilter);
  const n = sql<number>`coalesce(${c.n}, 0)`;
  const m = sql<number>`coalesce(${c.m}, 0)`;
  const rate = sql<number | null>`case when coalesce(${c.n}, 0) = 0 then null else ${c.m}::float8 / ${c.n} end`;
  const q = db
    .select({
      id: practiceSessions.id,
      playerId: practiceSessions.playerId,
      date: practiceSessions.date,
      greenId: practiceSessions.greenId,
      greenName: greens.name,
      stimpFt: practiceSessions.stimpFt,
      conditions: practiceSessions.conditions,
      tags: practiceSessions.tags,
      notes: practiceSessions.notes,
      putts: n,
      holed: m,
      makeRate: rate,
    })
    .from(practiceSessions)
    .leftJoin(greens, eq(greens.id, practiceSessions.greenId))
    .leftJoin(c, eq(c.sessionId, practiceSessions.id));
  return { q, n, rate };
}

function toItem(row: SessionItem): SessionItem {
  return { ...row, putts: Number(row.putts), holed: Number(row.holed), makeRate: row.makeRate === null ? null : Number(row.makeRate) };
}

export const sessionIdParam = (req: { params: Record<string, string | string[] | undefined> }) => pathId(req);

/** A session the viewer may read (own, a squad player's for their coach, anyone's for an admin), or a 404. */
export async function readableSession(db: Db, viewer: Parameters<typeof readableBy>[0], id: string): Promise<SessionItem> {
  const { q } = sessionSelect(db, eq(putts.sessionId, id));
  const [row] = await q.where(and(eq(practiceSessions.id, id), readableBy(viewer, practiceSessions.playerId)));
  if (!row) throw notFound("That session");
  return toItem(row);
}

/** greenId must be the player's own green or one shared with a squad of theirs; 400 otherwise. */
async function checkGreen(db: Db, playerId: string, greenId: string): Promise<void> {
  const [g] = await db
    .select({ id: greens.id })
    .from(greens)
    .where(and(eq(greens.id, greenId), visibleGreen(playerId)));
  if (!g) throw badRequest("The request body is not valid.", { greenId: "No green of yours or of your squad has this id" });
}

/** The green's Stimp on a date: its latest reading on or before that date; null without one. */
async function stimpOn(db: Db, greenId: string, date: string): Promise<number | null> {
  const [r] = await db
    .select({ stimpFt: stimpReadings.stimpFt })
    .from(stimpReadings)
    .where(and(eq(stimpReadings.greenId, greenId), lte(stimpReadings.measuredOn, date)))
    .orderBy(desc(stimpReadings.measuredOn), desc(stimpReadings.createdAt))
    .limit(1);
  return r?.stimpFt ?? null;
}

export function createSession(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof sessionInputSchema>>) => {
    const me = currentUser(req);
    const input = body;
    if (input.greenId) await checkGreen(db, me.id, input.greenId);
    const stimpFt = input.stimpFt !== undefined ? input.stimpFt : input.greenId ? await stimpOn(db, input.greenId, input.date) : null;
    const [row] = await db
      .insert(practiceSessions)
      .values({
        playerId: me.id,
        date: input.date,
        greenId: input.greenId ?? null,
        stimpFt,
        conditions: input.conditions ?? null,
        tags: input.tags,
        notes: input.notes ?? null,
      })
      .returning({ id: practiceSessions.id });
    return { id: row!.id };
  };
}

export function listSessions(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof sessionListQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const where: SQL[] = [eq(practiceSessions.playerId, playerId)];
    if (qs.from) where.push(gte(practiceSessions.date, qs.from));
    if (qs.to) where.push(lte(practiceSessions.date, qs.to));
    if (qs.greenId) where.push(eq(practiceSessions.greenId, qs.greenId));
    const cond = and(...where)!;
    const { q, n, rate } = sessionSelect(db, eq(putts.playerId, playerId));
    const desc_ = qs.sort.startsWith("-");
    const key = qs.sort.replace(/^-/, "");
    const primary = key === "date" ? sql`${practiceSessions.date}` : key === "putts" ? n : rate;
    const order = [
      desc_ ? sql`${primary} desc nulls last` : sql`${primary} asc nulls last`,
      desc(practiceSessions.date),
      desc(practiceSessions.createdAt),
      asc(practiceSessions.id),
    ];
    const [rows, [total]] = await Promise.all([
      q
        .where(cond)
        .orderBy(...order)
        .limit(qs.pageSize)
        .offset((qs.page - 1) * qs.pageSize),
      db
        .select({ n: sql<number>`count(*)::int` })
        .from(practiceSessions)
        .where(cond),
    ]);
    const page: Page<SessionItem> = { items: rows.map(toItem), total: Number(total?.n ?? 0), page: qs.page, pageSize: qs.pageSize };
    return page;
  };
}

export function getSession(db: Db) {
  return async ({ req }: Ctx) => {
    return await readableSession(db, currentUser(req), sessionIdParam(req));
  };
}

export function updateSession(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof sessionPatchSchema>>) => {
    const me = currentUser(req);
    const id = sessionIdParam(req);
    const patch = body;
    const [own] = await db
      .select({ id: practiceSessions.id })
      .from(practiceSessions)
      .where(and(eq(practiceSessions.id, id), eq(practiceSessions.playerId, me.id)));
    if (!own) throw notFound("That session");
    if (patch.greenId) await checkGreen(db, me.id, patch.greenId);
    const set: Partial<typeof practiceSessions.$inferInsert> = {};
    if (patch.date !== undefined) set.date = patch.date;
    if (patch.greenId !== undefined) set.greenId = patch.greenId;
    if (patch.stimpFt !== undefined) set.stimpFt = patch.stimpFt;
    if (patch.conditions !== undefined) set.conditions = patch.conditions;
    if (patch.tags !== undefined) set.tags = patch.tags;
    if (patch.notes !== undefined) set.notes = patch.notes;
    await db
      .update(practiceSessions)
      .set(set)
      .where(and(eq(practiceSessions.id, id), eq(practiceSessions.playerId, me.id)));
    return await readableSession(db, me, id);
  };
}

export function deleteSession(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const gone = await db
      .delete(practiceSessions)
      .where(and(eq(practiceSessions.id, sessionIdParam(req)), eq(practiceSessions.playerId, me.id)))
      .returning({ id: practiceSessions.id });
    if (gone.length === 0) throw notFound("That session");
  };
}
