// Make-rate queries on a club's worth of data: 500 000 putts in a fresh in-memory PGlite with the real migrations,
// 100 players; the keen player measured holds 50 000 of them (45 a day for three years), the other 99 share the rest.
// No manual ANALYZE: after seeding, the bench runs the server's own maintenance step (`analyzeStale`, which the
// server runs after migrations, after every import and every minute), then times the API's three aggregations —
// make rates, weekly trend (4-week rolling) and a two-period compare — unbounded and with both date bounds.
// The bounded/unbounded ratio shows the plan stays sane with a date range (goal ≤ 2). Reference in the same run:
// a naive JS loop over the player's fetched rows (what the SQL aggregation replaces), checked to agree.
// Run: npx tsx bench/stats.ts   (STATS_PUTTS=50000 for a quick run, STATS_EXPLAIN=1 to print the plans)
import os from "node:os";
import { pathToFileURL } from "node:url";
import { eq, sql } from "drizzle-orm";
import { bandIndex, DEFAULT_BAND_EDGES_M } from "../shared/stats/bands";
import { openPglite, type Database } from "../server/db/client";
import { analyzeStale } from "../server/db/maintenance";
import { migrate } from "../server/db/migrate";
import { practiceSessions, putts } from "../server/db/schema";
import { bandCounts, periodCounts, weeklyCounts } from "../server/routes/stats/band-counts";
import { timeMsAsync } from "./timing";

export type StatsBenchRow = { what: string; unboundedMs: number; boundedMs: number; ratio: number };
export type StatsBenchResult = {
  putts: number;
  playerPutts: number;
  sessions: number;
  runs: number;
  maintenance: { ms: number; tables: number };
  rows: StatsBenchRow[];
  naiveJsMs: number;
  goalMs: number;
};

const PLAYER = "bench-player";
const PER_SESSION = 50;

/** Seeds in SQL (deterministic: setseed); the keen player owns every 10th session. Distances on the app's 0.1 m stepper. */
export async function seedClub(database: Database, totalPutts: number): Promise<{ sessions: number; playerPutts: number }> {
  const { db } = database;
  const sessions = Math.ceil(totalPutts / PER_SESSION);
  const owner = (s: string) => `case when ${s} % 10 = 0 then '${PLAYER}' else 'club-' || (${s} % 99) end`;
  await db.execute(
    sql.raw(`insert into "user"(id, name, email) select 'club-' || i, 'Club Player ' || i, 'club-' || i || '@borrowline.example' from generate_series(0, 98) i
    union all select '${PLAYER}', 'Keen Player', 'keen@borrowline.example'`),
  );
  await db.execute(sql`select setseed(0.2024)`);
  await db.execute(
    sql.raw(`insert into practice_sessions(id, player_id, date)
    select md5('s' || s)::uuid, ${owner("s")}, date '2021-01-01' + (s * 1460 / ${sessions}) from generate_series(0, ${sessions - 1}) s`),
  );
  await db.execute(
    sql.raw(`insert into putts(session_id, player_id, distance_m, holed, miss_length_m)
    select md5('s' || (i / ${PER_SESSION}))::uuid, ${owner(`(i / ${PER_SESSION})`)}, d, h, case when h then null else (random() - 0.4) * 0.3 * d end
    from (select i, round((0.3 + random() * random() * 15)::numeric, 1)::float8 as d, random() as u from generate_series(0, ${totalPutts - 1}) i) x,
      lateral (select x.u < 1 / (1 + exp((x.d - 2) / 0.8)) as h) y`),
  );
  const counted = (await db.execute(sql`select count(*)::int as n from putts where player_id = ${PLAYER}`)) as unknown as {
    rows: { n: number }[];
  };
  return { sessions, playerPutts: Number(counted.rows[0]!.n) };
}

