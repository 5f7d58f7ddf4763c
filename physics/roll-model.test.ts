import { describe, expect, test } from "vitest";
import fc from "fast-check";
import {
  BREDE_1990,
  CANNOT_STOP_THRESHOLDS,
  GRAVITY_PER_PERCENT,
  ROLLING_DECEL_MPS2,
  RULES_OF_GOLF,
  STIMPMETER,
} from "../tests/fixtures/physics-references";
import {
  BALL_DIAMETER_M,
  BALL_MASS_KG,
  FOOT_M,
  HOLE_DIAMETER_M,
  STIMP_EXIT_SPEED_MPS,
  canStop,
  gravityDecelFromSlope,
  maxStoppableSlopePct,
  flatPuttLengthM,
  solveRead,
  resolveGreen,
  rollingDecelFromStimp,
  simulateRoll,
  stimpFromTwoWays,
} from "./index";

/** Uniform on [min, max] in 10⁶ steps, both ends included (fc.double is log-biased toward tiny values). */
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 1_000_000 }).map((k) => min + ((max - min) * k) / 1_000_000);

const STOP_TOL_M = 1e-6; // closed form vs integrated rest point

test("hole and ball dimensions are the Rules of Golf values", () => {
  // R&A/USGA Rules of Golf, Definitions "Hole"; Equipment Rules (former Appendix III).
  expect(HOLE_DIAMETER_M).toBeCloseTo(RULES_OF_GOLF.holeDiameterM.value, 6);
  expect(HOLE_DIAMETER_M).toBeCloseTo(4.25 * 0.0254, 3);
  expect(BALL_DIAMETER_M).toBeCloseTo(RULES_OF_GOLF.ballMinDiameterM.value, 6);
  expect(BALL_DIAMETER_M).toBeCloseTo(1.68 * 0.0254, 4);
  expect(BALL_MASS_KG).toBeCloseTo(RULES_OF_GOLF.ballMaxMassKg.value, 6);
  expect(BALL_MASS_KG).toBeCloseTo(1.62 * 0.028349523125, 4);
});

test("the Stimpmeter exit speed is 6 ft/s (USGA Stimpmeter booklet, secondary)", () => {
  expect(STIMP_EXIT_SPEED_MPS).toBeCloseTo(STIMPMETER.exitSpeedMps.value, 2);
});

test("rolling deceleration from the Stimp matches a_r = v0²/(2S) (derived, docs/sources.md)", () => {
  for (const p of ROLLING_DECEL_MPS2.points) {
    expect(Math.abs(rollingDecelFromStimp(p.stimpFt) - p.decelMps2)).toBeLessThan(ROLLING_DECEL_MPS2.toleranceMps2);
  }
});

test("gravity along the slope is about 0.070 m/s² per 1 % for a rolling sphere (5/7·g·sinθ, textbook)", () => {
  expect(Math.abs(gravityDecelFromSlope(1) - GRAVITY_PER_PERCENT.value)).toBeLessThan(GRAVITY_PER_PERCENT.tolerance);
  expect(gravityDecelFromSlope(0)).toBe(0);
});

test("flat-green Stimp round trip: a ball launched at v0 rolls S feet (Stimpmeter definition)", () => {
  for (const stimpFt of [4, 8, 10, 12.5, 16]) {
    const r = simulateRoll({ distanceM: 3, slopePct: 0, fallLineDeg: 0, stimpFt, launchSpeedMps: STIMP_EXIT_SPEED_MPS, startLineDeg: 0 });
    if (!r.ok) throw new Error("flat green must stop");
    expect(Math.abs(r.roll.restM[1] - stimpFt * FOOT_M)).toBeLessThan(STOP_TOL_M);
    expect(Math.abs(r.roll.restM[0])).toBeLessThan(STOP_TOL_M);
    // Stopping time v0/a_r from the same constant deceleration.
    expect(r.roll.rollTimeS).toBeCloseTo(STIMP_EXIT_SPEED_MPS / rollingDecelFromStimp(stimpFt), 5);
  }
});

describe("straight putts along the fall line stop at v²/(2(a_r ± a_g)) (derived closed form)", () => {
  test("property over slope, Stimp and speed", () => {
    fc.assert(
      fc.property(uniform(0, 5), uniform(4, 16), uniform(0.2, 3), fc.boolean(), (slopePct, stimpFt, v, uphill) => {
        const green = resolveGreen({ slopePct, fallLineDeg: uphill ? 180 : 0, stimpFt });
        fc.pre(canStop(green) && green.rollingDecelMps2 - green.gravityDecelMps2 > 0.02);
        const aEff = green.rollingDecelMps2 + (uphill ? 1 : -1) * green.gravityDecelMps2;
        const r = simulateRoll({ distanceM: 1, slopePct, fallLineDeg: uphill ? 180 : 0, stimpFt, launchSpeedMps: v, startLineDeg: 0 });
        if (!r.ok) return false;
        const expected = (v * v) / (2 * aEff);
        return Math.abs(r.roll.restM[1] - expected) < STOP_TOL_M * Math.max(1, expected) && Math.abs(r.roll.restM[0]) < 1e-9;
      }),
      { numRuns: 40, seed: 1990 },
    );
  });
});

