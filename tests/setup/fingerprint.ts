// One query whose answer changes whenever any row of any table in the schema changes: tests use it to show
// that a refused request left the database exactly as it was.
import { getTableName, is, sql } from "drizzle-orm";
import { PgTable } from "drizzle-orm/pg-core";
import type { Db } from "../../server/db/client";
import * as schema from "../../server/db/schema";

const TABLES = (Object.values(schema) as unknown[])
  .filter((v) => is(v, PgTable))
  .map((t) => getTableName(t as PgTable))
  .sort();

export async function databaseFingerprint(db: Db): Promise<string> {
  const parts = TABLES.map((t) => `(select coalesce(md5(string_agg(x::text, '|' order by x::text)), '') from "${t}" x)`);
  const result = await db.execute(sql.raw(`select md5(${parts.join(" || ")}) as f`));
  const rows = (Array.isArray(result) ? result : (result as { rows: { f: string }[] }).rows) as { f: string }[];
  return rows[0]!.f;
}

export const FINGERPRINTED_TABLES: readonly string[] = TABLES;
