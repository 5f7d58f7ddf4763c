// The server's own planner-statistics upkeep (PGlite has no autovacuum): never-analysed and grown tables are
// found and analysed; fresh ones are left alone.
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, expect, test } from "vitest";
import { openPglite, type Database } from "./client";
import { analyzeStale, staleTables } from "./maintenance";
import { migrate } from "./migrate";

let database: Database;
beforeAll(async () => {
  database = await openPglite("memory://");
  await migrate(database);
}, 60_000);
afterAll(() => database.close());

async function reltuples(table: string): Promise<number> {
  const res = (await database.db.execute(sql`select reltuples::float8 as n from pg_class where relname = ${table}`)) as unknown as {
    rows: { n: number }[];
  };
  return Number(res.rows[0]!.n);
}

test("a freshly migrated database has never-analysed tables; analyzeStale analyses them and then finds none", async () => {
  expect(await reltuples("putts")).toBe(-1);
  expect(await staleTables(database.db)).toContain("putts");
  const done = await analyzeStale(database.db);
  expect(done).toContain("putts");
  expect(done).toContain("practice_sessions");
  expect(await reltuples("putts")).toBeGreaterThanOrEqual(0);
  expect(await staleTables(database.db)).toEqual([]);
  expect(await analyzeStale(database.db)).toEqual([]);
});

test("a table that grew by more than a tenth is analysed again, with its new row count", async () => {
  await analyzeStale(database.db);
  await database.db.execute(sql`insert into "user"(id, name, email) values ('grow', 'Grow', 'grow@borrowline.example')`);
  await database.db.execute(
    sql`insert into practice_sessions(id, player_id, date) values ('00000000-0000-4000-8000-000000000001', 'grow', '2026-11-30')`,
  );
  await database.db.execute(
    sql`insert into putts(session_id, player_id, distance_m, holed) select '00000000-0000-4000-8000-000000000001', 'grow', 1 + i % 9, i % 2 = 0 from generate_series(1, 20000) i`,
  );
  expect(await staleTables(database.db)).toContain("putts");
  await analyzeStale(database.db);
  expect(await reltuples("putts")).toBe(20000);
  expect(await staleTables(database.db)).not.toContain("putts");
});
