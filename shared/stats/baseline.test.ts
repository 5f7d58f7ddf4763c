import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { METRES_PER_FOOT } from "../units";
import { interpolateBaseline, TOUR_EXPECTED_PUTTS, TOUR_ONE_PUTT_RATE, tourExpectedPutts, tourOnePuttRate } from "./baseline";

const ft = (x: number) => x * METRES_PER_FOOT;

test("the one-putt table is Broadie's, Every Shot Counts 2014 [secondary]: 8 ft ≈ 50 %, 10 ft 40 %, 20 ft 15 %", () => {
  // Values as listed in docs/sources.md, "Make rates" (secondary, attributed to Broadie 2014).
  expect(tourOnePuttRate(ft(8))).toBeCloseTo(0.5, 12);
  expect(tourOnePuttRate(ft(10))).toBeCloseTo(0.4, 12);
  expect(tourOnePuttRate(ft(20))).toBeCloseTo(0.15, 12);
  expect(tourOnePuttRate(ft(3))).toBeCloseTo(0.96, 12);
});

test("expected putts agree with the published points of Broadie, Putts Gained 2011: 1.5 from 8 ft, 2.0 from 33 ft", () => {
  // M. Broadie, "Putts Gained" (Columbia draft, 2011) [published]; the table itself is [memory], so this is the strict check.
  expect(tourExpectedPutts(ft(8))).toBeCloseTo(1.5, 2);
  expect(Math.abs(tourExpectedPutts(ft(33)) - 2.0)).toBeLessThan(0.02);
});

test("between points the interpolation is linear in log-distance (documented rule)", () => {
  // 8 → 10 ft: at √80 ft (the geometric mean) the value is the plain average of the two points.
  expect(tourExpectedPutts(ft(Math.sqrt(80)))).toBeCloseTo((1.5 + 1.61) / 2, 12);
  expect(tourOnePuttRate(ft(Math.sqrt(8 * 10)))).toBeCloseTo((0.5 + 0.4) / 2, 12);
  // Outside the table the end values are held.
  expect(tourExpectedPutts(0.1)).toBe(1.01);
  expect(tourExpectedPutts(ft(120))).toBe(2.21);
  expect(() => tourExpectedPutts(-1)).toThrow(RangeError);
});

test("the two series are consistent: a miss costs at least two putts, so E(d) ≥ 2 − P(one putt) [derived]", () => {
  for (const p of TOUR_ONE_PUTT_RATE.points) {
    const e = tourExpectedPutts(ft(p.distanceFt));
    expect(e).toBeGreaterThanOrEqual(2 - p.value - 1e-9);
  }
});

describe("baseline properties", () => {
  test("make rate falls and expected putts rise with distance; both stay in range", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 30, noNaN: true }), fc.double({ min: 0, max: 30, noNaN: true }), (a, b) => {
        const [near, far] = a <= b ? [a, b] : [b, a];
        const ok = tourOnePuttRate(near) >= tourOnePuttRate(far) - 1e-12 && tourExpectedPutts(near) <= tourExpectedPutts(far) + 1e-12;
        return ok && tourOnePuttRate(far) > 0 && tourOnePuttRate(near) <= 1 && tourExpectedPutts(near) >= 1;
      }),
    );
  });

  test("every table point is reproduced exactly", () => {
    for (const series of [TOUR_ONE_PUTT_RATE, TOUR_EXPECTED_PUTTS]) {
      for (const p of series.points) expect(interpolateBaseline(series, ft(p.distanceFt))).toBeCloseTo(p.value, 12);
    }
  });
});
