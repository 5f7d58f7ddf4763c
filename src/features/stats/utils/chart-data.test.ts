import { expect, test } from "vitest";
import { TOUR_ONE_PUTT_RATE } from "#shared/stats/baseline";
import { twoProportionZTest } from "#shared/stats/two-proportion";
import { rateOf, wilsonInterval } from "#shared/stats/wilson";
import { METRES_PER_FOOT } from "#shared/units";
import type { Compare, SessionStat, Trend } from "../api/types";
import {
  compareRows,
  defaultTrendBands,
  formatP,
  lagSummary,
  makeRateRows,
  sampleCaution,
  sessionRows,
  tourRateForBand,
  trendRows,
  verdict,
} from "./chart-data";

const ft = (x: number) => x * METRES_PER_FOOT;
const band = (fromFt: number, toFt: number | null, made: number, attempts: number) => ({
  fromM: ft(fromFt),
  toM: toFt === null ? null : ft(toFt),
  ...rateOf(made, attempts),
});

test("make-rate rows carry the rate and its Wilson interval in percent, and an empty band has no range", () => {
  const rows = makeRateRows([band(0, 3, 7, 8), band(3, 6, 0, 0), band(30, null, 1, 40)], "imperial", TOUR_ONE_PUTT_RATE);
  const [lo, hi] = wilsonInterval(7, 8)!;
  expect(rows[0]).toMatchObject({
    label: "0–3 ft",
    attempts: 8,
    made: 7,
    rate: 87.5,
    lo: Math.round(lo * 1000) / 10,
    hi: Math.round(hi * 1000) / 10,
  });
  expect(rows[0]!.range).toEqual([rows[0]!.lo, rows[0]!.hi]);
  expect(rows[0]!.err![0]).toBeCloseTo(87.5 - rows[0]!.lo!, 6);
  expect(rows[0]!.err![1]).toBeCloseTo(rows[0]!.hi! - 87.5, 6);
  expect(rows[1]!.err).toBeNull();
  expect(rows[0]!.lo!).toBeLessThan(87.5);
  expect(rows[0]!.hi!).toBeGreaterThan(87.5);
  expect(rows[1]).toMatchObject({ label: "3–6 ft", rate: null, range: null, caution: null });
  // The open 30+ ft band takes the tour value at 30 ft: 7 % (Broadie, Every Shot Counts 2014, as quoted [secondary]).
  expect(rows[2]).toMatchObject({ label: "30+ ft", tour: 7, caution: null });
  expect(rows[0]!.caution).toBe("based on 8 putts — wide interval");
});

test("the tour rate of a band is the curve averaged across the band, between its end values", () => {
  // 3 ft 96 %, 4 ft 88 %, 5 ft 77 %, 6 ft interpolated (Broadie 2014, as quoted [secondary]).
  const r = tourRateForBand(TOUR_ONE_PUTT_RATE, ft(3), ft(6));
  expect(r).toBeLessThan(0.96);
  expect(r).toBeGreaterThan(0.7);
  // A narrow band is close to its midpoint value.
  expect(tourRateForBand(TOUR_ONE_PUTT_RATE, ft(7.99), ft(8.01))).toBeCloseTo(0.5, 3);
});

test("small samples are named with their size; enough putts or none need no caution", () => {
  expect(sampleCaution(7)).toBe("based on 7 putts — wide interval");
  expect(sampleCaution(1)).toBe("based on 1 putt — wide interval");
  expect(sampleCaution(30)).toBeNull();
  expect(sampleCaution(0)).toBeNull();
});

const trend: Trend = {
  playerId: "p1",
  from: null,
  to: null,
  source: "practice",
  window: "week",
  windowWeeks: 1,
  bands: [
    { fromM: 0, toM: 1 },
    { fromM: 1, toM: 2 },
    { fromM: 2, toM: null },
  ],
  weeks: [
    { weekStart: "2024-05-06", bands: [rateOf(3, 4), rateOf(0, 0), rateOf(1, 10)] },
    { weekStart: "2024-05-13", bands: [rateOf(5, 5), rateOf(1, 2), rateOf(0, 0)] },
  ],
};

