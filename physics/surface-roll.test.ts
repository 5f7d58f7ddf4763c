import { describe, expect, test } from "vitest";
import fc from "fast-check";
import {
  DEFAULT_ROLL_MODEL,
  maxStoppableSlopePct,
  rollingDecelFromStimp,
  simulateRoll,
  simulateRollOnSurface,
  solveRead,
  solveReadOnSurface,
  surfaceFromGrid,
  type HeightSurface,
} from "./index";

const ONE_MM = 1e-3;
const GF = DEFAULT_ROLL_MODEL.gravityMps2 / (1 + DEFAULT_ROLL_MODEL.inertiaRatio);
/** Uniform on [min, max] in 10⁶ steps. */
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 1_000_000 }).map((k) => min + ((max - min) * k) / 1_000_000);

/** A grid over [x0, x0 + (n−1)h] × [y0, …] from a height function, rows north to south. */
function gridSurface(f: (x: number, y: number) => number, x0: number, y0: number, n: number, h: number): HeightSurface {
  const heightsM = Array.from({ length: n }, (_, r) => Array.from({ length: n }, (_, i) => f(x0 + i * h, y0 + (n - 1 - r) * h)));
  return surfaceFromGrid({ spacingM: h, originM: [x0, y0], heightsM });
}

/** The planar model's inputs for a putt from ball to hole on the plane h = gx·x + gy·y (derived). */
function planarEquivalent(g: [number, number], ball: [number, number], hole: [number, number]) {
  const D = Math.hypot(hole[0] - ball[0], hole[1] - ball[1]);
  const ey = [(hole[0] - ball[0]) / D, (hole[1] - ball[1]) / D] as const;
  const ex = [ey[1], -ey[0]] as const;
  const d = [-g[0], -g[1]];
  return {
    distanceM: D,
    slopePct: 100 * Math.hypot(g[0], g[1]),
    fallLineDeg: ((Math.atan2(d[0]! * ex[0] + d[1]! * ex[1], d[0]! * ey[0] + d[1]! * ey[1]) * 180) / Math.PI + 360) % 360,
    toGreen: ([x, y]: readonly [number, number]): [number, number] => [ball[0] + x * ex[0] + y * ey[0], ball[1] + x * ex[1] + y * ey[1]],
  };
}

