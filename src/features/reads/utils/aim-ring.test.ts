import { expect, test } from "vitest";
import { breakChart } from "#physics";
import { feetToMetres } from "#shared/units";
import type { BreakChartAnswer } from "./chart-data";
import { RING_BEARINGS_DEG, aimRings, fallLineForBearing, ringFallLineDegs, ringLengthsM, spotOnPlan } from "./aim-ring";

/** The physics model's chart for the picture's grid, shaped as the API answers it. */
function modelRings(slopePct: number, stimpFt: number, lengthsM: number[]) {
  const c = breakChart({ slopePct, stimpFt, distancesM: lengthsM, fallLineDegs: ringFallLineDegs(), pace: { rollPastM: 0.45 } });
  const answer: BreakChartAnswer = { distances: [...c.distancesM], fallLineDegs: [...c.fallLineDegs], canStop: c.canStop, cells: c.cells };
  return aimRings(answer);
}

const spotAt = (ring: ReturnType<typeof aimRings>[number], bearingDeg: number) => ring.spots.find((s) => s.bearingDeg === bearingDeg)!;

test("bearings map onto the product's fall-line frame: a ball above the hole putts downhill (0), below it uphill (180)", () => {
  // Product brief's frame: 0 = straight downhill, 180 = straight uphill, 90 = the green falls to the golfer's right.
  expect(fallLineForBearing(0)).toBe(0);
  expect(fallLineForBearing(180)).toBe(180);
  // A ball right of the hole (seen from below) looks left across the slope: downhill is on its left.
  expect(fallLineForBearing(90)).toBe(270);
  expect(fallLineForBearing(270)).toBe(90);
  expect(new Set(ringFallLineDegs()).size).toBe(RING_BEARINGS_DEG.length);
});

test("an aim to the golfer's right lies on the plan at the golfer's right hand", () => {
  // Ball below the hole looking uphill: the golfer's right is the plan's +x.
  const [x1, y1] = spotOnPlan(180, 0.1);
  expect(x1).toBeCloseTo(0.1, 12);
  expect(y1).toBeCloseTo(0, 12);
  // Ball right of the hole looking left (toward −x): the golfer's right is uphill (+y).
  const [x2, y2] = spotOnPlan(90, 0.1);
  expect(x2).toBeCloseTo(0, 12);
  expect(y2).toBeCloseTo(0.1, 12);
});

test("physics: straight up and straight down the slope the aim spot is the hole; across it, the spot is uphill of the hole", () => {
  // docs/sources.md, Break: no break straight up or down the fall line; the start line is on the high side (derived).
  const rings = modelRings(2, 10, [feetToMetres(10)]);
  const ring = rings[0]!;
  expect(ring.missing).toBe(0);
  expect(ring.spots).toHaveLength(24);
  for (const straight of [0, 180]) {
    const s = spotAt(ring, straight);
    expect(Math.hypot(s.xM, s.yM)).toBeLessThan(0.005);
  }
  for (const across of [90, 270]) {
    const s = spotAt(ring, across);
    expect(s.yM).toBeGreaterThan(0.1);
    expect(Math.abs(s.xM)).toBeLessThan(0.005);
  }
  // Every spot is on the high side of the hole (or at it).
  for (const s of ring.spots) expect(s.yM).toBeGreaterThan(-0.002);
});

test("physics: the figure is mirror-symmetric about the fall line, and longer putts' spots lie further uphill", () => {
  // A plane has no left or right of its own: a ball at β and at 360° − β see mirror-image putts (derived).
  const [short, long] = modelRings(2.5, 11, [1.5, 5]);
  for (const s of long!.spots) {
    const m = spotAt(long!, (360 - s.bearingDeg) % 360);
    expect(m.xM).toBeCloseTo(-s.xM, 3);
    expect(m.yM).toBeCloseTo(s.yM, 3);
  }
  expect(spotAt(long!, 90).yM).toBeGreaterThan(spotAt(short!, 90).yM * 2);
});

test("physics: neighbouring sides share nearly one aim spot (Grober 2011, docs/sources.md, Break)", () => {
  // Putts of equal length within about ±30° of each other share one target point: across the slope, the spots of
  // balls 15° either side of straight across lie within a third of the spot's own height of it.
  const ring = modelRings(2, 10, [feetToMetres(15)])[0]!;
  const across = spotAt(ring, 90);
  for (const b of [75, 105]) {
    const s = spotAt(ring, b);
    expect(Math.hypot(s.xM - across.xM, s.yM - across.yM)).toBeLessThan(across.yM / 3);
  }
});

test("a side whose ball cannot stop is counted as missing, not drawn", () => {
  const answer: BreakChartAnswer = {
    distances: [1],
    fallLineDegs: [0, 90],
    canStop: true,
    cells: [
      [
        {
          ok: true,
          aimGiven: "offset",
          distanceM: 1,
          fallLineDeg: 0,
          aimOffsetM: 0,
          startLineDeg: 0,
          launchSpeedMps: 1,
          entrySpeedMps: 0.5,
        },
        { ok: false, distanceM: 1, fallLineDeg: 90, reason: "cannot-stop" },
      ],
    ],
  };
  const [ring] = aimRings(answer);
  expect(ring!.spots.map((s) => s.bearingDeg)).toEqual([0]);
  expect(ring!.missing).toBe(1);
});

test("lengths drawn: 3, 6, 10, 15, 20 ft or 1, 2, 3, 5, 7 m", () => {
  expect(ringLengthsM("imperial").map((m) => Math.round(m / 0.3048))).toEqual([3, 6, 10, 15, 20]);
  expect(ringLengthsM("metric")).toEqual([1, 2, 3, 5, 7]);
});