test("trend rows give each chosen band's weekly rate, with a gap (null) for a week without putts", () => {
  const { rows, series } = trendRows(trend, [0, 1], "metric");
  expect(series).toEqual([
    { key: "b0", band: 0, label: "0–1 m" },
    { key: "b1", band: 1, label: "1–2 m" },
  ]);
  expect(rows).toEqual([
    { weekStart: "2024-05-06", label: expect.stringMatching(/^(6 May|May 6)$/), b0: 75, b0n: 4, b1: null, b1n: 0 },
    { weekStart: "2024-05-13", label: expect.stringMatching(/^(13 May|May 13)$/), b0: 100, b0n: 5, b1: 50, b1n: 2 },
  ]);
  expect(defaultTrendBands(trend, 2)).toEqual([0, 2]);
});

test("a compared band reads as a real change only below p = 0.05, with the direction", () => {
  const real = { a: rateOf(12, 30), b: rateOf(24, 30), ...twoProportionZTest(12, 30, 24, 30) };
  expect(verdict(real)).toMatchObject({ tone: "real", words: expect.stringMatching(/^likely a real change \(better, p = 0\.00\d\)$/) });
  const chance = { a: rateOf(1, 10), b: rateOf(2, 10), ...twoProportionZTest(1, 10, 2, 10) };
  expect(verdict(chance)).toMatchObject({ tone: "chance", words: expect.stringMatching(/^could be chance/) });
  expect(verdict({ a: rateOf(0, 0), b: rateOf(3, 4), difference: null, z: null, pValue: null }).tone).toBe("none");
  expect(verdict({ a: rateOf(0, 5), b: rateOf(0, 7), ...twoProportionZTest(0, 5, 0, 7) }).words).toBe(
    "none holed in either period: nothing to test",
  );
  expect(verdict({ a: rateOf(5, 5), b: rateOf(7, 7), ...twoProportionZTest(5, 5, 7, 7) }).words).toBe(
    "all holed in both periods: nothing to test",
  );
  expect(formatP(0.0004)).toBe("p < 0.001");
  expect(formatP(0.2345)).toBe("p = 0.23");

  const compare: Compare = {
    playerId: "p1",
    source: "practice",
    a: { from: "2024-04-01", to: "2024-04-30" },
    b: { from: "2024-05-01", to: "2024-05-31" },
    overlap: false,
    bands: [{ fromM: 0, toM: 2, ...real }],
    overall: real,
  };
  const [row] = compareRows(compare, "metric");
  expect(row).toMatchObject({ label: "0–2 m", a: 40, b: 80, difference: 40, aAttempts: 30, bAttempts: 30, caution: null });
  // Error bars are the distances from the rate to the interval's ends.
  const [alo, ahi] = wilsonInterval(12, 30)!;
  expect(row!.aErr![0]).toBeCloseTo((0.4 - alo) * 100, 0);
  expect(row!.aErr![1]).toBeCloseTo((ahi - 0.4) * 100, 0);
});

const sessionStat = (date: string, putts: number, sg: number, lags: [number, number, number]): SessionStat => ({
  sessionId: date,
  date,
  greenName: null,
  stimpFt: null,
  putts,
  holed: 0,
  expectedPutts: 0,
  puttsTaken: 0,
  strokesGained: sg,
  leavesAssumed: 1,
  longPutts: lags[0],
  longPuttsKnown: lags[1],
  longLagsOutside1m: lags[2],
  longLagOutsideShare: null,
});

test("session rows run oldest first without empty sessions; the lag share pools the known finishes", () => {
  const items = [
    sessionStat("2024-05-20", 10, -1.234, [4, 3, 1]),
    sessionStat("2024-05-01", 20, 0.5, [2, 2, 1]),
    sessionStat("2024-05-10", 0, 0, [0, 0, 0]),
  ];
  expect(sessionRows(items).map((r) => [r.date, r.strokesGained, r.perPutt])).toEqual([
    ["2024-05-01", 0.5, 0.025],
    ["2024-05-20", -1.23, -0.123],
  ]);
  expect(lagSummary(items)).toEqual({ lags: 6, known: 5, outside: 2, share: 0.4, assumedLeaves: 3 });
});
