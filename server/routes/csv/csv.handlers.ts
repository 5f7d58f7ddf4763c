import { exportMetres, exportStimp } from "../../../shared/format";
import { setImmediate } from "node:timers/promises";
import { and, asc, eq, gte, inArray, lte, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { isoDateSchema } from "../../../shared/schemas/common";
import { plainText } from "../../../shared/schemas/text";
import {
  BREAK_TYPES,
  csvExportQuerySchema,
  csvImportFieldsSchema,
  csvMappingSchema,
  holedHasNoMiss,
  puttFieldsSchema,
  type CsvImportResult,
  type CsvMapping,
  type CsvPreview,
  type CsvRowError,
} from "../../../shared/schemas/putts";
import { fromLongUnit, fromShortUnit, METRES_PER_FOOT, type UnitSystem } from "../../../shared/units";
import type { Db } from "../../db/client";
import { analyzeStale } from "../../db/maintenance";
import type { Logger } from "../../lib/logger";
import { greens, practiceSessions, putts, userPreferences } from "../../db/schema";
import { csvText, parseCsv, toCsv, unguard } from "../../lib/csv";
import { badRequest } from "../../lib/http-error";
import { targetPlayerId } from "../../lib/player-access";
import { currentUser } from "../../middleware/session";
import { zodFields } from "../../middleware/validate";
import { reply, type Ctx } from "../../lib/route";
import { ERROR_CODES } from "../../../shared/errors";

const PREVIEW_ROWS = 10;

async function unitsOf(db: Db, userId: string): Promise<UnitSystem> {
  const [p] = await db.select({ units: userPreferences.units }).from(userPreferences).where(eq(userPreferences.userId, userId));
  return p?.units === "metric" ? "metric" : "imperial";
}

const norm = (h: string) =>
  h
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, " ")
    .trim();

/** Header words we recognise (our own export's names first), for the suggested mapping. */
const HEADER_HINTS: { key: keyof CsvMapping; pattern: RegExp }[] = [
  { key: "date", pattern: /^(date|day|session date|practice date)$/ },
  { key: "distance", pattern: /^(distance|dist|length|putt length|putt distance)( (m|ft|feet|metres|meters))?$/ },
  { key: "holed", pattern: /^(holed|made|make|in|result)$/ },
  { key: "missSide", pattern: /^(miss side|side|missed side)$/ },
  { key: "missLength", pattern: /^(miss length|leave|miss distance|miss|past short)( (m|cm|ft|in|inches))?$/ },
  { key: "breakType", pattern: /^(break type|break|slope)$/ },
  { key: "green", pattern: /^(green|green name|practice green)$/ },
  { key: "session", pattern: /^(session|session id|session name)$/ },
];

