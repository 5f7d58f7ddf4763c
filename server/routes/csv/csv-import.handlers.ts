// POST /api/csv/putts/preview and /import: the upload read with papaparse, rows mapped by lib/csv-mapping.ts, and
// written all-or-nothing in short transactions.
import { setImmediate } from "node:timers/promises";
import { eq, inArray, sql } from "drizzle-orm";
import { z } from "zod";
import { csvImportFieldsSchema, type CsvImportResult, type CsvPreview, type CsvRowError } from "../../../shared/schemas/putts";
import { type UnitSystem } from "../../../shared/units";
import type { Db } from "../../db/client";
import { analyzeStale } from "../../db/maintenance";
import type { Logger } from "../../lib/logger";
import { greens, practiceSessions, putts, userPreferences } from "../../db/schema";
import { csvText, parseCsv } from "../../lib/csv";
import { badRequest } from "../../lib/http-error";
import { currentUser } from "../../middleware/session";
import { reply, type Ctx } from "../../lib/route";
import { ERROR_CODES } from "../../../shared/errors";
import { convertRow, readMapping, suggestMapping, type CsvPutt } from "../../lib/csv-mapping";

const PREVIEW_ROWS = 10;

async function unitsOf(db: Db, userId: string): Promise<UnitSystem> {
  const [p] = await db.select({ units: userPreferences.units }).from(userPreferences).where(eq(userPreferences.userId, userId));
  return p?.units === "metric" ? "metric" : "imperial";
}

export function previewCsv(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const csv = parseCsv(csvText(req.file));
    const preview: CsvPreview = {
      headers: csv.headers,
      rows: csv.rows.filter((r) => r.length > 0).slice(0, PREVIEW_ROWS),
      rowCount: csv.rows.filter((r) => r.length > 0).length,
      delimiter: csv.delimiter,
      suggestedMapping: suggestMapping(csv.headers, await unitsOf(db, me.id)),
    };
    return preview;
  };
}

/**
 * Rows converted, and putts written, between two yields to the event loop (each chunk is a short transaction).
 * 500-putt chunks held PGlite ~80 ms each, and a request queued behind a chunk and a make-rate query waited up to
 * 412 ms; at 100 the probes of `npx tsx bench/concurrency.ts` stay at p99 201 ms (goal 250) and the 50 000-row import
 * takes 10 s instead of 8 (2026-12-03).
 */
const CONVERT_CHUNK = 500;
const WRITE_CHUNK = 100;
/** Marks the sessions of an import still being written; removed in one statement when the last chunk is in. */
export const PENDING_IMPORT_TAG = "csv-import-pending";

/** Sessions left pending by an import that never finished (the server died mid-import): removed at start-up. */
export async function discardUnfinishedImports(db: Db): Promise<number> {
  const gone = await db
    .delete(practiceSessions)
    .where(sql`${practiceSessions.tags} ? ${PENDING_IMPORT_TAG}`)
    .returning({ id: practiceSessions.id });
  return gone.length;
}

/**
 * Imports putts. Policy: all-or-nothing unless skipInvalid=true. Any bad row → 422 with every bad row
 * listed and nothing stored; with skipInvalid=true the valid rows are stored and the bad ones still
 * listed. Rows are numbered from 1 at the first record after the header (spreadsheet row = row + 1,
 * given as `line`).
 *
 * No request waits long behind an import: rows are converted in chunks with a yield between them, and written
 * in short transactions of WRITE_CHUNK putts (PGlite has one connection, so one long transaction would hold every
 * other request). All-or-nothing still holds: the import's sessions carry a pending tag until the last chunk is
 * in, an error deletes what was written, and a server that dies mid-import drops its pending sessions at start.
 */
