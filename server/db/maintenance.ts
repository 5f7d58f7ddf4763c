// Planner statistics kept fresh by the server itself. PGlite runs no autovacuum: a table that was never
// analysed keeps reltuples = -1 and the planner guesses (it chose a nested loop that rescanned a player's putts
// once per session: seconds instead of milliseconds). So the server analyses
//   - after migrations (start-up),
//   - after every CSV import (a big write in one go),
//   - and whenever a table has grown or shrunk by more than a tenth since its last ANALYZE (checked every
//     minute from the file size, which costs nothing: pg_relation_size against pg_class.relpages).
// VACUUM runs with it, so the visibility map lets the planner use index-only scans. On PostgreSQL the server's
// own autovacuum does the periodic part; the checks after migrations and imports run there too (cheap, and a
// fresh import is then planned well at once instead of after autovacuum's next round).
import { sql } from "drizzle-orm";
import type { Db } from "./client";
import type { Logger } from "../lib/logger";

/** A table is stale when it was never analysed, or its size moved by more than this fraction (plus a few pages). */
const GROWTH = 0.1;
const MIN_PAGES = 8;

type TableSize = { name: string; relpages: number; reltuples: number; pages: number };

export async function staleTables(db: Db): Promise<string[]> {
  const res = await db.execute(sql`
    select c.relname as name, c.relpages::int as relpages, c.reltuples::float8 as reltuples,
      (pg_relation_size(c.oid) / current_setting('block_size')::int)::int as pages
    from pg_class c join pg_namespace n on n.oid = c.relnamespace
    where n.nspname = 'public' and c.relkind = 'r'`);
  const rows = (res as unknown as { rows: TableSize[] }).rows;
  return rows
    .filter((t) => Number(t.reltuples) < 0 || Math.abs(Number(t.pages) - Number(t.relpages)) > GROWTH * Number(t.relpages) + MIN_PAGES)
    .map((t) => t.name);
}

/** VACUUM ANALYZE every stale table; returns the tables done. */
export async function analyzeStale(db: Db, logger?: Logger): Promise<string[]> {
  const stale = await staleTables(db);
  const t = performance.now();
  for (const name of stale) {
    // Table names come from pg_class, quoted as identifiers.
    await db.execute(sql.raw(`vacuum (analyze) "${name.replace(/"/g, '""')}"`));
  }
  if (stale.length > 0) logger?.debug({ tables: stale, ms: Math.round(performance.now() - t) }, "planner statistics refreshed");
  return stale;
}

/** Runs analyzeStale every `intervalMs` (unref'd; never two at once). Returns a stop function. */
export function scheduleMaintenance(db: Db, logger: Logger, intervalMs = 60_000): () => Promise<void> {
  let running: Promise<unknown> | undefined;
  const timer = setInterval(() => {
    running ??= analyzeStale(db, logger)
      .catch((err: unknown) => logger.warn({ err }, "planner statistics refresh failed"))
      .finally(() => (running = undefined));
  }, intervalMs);
  timer.unref();
  return async () => {
    clearInterval(timer);
    await running;
  };
}
