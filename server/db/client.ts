// One database handle for the app: PGlite on disk (default) or a PostgreSQL server (DATABASE_URL).
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

/** dataDir: a folder, or "memory://" for an in-memory database (tests); `load`: a data-directory dump to start from. */
export async function openPglite(dataDir: string, load?: Blob): Promise<Database> {
  const client = await PGlite.create(dataDir, load ? { loadDataDir: load } : {});
  const db = drizzlePglite(client, { schema }) as unknown as Db;
  return { db, kind: "pglite", pglite: client, close: () => client.close() };
}

/** statementTimeoutMs: PostgreSQL cancels longer statements (SQLSTATE 57014), so one slow query cannot hold a connection. */
export async function openPostgres(url: string, statementTimeoutMs = 0): Promise<Database> {
  const pool = new pg.Pool({ connectionString: url, max: 10, ...(statementTimeoutMs > 0 ? { statement_timeout: statementTimeoutMs } : {}) });
  const db = drizzlePg(pool, { schema }) as unknown as Db;
  return { db, kind: "postgres", url, close: () => pool.end() };
}