export async function runStatsBench({
  totalPutts = Number(process.env.STATS_PUTTS ?? 500_000),
  runs = 15,
} = {}): Promise<StatsBenchResult> {
  const database = await openPglite("memory://");
  try {
    await migrate(database);
    const { db } = database;
    const { sessions, playerPutts } = await seedClub(database, totalPutts);
    const t0 = performance.now();
    const tables = await analyzeStale(db);
    const maintenance = { ms: performance.now() - t0, tables: tables.length };

    const edges = DEFAULT_BAND_EDGES_M.imperial;
    const all = { playerId: PLAYER, source: "practice" as const };
    const year = { ...all, from: "2023-01-01", to: "2023-12-31" };
    const a = { from: "2022-01-01", to: "2022-06-30" };
    const b = { from: "2023-01-01", to: "2023-06-30" };
    const wide = { a: { from: "2000-01-01", to: "2022-12-31" }, b: { from: "2023-01-01", to: "2099-12-31" } };

    const naive = async () => {
      const rows = await db
        .select({ distanceM: putts.distanceM, holed: putts.holed, date: practiceSessions.date })
        .from(putts)
        .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
        .where(eq(putts.playerId, PLAYER));
      const out = new Map<number, { attempts: number; made: number }>();
      for (const r of rows) {
        const k = bandIndex(r.distanceM, edges);
        const c = out.get(k) ?? { attempts: 0, made: 0 };
        c.attempts += 1;
        c.made += r.holed ? 1 : 0;
        out.set(k, c);
      }
      return out;
    };
    // The two methods must agree, or the timing compares different work.
    const js = await naive();
    for (const c of await bandCounts(db, all, edges)) {
      if (js.get(c.band)?.attempts !== c.attempts || js.get(c.band)?.made !== c.made)
        throw new Error(`SQL and JS disagree on band ${c.band}`);
    }

    const time = (fn: () => Promise<unknown>) => timeMsAsync(fn, runs, 3);
    const row = async (what: string, unbounded: () => Promise<unknown>, bounded: () => Promise<unknown>): Promise<StatsBenchRow> => {
      const unboundedMs = await time(unbounded);
      const boundedMs = await time(bounded);
      return { what, unboundedMs, boundedMs, ratio: boundedMs / unboundedMs };
    };
    const rows = [
      await row(
        "make rates (all dates | one year)",
        () => bandCounts(db, all, edges),
        () => bandCounts(db, year, edges),
      ),
      await row(
        "trend, 4-week rolling (all | one year)",
        () => weeklyCounts(db, all, edges, 4),
        () => weeklyCounts(db, year, edges, 4),
      ),
      await row(
        "compare (two halves of all | two half-years)",
        () => periodCounts(db, { ...all, ...wide }, edges),
        () => periodCounts(db, { ...all, a, b }, edges),
      ),
    ];
    const naiveJsMs = await time(naive);
    if (process.env.STATS_EXPLAIN) {
      const q = sql`select count(*) from putts p join practice_sessions s on s.id = p.session_id where p.player_id = ${PLAYER} and s.date between '2023-01-01' and '2023-12-31'`;
      const plan = (await db.execute(sql`explain analyze ${q}`)) as unknown as { rows: Record<string, string>[] };
      console.log(plan.rows.map((r) => r["QUERY PLAN"]).join("\n"));
    }
    return { putts: totalPutts, playerPutts, sessions, runs, maintenance, rows, naiveJsMs, goalMs: 100 };
  } finally {
    await database.close();
  }
}

export function printStatsBench(r: StatsBenchResult): void {
  const f = (ms: number) => `${ms.toFixed(1)} ms`.padStart(9);
  console.log(
    `${r.putts} putts in ${r.sessions} sessions of 100 players (PGlite in memory); the player measured has ${r.playerPutts}. Median of ${r.runs}.`,
  );
  console.log(
    `  the server's own maintenance step after the seed (analyzeStale: VACUUM ANALYZE of ${r.maintenance.tables} stale tables): ${f(r.maintenance.ms)}`,
  );
  console.log(`  ${"query".padEnd(46)} unbounded   bounded  ratio (goal ≤ 2)  goal ≤ ${r.goalMs} ms each`);
  for (const x of r.rows) {
    const met = x.unboundedMs <= r.goalMs && x.boundedMs <= r.goalMs;
    console.log(
      `  ${x.what.padEnd(46)}${f(x.unboundedMs)} ${f(x.boundedMs)}  ${x.ratio.toFixed(2).padStart(5)} ${x.ratio <= 2 ? "met" : "NOT met"}       ${met ? "met" : "NOT met"}`,
    );
  }
  const mr = r.rows[0]!;
  console.log(
    `  reference: naive JS loop over the player's fetched rows (all dates): ${f(r.naiveJsMs)} → SQL/JS ${(mr.unboundedMs / r.naiveJsMs).toFixed(3)}`,
  );
  console.log(
    `  (timer: performance.now(), sub-ms; the machine is shared, so read the figures beside its load average: ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")})`,
  );
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printStatsBench(await runStatsBench());
}
