import type { z } from "zod";
import { and, asc, desc, eq, gte, inArray, lte, sql, type SQL } from "drizzle-orm";
import {
  compareQuerySchema,
  makeRatesQuerySchema,
  missesQuerySchema,
  sessionStatsQuerySchema,
  trendQuerySchema,
  type BandRate,
  type MakeRates,
  type MissBand,
  type Misses,
} from "../../../shared/schemas/stats";
import { bandsFromEdges, DEFAULT_BAND_EDGES_M, type Band } from "../../../shared/stats/bands";
import { BASELINE_INTERPOLATION, TOUR_EXPECTED_PUTTS, TOUR_ONE_PUTT_RATE, type BaselineSeries } from "../../../shared/stats/baseline";
import {
  ASSUMED_LEAVE_FRACTION,
  ASSUMED_LEAVE_MIN_M,
  LONG_PUTT_M,
  summarisePutts,
  THREE_PUTT_RANGE_M,
  type PracticePutt,
} from "../../../shared/stats/strokes-gained";
import { twoProportionZTest } from "../../../shared/stats/two-proportion";
import { rateOf } from "../../../shared/stats/wilson";
import { METRES_PER_FOOT } from "../../../shared/units";
import type { Db } from "../../db/client";
import { greens, practiceSessions, putts, userPreferences } from "../../db/schema";
import { targetPlayerId } from "../../lib/player-access";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";
import { bandCounts, periodCounts, weeklyCounts } from "./band-counts";

/** The bands asked for, or the defaults for the viewer's unit preference. */
async function edgesFor(db: Db, viewerId: string, asked: number[] | undefined): Promise<number[]> {
  if (asked) return asked;
  const [prefs] = await db.select({ units: userPreferences.units }).from(userPreferences).where(eq(userPreferences.userId, viewerId));
  return DEFAULT_BAND_EDGES_M[prefs?.units === "metric" ? "metric" : "imperial"];
}

const band = (b: Band) => ({ fromM: b.fromM, toM: b.toM });

export function makeRates(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof makeRatesQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const edges = await edgesFor(db, viewer.id, qs.bands);
    const counts = new Map(
      (await bandCounts(db, { playerId, from: qs.from, to: qs.to, source: qs.source }, edges)).map((c) => [c.band, c]),
    );
    const bands: BandRate[] = bandsFromEdges(edges).map((b, i) => ({
      ...band(b),
      ...rateOf(counts.get(i)?.made ?? 0, counts.get(i)?.attempts ?? 0),
    }));
    const out: MakeRates = { playerId, from: qs.from ?? null, to: qs.to ?? null, source: qs.source, bands };
    return out;
  };
}

export function trend(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof trendQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const edges = await edgesFor(db, viewer.id, qs.bands);
    const rows = await weeklyCounts(
      db,
      { playerId, from: qs.from, to: qs.to, source: qs.source },
      edges,
      qs.window === "rolling" ? qs.windowWeeks : undefined,
    );
    const bands = bandsFromEdges(edges);
    const weeks = new Map<string, ReturnType<typeof rateOf>[]>();
    for (const r of rows) {
      if (!weeks.has(r.week))
        weeks.set(
          r.week,
          bands.map(() => rateOf(0, 0)),
        );
      weeks.get(r.week)![r.band] = rateOf(r.made, r.attempts);
    }
    return {
      playerId,
      from: qs.from ?? null,
      to: qs.to ?? null,
      source: qs.source,
      window: qs.window,
      windowWeeks: qs.window === "rolling" ? qs.windowWeeks : 1,
      bands: bands.map(band),
      weeks: [...weeks].map(([weekStart, cells]) => ({ weekStart, bands: cells })),
    };
  };
}

export function compare(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof compareQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const edges = await edgesFor(db, viewer.id, qs.bands);
    const a = { from: qs.aFrom, to: qs.aTo };
    const b = { from: qs.bFrom, to: qs.bTo };
    const rows = new Map((await periodCounts(db, { playerId, source: qs.source, a, b }, edges)).map((r) => [r.band, r]));
    const side = (made: number, n: number, mb: number, nb: number) => ({
      a: rateOf(made, n),
      b: rateOf(mb, nb),
      ...twoProportionZTest(made, n, mb, nb),
    });
    const bands = bandsFromEdges(edges).map((bd, i) => {
      const r = rows.get(i);
      return { ...band(bd), ...side(r?.aMade ?? 0, r?.aAttempts ?? 0, r?.bMade ?? 0, r?.bAttempts ?? 0) };
    });
    const sum = (k: "aMade" | "aAttempts" | "bMade" | "bAttempts") => [...rows.values()].reduce((s, r) => s + r[k], 0);
    return {
      playerId,
      source: qs.source,
      a,
      b,
      // Overlapping periods count a putt in both; the z-test then overstates the evidence.
      overlap: a.from <= b.to && b.from <= a.to,
      bands,
      overall: side(sum("aMade"), sum("aAttempts"), sum("bMade"), sum("bAttempts")),
    };
  };
}