export function suggestMapping(headers: string[], units: UnitSystem): Partial<CsvMapping> {
  const out: Partial<CsvMapping> = {};
  for (const h of headers) {
    const n = norm(h);
    const hint = HEADER_HINTS.find((x) => x.pattern.test(n) && out[x.key] === undefined);
    if (!hint) continue;
    (out as Record<string, string>)[hint.key] = h;
    if (hint.key === "distance")
      out.distanceUnit = / (ft|feet)$/.test(n) ? "ft" : / (m|metres|meters)$/.test(n) ? "m" : units === "imperial" ? "ft" : "m";
    if (hint.key === "missLength") {
      const u = n.match(/ (m|cm|ft|in|inches)$/)?.[1];
      if (u) out.missLengthUnit = u === "inches" ? "in" : (u as CsvMapping["missLengthUnit"]);
    }
  }
  return out;
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

// ---- import -----------------------------------------------------------------------------------

const HOLED_WORDS: Record<string, boolean> = {
  true: true,
  yes: true,
  y: true,
  "1": true,
  holed: true,
  made: true,
  make: true,
  in: true,
  false: false,
  no: false,
  n: false,
  "0": false,
  missed: false,
  miss: false,
  out: false,
};
const SIDE_WORDS: Record<string, "left" | "right"> = { left: "left", l: "left", right: "right", r: "right" };
/** Maps the API's field names back to the mapping's, so row errors name what the user mapped. */
const FIELD_OF: Record<string, keyof CsvMapping> = {
  distanceM: "distance",
  holed: "holed",
  missSide: "missSide",
  missLengthM: "missLength",
  breakType: "breakType",
};

const csvPuttSchema = puttFieldsSchema.superRefine(holedHasNoMiss);
const greenNameSchema = plainText(80);
type CsvPutt = z.infer<typeof csvPuttSchema> & { date: string; group: string; greenName: string | null };

function parseNumber(cell: string): number | null {
  const t = cell.trim();
  if (t === "" || !/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) return null;
  return Number(t);
}

function convertRow(
  cells: string[],
  col: Record<string, number>,
  m: CsvMapping,
): { putt?: CsvPutt; errors: { field: string; message: string }[] } {
  const errors: { field: string; message: string }[] = [];
  const cell = (key: keyof CsvMapping) => (col[key] === undefined ? "" : unguard((cells[col[key]!] ?? "").trim()));
  const date = cell("date");
  if (!isoDateSchema.safeParse(date).success)
    errors.push({ field: "date", message: date === "" ? "missing date" : `"${date}" is not a date as YYYY-MM-DD` });
  const rawDistance = parseNumber(cell("distance"));
  if (rawDistance === null) errors.push({ field: "distance", message: `"${cell("distance")}" is not a number` });
  const holedWord = cell("holed").toLowerCase();
  const holed = HOLED_WORDS[holedWord];
  if (holed === undefined) errors.push({ field: "holed", message: `"${cell("holed")}" is not yes/no, true/false, 1/0 or holed/missed` });
  const sideWord = cell("missSide").toLowerCase();
  const missSide = sideWord === "" ? null : SIDE_WORDS[sideWord];
  if (missSide === undefined) errors.push({ field: "missSide", message: `"${cell("missSide")}" is not left or right` });
  const lengthCell = cell("missLength");
  const rawLength = lengthCell === "" ? null : parseNumber(lengthCell);
  if (lengthCell !== "" && rawLength === null) errors.push({ field: "missLength", message: `"${lengthCell}" is not a number` });
  const breakWord = cell("breakType")
    .toLowerCase()
    .replace(/[\s_]+/g, "-");
  const breakType =
    breakWord === ""
      ? null
      : (BREAK_TYPES as readonly string[]).includes(breakWord)
        ? (breakWord as (typeof BREAK_TYPES)[number])
        : undefined;
  if (breakType === undefined)
    errors.push({ field: "breakType", message: `"${cell("breakType")}" is not one of ${BREAK_TYPES.join(", ")}` });
  const greenCheck = greenNameSchema.safeParse(cell("green"));
  if (!greenCheck.success) errors.push({ field: "green", message: greenCheck.error.issues[0]?.message ?? "not a green name" });
  if (errors.length > 0) return { errors };

  const shortUnit = m.missLengthUnit ?? m.distanceUnit;
  const lengthM =
    rawLength === null
      ? null
      : shortUnit === "m"
        ? rawLength
        : shortUnit === "ft"
          ? rawLength * METRES_PER_FOOT
          : fromShortUnit(rawLength, shortUnit === "in" ? "imperial" : "metric");
  const candidate = {
    distanceM: fromLongUnit(rawDistance!, m.distanceUnit === "ft" ? "imperial" : "metric"),
    holed: holed!,
    missSide,
    missLengthM: lengthM,
    breakType,
  };
  const checked = csvPuttSchema.safeParse(candidate);
  if (!checked.success) {
    for (const [path, message] of Object.entries(zodFields(checked.error))) errors.push({ field: FIELD_OF[path] ?? path, message });
    return { errors };
  }
  const greenName = cell("green") || null;
  const group = `${date}\u0000${m.session ? cell("session") : (greenName ?? "").toLowerCase()}`;
  return { putt: { ...checked.data, date, group, greenName }, errors };
}

function readMapping(raw: string, headers: string[]): { mapping: CsvMapping; col: Record<string, number> } {
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch {
    throw badRequest("The mapping is not valid JSON.", { mapping: "not valid JSON" });
  }
  const parsed = csvMappingSchema.safeParse(json);
  if (!parsed.success) {
    const fields = Object.fromEntries(
      Object.entries(zodFields(parsed.error)).map(([k, v]) => [k === "body" ? "mapping" : `mapping.${k}`, v]),
    );
    throw badRequest("The mapping is not valid.", fields);
  }
  const mapping = parsed.data;
  const col: Record<string, number> = {};
  const fields: Record<string, string> = {};
  for (const key of ["date", "distance", "holed", "missSide", "missLength", "breakType", "green", "session"] as const) {
    const name = mapping[key];
    if (name === undefined) continue;
    const at = headers.map((h, i) => (h === name ? i : -1)).filter((i) => i >= 0);
    if (at.length === 0) fields[`mapping.${key}`] = `No column named "${name}"`;
    else if (at.length > 1) fields[`mapping.${key}`] = `${at.length} columns are named "${name}"`;
    else col[key] = at[0]!;
  }
  if (Object.keys(fields).length > 0) throw badRequest("The mapping names columns the file does not have.", fields);
  return { mapping, col };
}

/** Rows converted, and putts written, between two yields to the event loop (each chunk is a short transaction). */
const CONVERT_CHUNK = 2000;
const WRITE_CHUNK = 500;
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

// ---- export -----------------------------------------------------------------------------------

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
