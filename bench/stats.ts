// Make-rate query benchmark: 50 000 putts in a fresh in-memory PGlite with the real migrations; the
// median time of the SQL aggregation (GROUP BY width_bucket) against two references measured in the
// same run: the same figures from a naive JS loop over every fetched row, and a plain count(*) scan.
// Run: npx tsx bench/stats.ts
import { seededUniform } from "../shared/seeded-random";
import { pathToFileURL } from "node:url";
import { eq, sql } from "drizzle-orm";
import { bandIndex, DEFAULT_BAND_EDGES_M } from "../shared/stats/bands";
import { openPglite } from "../server/db/client";
import { migrate } from "../server/db/migrate";
import { practiceSessions, putts, user } from "../server/db/schema";
import { bandCounts } from "../server/routes/stats/band-counts";
import { timeMsAsync } from "./timing";

export type StatsBenchResult = {
  putts: number;
  sessions: number;
  runs: number;
  makeRateMs: number;
  makeRateYearMs: number;
  naiveJsMs: number;
  countScanMs: number;
  /** makeRateMs / naiveJsMs: below 1 means SQL beats fetching every row into JS. */
  ratioVsNaiveJs: number;
  /** makeRateMs / countScanMs: the cost of the aggregation relative to a bare scan of the table. */
  ratioVsCountScan: number;
  goalMs: number;
};

export async function runStatsBench({ totalPutts = 50_000, perSession = 50, runs = 15 } = {}): Promise<StatsBenchResult> {
  const database = await openPglite("memory://");
  try {
    await migrate(database);
    const { db } = database;
    const playerId = "bench-player";
    await db.insert(user).values({ id: playerId, name: "Bench Player", email: "bench@borrowline.example" });
    // A second player's putts in the same table, so the query must filter, not just scan one player's rows.
    await db.insert(user).values({ id: "bench-other", name: "Other Player", email: "other@borrowline.example" });
    const rand = seededUniform(2024);
    const sessionCount = Math.ceil(totalPutts / perSession);
    const day0 = Date.UTC(2021, 0, 1);
    let made = 0;
    for (let s = 0; s < sessionCount; s++) {
      const owner = s % 10 === 9 ? "bench-other" : playerId;
      const date = new Date(day0 + Math.floor((s * 1460) / sessionCount) * 86_400_000).toISOString().slice(0, 10);
      const [row] = await db.insert(practiceSessions).values({ playerId: owner, date }).returning({ id: practiceSessions.id });
      const values = Array.from({ length: Math.min(perSession, totalPutts - made) }, () => {
        const distanceM = 0.3 + rand() * rand() * 15;
        const holed = rand() < 1 / (1 + Math.exp((distanceM - 2) / 0.8));
        return { sessionId: row!.id, playerId: owner, distanceM, holed, missLengthM: holed ? null : (rand() - 0.4) * 0.3 * distanceM };
      });
      made += values.length;
      await db.insert(putts).values(values);
    }
    await db.execute(sql`analyze`);

    const edges = DEFAULT_BAND_EDGES_M.imperial;
    const all = { playerId, source: "practice" as const };
    const year = { ...all, from: "2023-01-01", to: "2023-12-31" };
    const sqlCounts = await bandCounts(db, all, edges);

    const naive = async () => {
      const rows = await db
        .select({ distanceM: putts.distanceM, holed: putts.holed, date: practiceSessions.date })
        .from(putts)
        .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
        .where(eq(putts.playerId, playerId));
      const out = new Map<number, { attempts: number; made: number }>();
      for (const r of rows) {
        const b = bandIndex(r.distanceM, edges);
        const c = out.get(b) ?? { attempts: 0, made: 0 };
        c.attempts += 1;
        c.made += r.holed ? 1 : 0;
        out.set(b, c);
      }
      return out;
    };
    // The two methods must agree, or the timing compares different work.
    const js = await naive();
    for (const c of sqlCounts) {
      if (js.get(c.band)?.attempts !== c.attempts || js.get(c.band)?.made !== c.made) throw new Error(`SQL and JS disagree on band ${c.band}`);
    }

    const makeRateMs = await timeMsAsync(() => bandCounts(db, all, edges), runs, 3);
    const makeRateYearMs = await timeMsAsync(() => bandCounts(db, year, edges), runs, 3);
    const naiveJsMs = await timeMsAsync(naive, runs, 3);
    const countScanMs = await timeMsAsync(() => db.execute(sql`select count(*) from ${putts}`), runs, 3);
    return {
      putts: made,
      sessions: sessionCount,
      runs,
      makeRateMs,
      makeRateYearMs,
      naiveJsMs,
      countScanMs,
      ratioVsNaiveJs: makeRateMs / naiveJsMs,
      ratioVsCountScan: makeRateMs / countScanMs,
      goalMs: 100,
    };
  } finally {
    await database.close();
  }
}

export function printStatsBench(r: StatsBenchResult): void {
  const f = (ms: number) => `${ms.toFixed(1)} ms`;
  console.log(`make-rate query, ${r.putts} putts in ${r.sessions} sessions (PGlite in memory), median of ${r.runs}:`);
  console.log(`  all dates (45 000 of the player's putts): ${f(r.makeRateMs)}   goal ≤ ${r.goalMs} ms: ${r.makeRateMs <= r.goalMs ? "met" : "NOT met"}`);
  console.log(`  one year:                                  ${f(r.makeRateYearMs)}`);
  console.log(`  reference, naive JS loop over fetched rows: ${f(r.naiveJsMs)}  → SQL/JS ratio ${r.ratioVsNaiveJs.toFixed(3)}`);
  console.log(`  reference, select count(*) scan:            ${f(r.countScanMs)}  → SQL/count ratio ${r.ratioVsCountScan.toFixed(2)}`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printStatsBench(await runStatsBench());
}
