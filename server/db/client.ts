// One database handle for the app: PGlite on disk (default) or a PostgreSQL server (DATABASE_URL).
import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { PGlite } from "@electric-sql/pglite";
import { drizzle as drizzlePglite } from "drizzle-orm/pglite";
import { drizzle as drizzlePg } from "drizzle-orm/node-postgres";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import pg from "pg";
import * as schema from "./schema";

export type Schema = typeof schema;
export type Db = PgDatabase<PgQueryResultHKT, Schema>;
export type DbKind = "pglite" | "postgres";

export type Database = {
  db: Db;
  kind: DbKind;
  close: () => Promise<void>;
  /** Only for PostgreSQL: the connection string (migrations take an advisory lock on a connection of their own). */
  url?: string;
  /** Only for PGlite: the underlying instance (backups use it). */
  pglite?: PGlite;
};

/**
 * PGlite's own start parameters (its defaults: single-user mode, no parallel workers), plus a smaller buffer pool:
 * its default shared_buffers of 128 MB is most of the server's memory on a small database. Pages not in the pool
 * are read back through the operating system's file cache. PGLITE_SHARED_BUFFERS changes it.
 */
function pgliteStartParams(sharedBuffers: string): string[] {
  const defaults = ["--single", "-F", "-O", "-j", "-c", "search_path=public", "-c", "exit_on_error=false", "-c", "log_checkpoints=false"];
  const noParallel = [
    "max_worker_processes",
    "max_parallel_workers",
    "max_parallel_workers_per_gather",
    "max_parallel_maintenance_workers",
  ].flatMap((k) => ["-c", `${k}=0`]);
  return [...defaults, ...noParallel, "-c", "io_method=sync", "-c", `shared_buffers=${sharedBuffers}`];
}

/** dataDir: a folder, or "memory://" for an in-memory database (tests); `load`: a data-directory dump to start from. */
export async function openPglite(dataDir: string, load?: Blob, sharedBuffers = "32MB"): Promise<Database> {
  const client = await PGlite.create(dataDir, { ...(load ? { loadDataDir: load } : {}), startParams: pgliteStartParams(sharedBuffers) });
  const db = drizzlePglite(client, { schema }) as unknown as Db;
  return { db, kind: "pglite", pglite: client, close: () => client.close() };
}

/**
 * statementTimeoutMs: PostgreSQL cancels longer statements (SQLSTATE 57014), so one slow query cannot hold a connection.
 * onIdleError: an idle connection the database ended (a restart, a failover, an administrator). The pool has already
 * dropped it and opens a new one when next needed; without a listener node-postgres throws the error and the process
 * ends (its documentation: always listen for the pool's "error").
 */
export async function openPostgres(url: string, statementTimeoutMs: number, onIdleError: (err: Error) => void): Promise<Database> {
  const pool = new pg.Pool({
    connectionString: url,
    max: 10,
    ...(statementTimeoutMs > 0 ? { statement_timeout: statementTimeoutMs } : {}),
  });
  pool.on("error", onIdleError);
  const db = drizzlePg(pool, { schema }) as unknown as Db;
  return { db, kind: "postgres", url, close: () => pool.end() };
}

/** True when dir holds no PGlite database yet (a first-ever start). */
export function pgliteDirIsNew(dir: string): boolean {
  return !fs.existsSync(path.join(dir, "PG_VERSION"));
}

/**
 * Builds and migrates a brand-new PGlite data directory in a short-lived child process (db/pglite-create.ts), so the
 * memory PGlite takes to build a new database is returned to the system when the child ends. The child builds into
 * `<dir>.new`, which is renamed to `dir` only after it exited cleanly (PGlite closed, files flushed): a crash half-way
 * leaves no half-built `dir`, and the next start builds again. The caller holds the data-directory lock.
 */
/** The builder's command line for a server run from source: its own bundle, if one was named (the API tests name
 *  theirs, tests/setup/unit.ts: tsx compiling the builder on every first start was most of those tests' time on a
 *  loaded machine); else tsx and the TypeScript. */
let builtBuilder: string | undefined;
export function useBuiltDatabaseBuilder(file: string): void {
  builtBuilder = file;
}

export async function createPgliteDir(dir: string, sharedBuffers = "32MB"): Promise<void> {
  const building = `${dir}.new`;
  fs.rmSync(building, { recursive: true, force: true });
  const source = import.meta.url.endsWith(".ts");
  const entry = fileURLToPath(new URL(source ? "./pglite-create.ts" : "./pglite-create.js", import.meta.url));
  const args = !source ? [entry] : builtBuilder ? [builtBuilder] : ["--import", "tsx", entry];
  args.push(building, sharedBuffers);
  await new Promise<void>((resolve, reject) => {
    const child = spawn(process.execPath, args, { stdio: ["ignore", "ignore", "pipe"] });
    let stderr = "";
    child.stderr.setEncoding("utf8").on("data", (s: string) => (stderr += s));
    child.once("error", reject);
    child.once("exit", (code, signal) =>
      code === 0
        ? resolve()
        : reject(new Error(`building the new database in ${building} failed (${signal ?? `exit ${code}`}): ${stderr.trim()}`)),
    );
  });
  if (fs.existsSync(dir)) fs.rmdirSync(dir); // only an empty folder (left by an older start) is replaced; anything else stops here
  fs.renameSync(building, dir);
  const parent = fs.openSync(path.dirname(dir), "r");
  try {
    fs.fsyncSync(parent); // the rename itself is durable
  } finally {
    fs.closeSync(parent);
  }
}