describe("a planar height map is the planar model (derived: the same equation of motion)", () => {
  const plane = { g: [0.018, -0.011] as [number, number] };
  const surface = gridSurface((x, y) => plane.g[0] * x + plane.g[1] * y, 0, 0, 41, 0.5);

  test("the surface reproduces the plane's height and gradient exactly (bicubic Hermite is exact for planes)", () => {
    const out: [number, number] = [0, 0];
    for (const [x, y] of [
      [0.1, 0.1],
      [7.3, 12.9],
      [19.99, 0.01],
    ] as const) {
      surface.gradientAt(x, y, out);
      expect(out[0]).toBeCloseTo(plane.g[0], 12);
      expect(out[1]).toBeCloseTo(plane.g[1], 12);
      expect(surface.heightAt(x, y)).toBeCloseTo(plane.g[0] * x + plane.g[1] * y, 12);
    }
  });

  test("forward rolls agree with simulateRoll to 1 mm (rest point and closest pass)", () => {
    fc.assert(
      fc.property(
        uniform(4, 16),
        uniform(4, 16),
        uniform(0, 2 * Math.PI),
        uniform(1, 5),
        uniform(0.5, 2.5),
        uniform(-8, 8),
        uniform(8, 13),
        (bx, by, bearing, D, v, line, stimpFt) => {
          const ball: [number, number] = [bx, by];
          const hole: [number, number] = [bx + D * Math.sin(bearing), by + D * Math.cos(bearing)];
          const p = planarEquivalent(plane.g, ball, hole);
          const flat = simulateRoll({
            distanceM: p.distanceM,
            slopePct: p.slopePct,
            fallLineDeg: p.fallLineDeg,
            stimpFt,
            launchSpeedMps: v,
            startLineDeg: line,
          });
          const onMap = simulateRollOnSurface({ surface, stimpFt, ballM: ball, holeM: hole, launchSpeedMps: v, startLineDeg: line });
          if (!flat.ok) return false;
          if (!onMap.ok) return onMap.reason === "off-map"; // a roll that leaves the 20 m map has no planar rest to compare
          const rest = p.toGreen(flat.roll.restM);
          expect(Math.hypot(rest[0] - onMap.roll.restM[0], rest[1] - onMap.roll.restM[1])).toBeLessThan(ONE_MM);
          const pass = p.toGreen(flat.roll.closestApproach.pointM);
          expect(Math.hypot(pass[0] - onMap.roll.closestApproach.pointM[0], pass[1] - onMap.roll.closestApproach.pointM[1])).toBeLessThan(
            ONE_MM,
          );
          expect(onMap.roll.restarts).toBe(0);
          return true;
        },
      ),
      { numRuns: 25, seed: 314 },
    );
  });

  test.each([
    [[10, 4], [10, 7], { rollPastM: 0.45 }],
    [[3, 15], [8, 12], { rollPastM: 0.2 }],
    [[15, 15], [12, 9], { entrySpeedMps: 0.9 }],
  ] as const)("the read from %o to %o equals solveRead's to 1 mm", (ball, hole, pace) => {
    const p = planarEquivalent(plane.g, [...ball], [...hole]);
    const flat = solveRead({ distanceM: p.distanceM, slopePct: p.slopePct, fallLineDeg: p.fallLineDeg, stimpFt: 10, pace });
    const onMap = solveReadOnSurface({ surface, stimpFt: 10, ballM: ball, holeM: hole, pace });
    if (!flat.ok || !onMap.ok) throw new Error("both must solve");
    expect(Math.abs(onMap.read.aimOffsetM! - flat.read.aimOffsetM!)).toBeLessThan(ONE_MM);
    expect(Math.abs(onMap.read.startLineDeg - flat.read.startLineDeg)).toBeLessThan((ONE_MM / p.distanceM) * (180 / Math.PI));
    expect(Math.abs(onMap.read.launchSpeedMps - flat.read.launchSpeedMps)).toBeLessThan(1e-3);
    expect(Math.abs(onMap.read.rollPastM - flat.read.rollPastM)).toBeLessThan(ONE_MM);
    expect(onMap.read.breaks).toBe(flat.read.breaks);
    const restFlat = p.toGreen(flat.read.restM);
    expect(Math.hypot(restFlat[0] - onMap.read.restM[0], restFlat[1] - onMap.read.restM[1])).toBeLessThan(ONE_MM);
  });
});

test("a symmetric saddle gives mirror reads (derived: h(−x, y) = h(x, y))", () => {
  const surface = gridSurface((x, y) => 0.004 * (x * x - y * y) + 0.01 * y, -4, -4, 33, 0.25);
  const left = solveReadOnSurface({ surface, stimpFt: 10, ballM: [-1.2, -2.5], holeM: [-0.4, 1.5] });
  const right = solveReadOnSurface({ surface, stimpFt: 10, ballM: [1.2, -2.5], holeM: [0.4, 1.5] });
  if (!left.ok || !right.ok) throw new Error("both must solve");
  expect(Math.abs(left.read.startLineDeg + right.read.startLineDeg)).toBeLessThan(1e-4);
  expect(Math.abs(left.read.aimOffsetM! + right.read.aimOffsetM!)).toBeLessThan(ONE_MM);
  expect(Math.abs(left.read.launchSpeedMps - right.read.launchSpeedMps)).toBeLessThan(1e-4);
  expect(Math.abs(left.read.restM[0] + right.read.restM[0])).toBeLessThan(ONE_MM);
  expect(Math.abs(left.read.restM[1] - right.read.restM[1])).toBeLessThan(ONE_MM);
  // Along the symmetry line the read is straight.
  const middle = solveReadOnSurface({ surface, stimpFt: 10, ballM: [0, -2.5], holeM: [0, 1.5] });
  if (!middle.ok) throw new Error("must solve");
  expect(Math.abs(middle.read.aimOffsetM!)).toBeLessThan(ONE_MM);
});

