// GET /api/csv/putts/export and /api/csv/sessions/export: a player's log as CSV (metres, the Stimp in feet).
import { exportMetres, exportStimp } from "../../../shared/format";
import { and, asc, eq, gte, lte, sql, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { csvExportQuerySchema } from "../../../shared/schemas/putts";
import type { Db } from "../../db/client";
import { greens, practiceSessions, putts } from "../../db/schema";
import { toCsv } from "../../lib/csv";
import { targetPlayerId } from "../../lib/player-access";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

/** A CSV download as the route answers it (lib/route.ts writes the headers). */
const attachment = (filename: string, csv: string) => ({ filename, csv });

function exportFilter(playerId: string, q: { from?: string; to?: string }): SQL {
  const where: SQL[] = [eq(practiceSessions.playerId, playerId)];
  if (q.from) where.push(gte(practiceSessions.date, q.from));
  if (q.to) where.push(lte(practiceSessions.date, q.to));
  return and(...where)!;
}

export const PUTT_EXPORT_COLUMNS = [
  "date",
  "green",
  "distance_m",
  "holed",
  "miss_side",
  "miss_length_m",
  "break_type",
  "session_id",
  "putt_id",
];
export const SESSION_EXPORT_COLUMNS = ["date", "green", "stimp_ft", "conditions", "tags", "notes", "putts", "holed", "session_id"];

export function exportPutts(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof csvExportQuerySchema>>) => {
    const viewer = currentUser(req);
    const q = query;
    const playerId = await targetPlayerId(db, viewer, q.playerId);
    const rows = await db
      .select({
        date: practiceSessions.date,
        green: greens.name,
        distanceM: putts.distanceM,
        holed: putts.holed,
        missSide: putts.missSide,
        missLengthM: putts.missLengthM,
        breakType: putts.breakType,
        sessionId: putts.sessionId,
        id: putts.id,
      })
      .from(putts)
      .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
      .leftJoin(greens, eq(greens.id, practiceSessions.greenId))
      .where(and(eq(putts.playerId, playerId), exportFilter(playerId, q)))
      .orderBy(asc(practiceSessions.date), asc(putts.createdAt), asc(putts.id));
    const csv = toCsv(
      PUTT_EXPORT_COLUMNS,
      rows.map((r) => [
        r.date,
        r.green,
        exportMetres(r.distanceM),
        r.holed,
        r.missSide,
        r.missLengthM === null ? null : exportMetres(r.missLengthM),
        r.breakType,
        r.sessionId,
        r.id,
      ]),
    );
    return attachment(`borrowline-putts-${new Date().toISOString().slice(0, 10)}.csv`, csv);
  };
}

export function exportSessions(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof csvExportQuerySchema>>) => {
    const viewer = currentUser(req);
    const q = query;
    const playerId = await targetPlayerId(db, viewer, q.playerId);
    const rows = await db
      .select({
        date: practiceSessions.date,
        green: greens.name,
        stimpFt: practiceSessions.stimpFt,
        conditions: practiceSessions.conditions,
        tags: practiceSessions.tags,
        notes: practiceSessions.notes,
        putts: sql<number>`(select count(*)::int from ${putts} where ${putts.sessionId} = ${practiceSessions.id})`,
        holed: sql<number>`(select (count(*) filter (where ${putts.holed}))::int from ${putts} where ${putts.sessionId} = ${practiceSessions.id})`,
        id: practiceSessions.id,
      })
      .from(practiceSessions)
      .leftJoin(greens, eq(greens.id, practiceSessions.greenId))
      .where(exportFilter(playerId, q))
      .orderBy(asc(practiceSessions.date), asc(practiceSessions.createdAt));
    const csv = toCsv(
      SESSION_EXPORT_COLUMNS,
      rows.map((r) => [
        r.date,
        r.green,
        r.stimpFt === null ? null : exportStimp(r.stimpFt),
        r.conditions,
        r.tags.join("; "),
        r.notes,
        Number(r.putts),
        Number(r.holed),
        r.id,
      ]),
    );
    return attachment(`borrowline-sessions-${new Date().toISOString().slice(0, 10)}.csv`, csv);
  };
}