export function importCsv(db: Db, logger?: Logger) {
  return async ({ req, body }: Ctx<z.infer<typeof csvImportFieldsSchema>>) => {
    const me = currentUser(req);
    const fields = body;
    const csv = parseCsv(csvText(req.file));
    const { mapping, col } = readMapping(fields.mapping, csv.headers);
    const errors: CsvRowError[] = [];
    const good: CsvPutt[] = [];
    const problemRows = new Map(csv.problems.map((p) => [p.row, p.message]));
    for (let i = 0; i < csv.rows.length; i++) {
      if (i > 0 && i % CONVERT_CHUNK === 0) await setImmediate();
      const cells = csv.rows[i]!;
      const row = i + 1;
      if (cells.length === 0) continue;
      const problem = problemRows.get(row);
      if (problem) {
        errors.push({ row, line: row + 1, field: "row", message: problem });
        continue;
      }
      const out = convertRow(cells, col, mapping);
      for (const e of out.errors) errors.push({ row, line: row + 1, ...e });
      if (out.putt) good.push(out.putt);
    }
    if (good.length === 0 && errors.length === 0) throw badRequest("The file has no data rows.", { file: "no data rows under the header" });
    const skipInvalid = fields.skipInvalid === "true";
    if (errors.length > 0 && !skipInvalid) {
      const bad = new Set(errors.map((e) => e.row)).size;
      return reply(422, {
        error: {
          code: ERROR_CODES.unprocessable,
          message: `${bad} row(s) have errors; nothing was imported. Fix them, or import with skipInvalid=true to store only the valid rows.`,
          fields: { file: `${bad} invalid row(s)` },
        },
        imported: 0,
        sessionsCreated: 0,
        greensCreated: 0,
        skipped: bad,
        errors,
      });
    }

    const groups = new Map<string, CsvPutt[]>();
    for (const p of good) {
      const group = groups.get(p.group);
      if (group) group.push(p);
      else groups.set(p.group, [p]);
    }
    const createdGreens: string[] = [];
    const createdSessions: string[] = [];
    try {
      const greenIds = await db.transaction(async (tx) => {
        const own = await tx.select({ id: greens.id, name: greens.name }).from(greens).where(eq(greens.ownerId, me.id));
        const ids = new Map(own.map((g) => [g.name.toLowerCase(), g.id]));
        for (const name of new Set(good.map((p) => p.greenName).filter((n): n is string => n !== null))) {
          if (ids.has(name.toLowerCase())) continue;
          const [g] = await tx.insert(greens).values({ ownerId: me.id, name }).returning({ id: greens.id });
          ids.set(name.toLowerCase(), g!.id);
          createdGreens.push(g!.id);
        }
        return ids;
      });
      // Chunks of whole sessions up to WRITE_CHUNK putts (a bigger session is split across chunks).
      const base = Date.now();
      let written = 0;
      let chunk: { group: CsvPutt[]; sessionId?: string; from: number; to: number }[] = [];
      let chunkSize = 0;
      const flush = async () => {
        if (chunk.length === 0) return;
        const parts = chunk;
        chunk = [];
        chunkSize = 0;
        await db.transaction(async (tx) => {
          const rows: (typeof putts.$inferInsert)[] = [];
          for (const part of parts) {
            if (!part.sessionId) {
              const first = part.group[0]!;
              const [s] = await tx
                .insert(practiceSessions)
                .values({
                  playerId: me.id,
                  date: first.date,
                  greenId: first.greenName ? greenIds.get(first.greenName.toLowerCase())! : null,
                  tags: ["csv-import", PENDING_IMPORT_TAG],
                })
                .returning({ id: practiceSessions.id });
              part.sessionId = s!.id;
              createdSessions.push(s!.id);
            }
            for (const p of part.group.slice(part.from, part.to)) {
              rows.push({
                sessionId: part.sessionId,
                playerId: me.id,
                distanceM: p.distanceM,
                holed: p.holed,
                missSide: p.missSide ?? null,
                missLengthM: p.missLengthM ?? null,
                breakType: p.breakType ?? null,
                createdAt: new Date(base + written + rows.length),
              });
            }
          }
          if (rows.length > 0) await tx.insert(putts).values(rows);
          written += rows.length;
        });
        // Let the requests that arrived meanwhile queue their queries before the next chunk.
        await setImmediate();
      };
      for (const group of groups.values()) {
        let sessionId: string | undefined;
        for (let from = 0; from < group.length;) {
          const to = Math.min(group.length, from + WRITE_CHUNK - chunkSize);
          const part = { group, sessionId, from, to };
          chunk.push(part);
          chunkSize += to - from;
          from = to;
          if (chunkSize >= WRITE_CHUNK) {
            await flush();
            sessionId = part.sessionId;
          }
        }
      }
      await flush();
      // The last chunk is in: the import becomes whole in one statement.
      await db
        .update(practiceSessions)
        .set({ tags: ["csv-import"] })
        .where(inArray(practiceSessions.id, createdSessions));
    } catch (err) {
      // All-or-nothing: take back what this import wrote (putts go with their sessions).
      if (createdSessions.length > 0)
        await db
          .delete(practiceSessions)
          .where(inArray(practiceSessions.id, createdSessions))
          .catch(() => {});
      if (createdGreens.length > 0)
        await db
          .delete(greens)
          .where(inArray(greens.id, createdGreens))
          .catch(() => {});
      throw err;
    }
    // A big write: refresh the planner's statistics now rather than at the next scheduled check.
    await analyzeStale(db, logger).catch((err: unknown) => logger?.warn({ err }, "planner statistics refresh failed"));
    const out: CsvImportResult = {
      imported: good.length,
      sessionsCreated: groups.size,
      greensCreated: createdGreens.length,
      skipped: new Set(errors.map((e) => e.row)).size,
      errors,
    };
    return out;
  };
}
