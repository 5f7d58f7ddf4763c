import type { z } from "zod";
import { and, asc, desc, eq, gte, lte, sql, type SQL } from "drizzle-orm";
import { puttInputSchema, puttListQuerySchema, type Putt } from "../../../shared/schemas/putts";
import type { Page } from "../../../shared/schemas/sessions";
import type { Db } from "../../db/client";
import type { PuttWriter } from "../../db/putt-writer";
import { practiceSessions, putts } from "../../db/schema";
import { conflict, notFound } from "../../lib/http-error";
import { readableBy, targetPlayerId } from "../../lib/player-access";
import { pathId } from "../../lib/path-params";
import { currentUser } from "../../middleware/session";
import { reply, type Ctx } from "../../lib/route";
import { readableSession, sessionIdParam } from "../sessions/sessions.handlers";

const puttColumns = {
  id: putts.id,
  sessionId: putts.sessionId,
  date: practiceSessions.date,
  distanceM: putts.distanceM,
  holed: putts.holed,
  missSide: putts.missSide,
  missLengthM: putts.missLengthM,
  breakType: putts.breakType,
  clientId: putts.clientId,
  createdAt: putts.createdAt,
};

type PuttRow = Omit<Putt, "createdAt" | "missSide" | "breakType"> & { createdAt: Date; missSide: string | null; breakType: string | null };
const toPutt = (r: PuttRow): Putt => ({
  ...r,
  missSide: r.missSide as Putt["missSide"],
  breakType: r.breakType as Putt["breakType"],
  createdAt: r.createdAt.toISOString(),
});

export function addPutt(db: Db, writer: PuttWriter) {
  return async ({ req, body }: Ctx<z.infer<typeof puttInputSchema>>) => {
    const me = currentUser(req);
    const sessionId = sessionIdParam(req);
    const input = body;
    // The hot path of logging on the green: the writer stores it with the putts posted at the same moment, in one
    // statement that also checks the session is mine (db/putt-writer.ts). A retry with the same clientId (the
    // phone lost the first answer) conflicts and stores nothing.
    const id = await writer.write({
      sessionId,
      playerId: me.id,
      clientId: input.clientId ?? null,
      distanceM: input.distanceM,
      holed: input.holed,
      missSide: input.missSide ?? null,
      missLengthM: input.missLengthM ?? null,
      breakType: input.breakType ?? null,
    });
    if (id) return { id };
    const [own] = await db
      .select({ id: practiceSessions.id })
      .from(practiceSessions)
      .where(and(eq(practiceSessions.id, sessionId), eq(practiceSessions.playerId, me.id)));
    if (!own) throw notFound("That session");
    const [existing] = input.clientId
      ? await db
          .select({ id: putts.id, sessionId: putts.sessionId })
          .from(putts)
          .where(and(eq(putts.playerId, me.id), eq(putts.clientId, input.clientId)))
      : [];
    if (!existing) throw conflict("That putt is being stored; retry.");
    if (existing.sessionId !== sessionId) throw conflict("That clientId belongs to a putt in another session.");
    // A retried clientId: stored once, answered 200 (the route's default for a new putt is 201).
    return reply(200, { id: existing.id });
  };
}

export function listSessionPutts(db: Db) {
  return async ({ req }: Ctx) => {
    const viewer = currentUser(req);
    const session = await readableSession(db, viewer, sessionIdParam(req));
    const rows = await db
      .select(puttColumns)
      .from(putts)
      .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
      .where(eq(putts.sessionId, session.id))
      .orderBy(asc(putts.createdAt), asc(putts.id));
    return { items: rows.map(toPutt) };
  };
}

export function deletePutt(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = pathId(req);
    const gone = await db
      .delete(putts)
      .where(and(eq(putts.id, id), eq(putts.playerId, me.id)))
      .returning({ id: putts.id });
    if (gone.length === 0) throw notFound("That putt");
  };
}

export function getPutt(db: Db) {
  return async ({ req }: Ctx) => {
    const viewer = currentUser(req);
    const id = pathId(req);
    const [row] = await db
      .select(puttColumns)
      .from(putts)
      .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
      .where(and(eq(putts.id, id), readableBy(viewer, putts.playerId)));
    if (!row) throw notFound("That putt");
    return toPutt(row);
  };
}

export function listPutts(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof puttListQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const where: SQL[] = [eq(putts.playerId, playerId)];
    if (qs.from) where.push(gte(practiceSessions.date, qs.from));
    if (qs.to) where.push(lte(practiceSessions.date, qs.to));
    if (qs.holed !== undefined) where.push(eq(putts.holed, qs.holed));
    if (qs.breakType) where.push(eq(putts.breakType, qs.breakType));
    if (qs.sessionId) where.push(eq(putts.sessionId, qs.sessionId));
    if (qs.minM !== undefined) where.push(gte(putts.distanceM, qs.minM));
    if (qs.maxM !== undefined) where.push(lte(putts.distanceM, qs.maxM));
    const cond = and(...where)!;
    const dir = qs.sort.startsWith("-") ? desc : asc;
    const key = qs.sort.replace(/^-/, "");
    const primary =
      key === "date"
        ? [dir(practiceSessions.date), dir(putts.createdAt)]
        : key === "distance"
          ? [dir(putts.distanceM)]
          : [dir(putts.createdAt)];
    const [rows, [total]] = await Promise.all([
      db
        .select(puttColumns)
        .from(putts)
        .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
        .where(cond)
        .orderBy(...primary, asc(putts.id))
        .limit(qs.pageSize)
        .offset((qs.page - 1) * qs.pageSize),
      db
        .select({ n: sql<number>`count(*)::int` })
        .from(putts)
        .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
        .where(cond),
    ]);
    const page: Page<Putt> = { items: rows.map(toPutt), total: Number(total?.n ?? 0), page: qs.page, pageSize: qs.pageSize };
    return page;
  };
}