const series = (s: BaselineSeries) => ({
  label: s.label,
  source: s.source,
  firmness: s.firmness,
  points: s.points.map((p) => ({ distanceFt: p.distanceFt, distanceM: p.distanceFt * METRES_PER_FOOT, value: p.value })),
});

export const baseline = () => {
  return {
    onePuttRate: series(TOUR_ONE_PUTT_RATE),
    expectedPutts: series(TOUR_EXPECTED_PUTTS),
    interpolation: BASELINE_INTERPOLATION,
    strokesGained: {
      definition:
        "SG = baseline expected putts from the putt's distance − putts taken; a holed putt took 1, a miss 1 + expected putts from its leave (M. Broadie, Interfaces 42(2), 2012).",
      unknownLeave: `A miss without a recorded leave is assumed to finish max(${ASSUMED_LEAVE_MIN_M} m, ${ASSUMED_LEAVE_FRACTION * 100} % of its length) away.`,
      longPuttM: LONG_PUTT_M,
      threePuttRangeM: THREE_PUTT_RANGE_M,
    },
  };
};

export function sessionStats(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof sessionStatsQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const where: SQL[] = [eq(practiceSessions.playerId, playerId)];
    if (qs.from) where.push(gte(practiceSessions.date, qs.from));
    if (qs.to) where.push(lte(practiceSessions.date, qs.to));
    const cond = and(...where)!;
    const [sessions, [total]] = await Promise.all([
      db
        .select({ id: practiceSessions.id, date: practiceSessions.date, greenName: greens.name, stimpFt: practiceSessions.stimpFt })
        .from(practiceSessions)
        .leftJoin(greens, eq(greens.id, practiceSessions.greenId))
        .where(cond)
        .orderBy(desc(practiceSessions.date), desc(practiceSessions.createdAt), asc(practiceSessions.id))
        .limit(qs.pageSize)
        .offset((qs.page - 1) * qs.pageSize),
      db
        .select({ n: sql<number>`count(*)::int` })
        .from(practiceSessions)
        .where(cond),
    ]);
    const ids = sessions.map((s) => s.id);
    const byId = new Map<string, PracticePutt[]>(ids.map((id) => [id, []]));
    if (ids.length > 0) {
      const rows = await db
        .select({ sessionId: putts.sessionId, distanceM: putts.distanceM, holed: putts.holed, missLengthM: putts.missLengthM })
        .from(putts)
        .where(and(eq(putts.playerId, playerId), inArray(putts.sessionId, ids)));
      for (const r of rows) byId.get(r.sessionId)!.push(r);
    }
    return {
      playerId,
      items: sessions.map((s) => ({
        sessionId: s.id,
        date: s.date,
        greenName: s.greenName,
        stimpFt: s.stimpFt,
        ...summarisePutts(byId.get(s.id)!),
      })),
      total: Number(total?.n ?? 0),
      page: qs.page,
      pageSize: qs.pageSize,
    };
  };
}

/**
 * The pattern of a player's practice misses per band (left/right, short/long) and the strokes gained or
 * lost in each band against the tour baseline: where the strokes go.
 */
export function misses(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof missesQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const edges = await edgesFor(db, viewer.id, qs.bands);
    const where: SQL[] = [eq(putts.playerId, playerId)];
    if (qs.from) where.push(gte(practiceSessions.date, qs.from));
    if (qs.to) where.push(lte(practiceSessions.date, qs.to));
    const rows = await db
      .select({ distanceM: putts.distanceM, holed: putts.holed, missSide: putts.missSide, missLengthM: putts.missLengthM })
      .from(putts)
      .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
      .where(and(...where));
    const bands = bandsFromEdges(edges);
    const groups: PracticePutt[][] = bands.map(() => []);
    const out: MissBand[] = bands.map((b) => ({
      ...band(b),
      attempts: 0,
      made: 0,
      missed: 0,
      left: 0,
      right: 0,
      short: 0,
      long: 0,
      strokesGained: 0,
      leavesAssumed: 0,
    }));
    for (const r of rows) {
      // The band holds its lower edge and excludes its upper one; the last is open-ended (as width_bucket does).
      const i = bands.findIndex((b) => r.distanceM >= b.fromM && (b.toM === null || r.distanceM < b.toM));
      if (i < 0) continue;
      groups[i]!.push(r);
      const o = out[i]!;
      if (r.holed) continue;
      o.missed += 1;
      if (r.missSide === "left") o.left += 1;
      if (r.missSide === "right") o.right += 1;
      if (r.missLengthM !== null && r.missLengthM < 0) o.short += 1;
      if (r.missLengthM !== null && r.missLengthM > 0) o.long += 1;
    }
    groups.forEach((g, i) => {
      const v = summarisePutts(g);
      Object.assign(out[i]!, { attempts: v.putts, made: v.holed, strokesGained: v.strokesGained, leavesAssumed: v.leavesAssumed });
    });
    const answer: Misses = { playerId, from: qs.from ?? null, to: qs.to ?? null, bands: out };
    return answer;
  };
}
