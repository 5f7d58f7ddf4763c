// The make-rate aggregations, done in SQL: width_bucket over [0, ...edges] puts each putt in its band
// (lower edge included, upper excluded, the last band open-ended), GROUP BY counts attempts and makes.
// Shared by the stats handlers and bench/stats.ts.
import { sql, type SQL } from "drizzle-orm";
import type { StatSource } from "../../../shared/schemas/stats";
import type { Db } from "../../db/client";
import { practiceSessions, putts, roundHoles, rounds } from "../../db/schema";

export type CountsFilter = { playerId: string; from?: string; to?: string; source: StatSource };
export type BandCount = { band: number; attempts: number; made: number };

/** Rows (d = distance m, made, day) of the chosen source for one player and date range. */
function attemptsSource({ playerId, from, to, source }: CountsFilter): SQL {
  const practice = sql`select ${putts.distanceM} as d, ${putts.holed} as made, ${practiceSessions.date} as day
    from ${putts} inner join ${practiceSessions} on ${practiceSessions.id} = ${putts.sessionId}
    where ${putts.playerId} = ${playerId}
    ${from ? sql`and ${practiceSessions.date} >= ${from}::date` : sql``}
    ${to ? sql`and ${practiceSessions.date} <= ${to}::date` : sql``}`;
  // On the course only the first putt of each hole is an attempt from a known distance; a one-putt is a make.
  const onCourse = sql`select ${roundHoles.firstPuttM} as d, (${roundHoles.putts} = 1) as made, ${rounds.date} as day
    from ${roundHoles} inner join ${rounds} on ${rounds.id} = ${roundHoles.roundId}
    where ${rounds.playerId} = ${playerId} and ${roundHoles.putts} > 0
    ${from ? sql`and ${rounds.date} >= ${from}::date` : sql``}
    ${to ? sql`and ${rounds.date} <= ${to}::date` : sql``}`;
  if (source === "practice") return practice;
  if (source === "rounds") return onCourse;
  return sql`${practice} union all ${onCourse}`;
}

/** width_bucket(d, ARRAY[0, e1, …]) − 1: the 0-based band index. */
function bandExpr(edgesM: readonly number[], column: SQL): SQL {
  const bounds = [0, ...edgesM].map((e) => sql`${e}::float8`);
  return sql`(width_bucket(${column}, ARRAY[${sql.join(bounds, sql`, `)}]) - 1)`;
}

function rowsOf<T>(result: unknown): T[] {
  return (result as { rows: T[] }).rows;
}

/** Attempts and makes per band (bands with no attempts are absent). */
export async function bandCounts(db: Db, filter: CountsFilter, edgesM: readonly number[]): Promise<BandCount[]> {
  const q = sql`select ${bandExpr(edgesM, sql`x.d`)} as band, count(*)::int as attempts, (count(*) filter (where x.made))::int as made
    from (${attemptsSource(filter)}) as x group by 1 order by 1`;
  return rowsOf<BandCount>(await db.execute(q)).map((r) => ({ band: Number(r.band), attempts: Number(r.attempts), made: Number(r.made) }));
}

export type PeriodCount = { band: number; aAttempts: number; aMade: number; bAttempts: number; bMade: number };

/** Attempts and makes per band in two periods (inclusive dates); one scan over the span of both. */
export async function periodCounts(
  db: Db,
  f: { playerId: string; source: StatSource; a: { from: string; to: string }; b: { from: string; to: string } },
  edgesM: readonly number[],
): Promise<PeriodCount[]> {
  const from = f.a.from < f.b.from ? f.a.from : f.b.from;
  const to = f.a.to > f.b.to ? f.a.to : f.b.to;
  const inA = sql`x.day between ${f.a.from}::date and ${f.a.to}::date`;
  const inB = sql`x.day between ${f.b.from}::date and ${f.b.to}::date`;
  const q = sql`select ${bandExpr(edgesM, sql`x.d`)} as band,
      (count(*) filter (where ${inA}))::int as "aAttempts", (count(*) filter (where ${inA} and x.made))::int as "aMade",
      (count(*) filter (where ${inB}))::int as "bAttempts", (count(*) filter (where ${inB} and x.made))::int as "bMade"
    from (${attemptsSource({ playerId: f.playerId, source: f.source, from, to })}) as x group by 1 order by 1`;
  return rowsOf<PeriodCount>(await db.execute(q)).map((r) => ({
    band: Number(r.band),
    aAttempts: Number(r.aAttempts),
    aMade: Number(r.aMade),
    bAttempts: Number(r.bAttempts),
    bMade: Number(r.bMade),
  }));
}

export type WeekCount = { week: string; band: number; attempts: number; made: number };

/**
 * Per ISO week (Monday start) and band. With rollingWeeks, each week's counts are the sums over that week
 * and the rollingWeeks − 1 weeks before it (a SQL window over a week × band grid, so an empty band-week
 * still carries the window). Only weeks with at least one attempt appear.
 */
export async function weeklyCounts(db: Db, filter: CountsFilter, edgesM: readonly number[], rollingWeeks?: number): Promise<WeekCount[]> {
  const lastBand = edgesM.length;
  const base = sql`with c as (
      select date_trunc('week', x.day)::date as w, ${bandExpr(edgesM, sql`x.d`)} as b, count(*)::int as n, (count(*) filter (where x.made))::int as m
      from (${attemptsSource(filter)}) as x group by 1, 2),
    weeks as (select distinct w from c),
    grid as (select weeks.w, g.b from weeks cross join generate_series(0, ${lastBand}::int) as g(b)),
    cells as (select grid.w, grid.b, coalesce(c.n, 0) as n, coalesce(c.m, 0) as m from grid left join c on c.w = grid.w and c.b = grid.b)`;
  // The frame offset must be a constant: a validated integer (2–12 weeks), inlined.
  const q = rollingWeeks
    ? sql`${base} select to_char(w, 'YYYY-MM-DD') as week, b as band,
          (sum(n) over win)::int as attempts, (sum(m) over win)::int as made
        from cells window win as (partition by b order by w range between ${sql.raw(`'${(Math.trunc(rollingWeeks) - 1) * 7} days'::interval`)} preceding and current row)
        order by w, b`
    : sql`${base} select to_char(w, 'YYYY-MM-DD') as week, b as band, n as attempts, m as made from cells order by w, b`;
  return rowsOf<WeekCount>(await db.execute(q)).map((r) => ({
    week: String(r.week),
    band: Number(r.band),
    attempts: Number(r.attempts),
    made: Number(r.made),
  }));
}