test("two-way Stimp correction reproduces Brede's worked example (Brede 1990, USGA Green Section Record)", () => {
  const s = stimpFromTwoWays(BREDE_1990.upM / FOOT_M, BREDE_1990.downM / FOOT_M);
  expect(Math.abs(s - BREDE_1990.correctedFt)).toBeLessThan(BREDE_1990.toleranceFt);
  // The naive average the correction replaces.
  expect(((BREDE_1990.upM + BREDE_1990.downM) / 2 / FOOT_M).toFixed(1)).toBe(BREDE_1990.plainAverageFt.toFixed(1));
});

test("Brede's correction is exact for constant deceleration: up and down rolls of the model give back the flat Stimp (derived)", () => {
  for (const [slopePct, stimpFt] of [
    [1, 9],
    [2.5, 11],
    [3, 13],
  ] as const) {
    const roll = (fallLineDeg: number) => {
      const r = simulateRoll({ distanceM: 1, slopePct, fallLineDeg, stimpFt, launchSpeedMps: STIMP_EXIT_SPEED_MPS, startLineDeg: 0 });
      if (!r.ok) throw new Error("must stop");
      return r.roll.rollLengthM / FOOT_M;
    };
    expect(stimpFromTwoWays(roll(180), roll(0))).toBeCloseTo(stimpFt, 5);
  }
});

test("cannot-stop thresholds: ~7.9 % at Stimp 10, 6.5 % at 12, 5.6 % at 14 in this model (derived, docs/sources.md)", () => {
  for (const p of CANNOT_STOP_THRESHOLDS.points) {
    const threshold = maxStoppableSlopePct(p.stimpFt);
    expect(Math.abs(threshold - p.slopePct)).toBeLessThan(CANNOT_STOP_THRESHOLDS.tolerancePct);
    expect(canStop(resolveGreen({ slopePct: threshold * 0.999, fallLineDeg: 0, stimpFt: p.stimpFt }))).toBe(true);
    expect(canStop(resolveGreen({ slopePct: threshold * 1.001, fallLineDeg: 0, stimpFt: p.stimpFt }))).toBe(false);
  }
  expect(canStop(resolveGreen({ slopePct: 8, fallLineDeg: 0, stimpFt: 10 }))).toBe(false);
});

test("flat-putt length: a flat putt equals its own length; straight uphill longer, downhill shorter (derived)", () => {
  // Straight putts along the fall line in closed form (docs/sources.md, Rolling on a slope): v = √(2·a_eff·(D + P)),
  // a_eff = a_r ± a_g; the flat putt with the same v and the same P is L = v²/(2·a_r) − P = (D + P)·a_eff/a_r − P.
  const ar = rollingDecelFromStimp(10);
  const ag = gravityDecelFromSlope(2);
  for (const [D, P] of [
    [3, 0.45],
    [1.2, 0],
    [8, 1.5],
  ] as const) {
    const flat = solveRead({ distanceM: D, slopePct: 0, fallLineDeg: 0, stimpFt: 10, pace: { rollPastM: P } });
    const up = solveRead({ distanceM: D, slopePct: 2, fallLineDeg: 180, stimpFt: 10, pace: { rollPastM: P } });
    const down = solveRead({ distanceM: D, slopePct: 2, fallLineDeg: 0, stimpFt: 10, pace: { rollPastM: P } });
    if (!flat.ok || !up.ok || !down.ok) throw new Error("must stop");
    expect(flat.read.flatPuttLengthM).toBeCloseTo(D, 9);
    expect(up.read.flatPuttLengthM).toBeCloseTo(((D + P) * (ar + ag)) / ar - P, 9);
    expect(down.read.flatPuttLengthM).toBeCloseTo(((D + P) * (ar - ag)) / ar - P, 9);
    expect(up.read.flatPuttLengthM).toBeGreaterThan(D);
    expect(down.read.flatPuttLengthM).toBeLessThan(D);
  }
  expect(flatPuttLengthM(Math.sqrt(2 * ar * 3.45), ar, 0.45)).toBeCloseTo(3, 12);
});

test("bad inputs are refused with a RangeError", () => {
  expect(() => rollingDecelFromStimp(0)).toThrow(RangeError);
  expect(() => gravityDecelFromSlope(Number.NaN)).toThrow(RangeError);
  expect(() => stimpFromTwoWays(-1, 3)).toThrow(RangeError);
});