describe("a bowl (h = c·r², derived energy bounds)", () => {
  /** E = ½v² + (5/7)g·h per unit mass; on the surface dE/dt = −a_r|v| + (5/7)g(v·∇h)(1 − 1/√(1+|∇h|²)) (derived). */
  const energy = (v: number, h: number) => 0.5 * v * v + GF * h;

  test("a gentle roll comes to rest inside where the slope holds it, with the energy accounted for", () => {
    const bowl = gridSurface((x, y) => 0.01 * (x * x + y * y), -3, -3, 49, 0.125);
    const v0 = 0.8;
    const r = simulateRollOnSurface({ surface: bowl, stimpFt: 10, ballM: [0, 0], holeM: [0, 2], launchSpeedMps: v0, startLineDeg: 30 });
    if (!r.ok) throw new Error("must stop in the bowl");
    const [x, y] = r.roll.restM;
    expect(Math.hypot(x, y)).toBeLessThan(3);
    const g: [number, number] = [0, 0];
    bowl.gradientAt(x, y, g);
    expect(100 * Math.hypot(g[0], g[1])).toBeLessThan(maxStoppableSlopePct(10));
    // Never higher than the launch energy allows (friction only takes energy away; projection term ≤ 1 %).
    const hMax = Math.max(...r.roll.samples.heightM);
    expect(hMax).toBeLessThanOrEqual(((0.5 * v0 * v0) / GF) * 1.01);
    const ar = rollingDecelFromStimp(10);
    const budget = energy(v0, bowl.heightAt(0, 0)) - energy(0, r.roll.restHeightM) - ar * r.roll.rollLengthM;
    expect(Math.abs(budget)).toBeLessThan(0.01 * GF * hMax + 1e-6);
  });

  test("a ball that stops on a wall too steep to hold it rolls back and settles inside, never over the rim", () => {
    // Stimp 13 holds a ball only below ≈ 6.1 % (derived); this bowl is 8 % at the rim (r = 2 m).
    const bowl = gridSurface((x, y) => 0.02 * (x * x + y * y), -2, -2, 33, 0.125);
    const r = simulateRollOnSurface({ surface: bowl, stimpFt: 13, ballM: [0, 0], holeM: [1, 0], launchSpeedMps: 1.6, startLineDeg: 0 });
    if (!r.ok) throw new Error(`must settle: ${r.message}`);
    expect(r.roll.restarts).toBeGreaterThanOrEqual(1);
    const maxR = Math.max(...r.roll.samples.xM.map((x, i) => Math.hypot(x, r.roll.samples.yM[i]!)));
    expect(maxR).toBeLessThan(2);
    const g: [number, number] = [0, 0];
    bowl.gradientAt(r.roll.restM[0], r.roll.restM[1], g);
    expect(100 * Math.hypot(g[0], g[1])).toBeLessThan(maxStoppableSlopePct(13));
    expect(Math.max(...r.roll.samples.heightM)).toBeLessThanOrEqual(((0.5 * 1.6 * 1.6) / GF) * 1.01);
  });

  test("with the speed to climb out, it does: off the map, as a value", () => {
    const bowl = gridSurface((x, y) => 0.02 * (x * x + y * y), -2, -2, 33, 0.125);
    const r = simulateRollOnSurface({ surface: bowl, stimpFt: 13, ballM: [0, 0], holeM: [1, 0], launchSpeedMps: 3, startLineDeg: 0 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe("off-map");
  });
});

test("a surface too steep to stop on returns a bounded result value, never a hang", () => {
  // 12 % everywhere, steeper than the ≈ 7.9 % a ball can stop on at Stimp 10 (derived).
  const steep = gridSurface((x) => -0.12 * x, 0, 0, 41, 0.5);
  const t0 = performance.now();
  const r = simulateRollOnSurface({ surface: steep, stimpFt: 10, ballM: [5, 10], holeM: [5, 12], launchSpeedMps: 0.5, startLineDeg: 0 });
  expect(r.ok).toBe(false);
  if (!r.ok) {
    expect(r.reason).toBe("off-map");
    expect(r.localSlopePct).toBeCloseTo(12, 6);
  }
  expect(performance.now() - t0).toBeLessThan(5000);
  const read = solveReadOnSurface({ surface: steep, stimpFt: 10, ballM: [5, 10], holeM: [5, 12] });
  expect(read.ok).toBe(false);
});
