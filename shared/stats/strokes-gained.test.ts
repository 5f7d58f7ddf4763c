import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { METRES_PER_FOOT } from "../units";
import { tourExpectedPutts } from "./baseline";
import { assumedLeaveM, holeStrokesGained, lagOutsideRange, practicePuttValue, summarisePutts } from "./strokes-gained";

const ft = (x: number) => x * METRES_PER_FOOT;

test("a holed 8 ft putt gains 0.5 against the tour (Broadie, Putts Gained 2011: 1.5 putts from 8 ft)", () => {
  const v = practicePuttValue({ distanceM: ft(8), holed: true, missLengthM: null });
  expect(v.strokesGained).toBeCloseTo(0.5, 9);
  expect(v.puttsTaken).toBe(1);
});

test("a missed putt takes 1 + E(leave), the leave being |missLengthM| — short or long alike", () => {
  const short = practicePuttValue({ distanceM: ft(8), holed: false, missLengthM: -ft(3) });
  const long = practicePuttValue({ distanceM: ft(8), holed: false, missLengthM: ft(3) });
  expect(short.puttsTaken).toBeCloseTo(1 + 1.04, 9);
  expect(short.strokesGained).toBeCloseTo(1.5 - 2.04, 9);
  expect(long.strokesGained).toBeCloseTo(short.strokesGained, 12);
  expect(short.leaveAssumed).toBe(false);
});

test("an unknown leave uses the documented assumption max(0.45 m, 10 % of the length)", () => {
  expect(assumedLeaveM(2)).toBe(0.45);
  expect(assumedLeaveM(10)).toBe(1);
  const v = practicePuttValue({ distanceM: 10, holed: false, missLengthM: null });
  expect(v.leaveAssumed).toBe(true);
  expect(v.puttsTaken).toBeCloseTo(1 + tourExpectedPutts(1), 12);
});

test("a hole on the course: SG = E(first putt) − putts; no putt, no figure", () => {
  expect(holeStrokesGained(ft(33), 2)).toBeCloseTo(tourExpectedPutts(ft(33)) - 2, 12);
  expect(holeStrokesGained(ft(8), 3)).toBeCloseTo(-1.5, 9);
  expect(holeStrokesGained(5, 0)).toBeNull();
});

test("lags from 6 m that finish more than 1 m away are counted outside three-putt range", () => {
  expect(lagOutsideRange(5.9, false, 3)).toBeNull();
  expect(lagOutsideRange(6, false, -1.2)).toBe(true);
  expect(lagOutsideRange(6, false, 1)).toBe(false);
  expect(lagOutsideRange(9, true, null)).toBe(false);
  expect(lagOutsideRange(9, false, null)).toBeNull();
  const s = summarisePutts([
    { distanceM: 7, holed: false, missLengthM: 1.5 },
    { distanceM: 8, holed: false, missLengthM: -0.4 },
    { distanceM: 9, holed: false, missLengthM: null },
    { distanceM: 2, holed: true, missLengthM: null },
  ]);
  expect(s).toMatchObject({
    putts: 4,
    holed: 1,
    longPutts: 3,
    longPuttsKnown: 2,
    longLagsOutside1m: 1,
    longLagOutsideShare: 0.5,
    leavesAssumed: 1,
  });
});

describe("strokes gained properties", () => {
  test("SG telescopes: a miss leaving L then a holed putt from L sums to E(d) − 2 (Broadie 2012 definition)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 60, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }), (d, miss) => {
        const first = practicePuttValue({ distanceM: d, holed: false, missLengthM: miss });
        const second = practicePuttValue({ distanceM: Math.abs(miss), holed: true, missLengthM: null });
        return Math.abs(first.strokesGained + second.strokesGained - (tourExpectedPutts(d) - 2)) < 1e-9;
      }),
    );
  });

  test("a session's SG is the sum of its putts' SG", () => {
    const putt = fc.record({
      distanceM: fc.double({ min: 0.1, max: 60, noNaN: true }),
      holed: fc.boolean(),
      missLengthM: fc.option(fc.double({ min: -10, max: 10, noNaN: true })),
    });
    fc.assert(
      fc.property(fc.array(putt, { maxLength: 40 }), (ps) => {
        const sum = ps.reduce((acc, p) => acc + practicePuttValue(p).strokesGained, 0);
        return Math.abs(summarisePutts(ps).strokesGained - sum) < 1e-9;
      }),
    );
  });
});
