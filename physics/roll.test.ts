import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { solveODE } from "mathjs";
import { DEFAULT_ROLL_MODEL, GRAVITY_MPS2, canStop, resolveGreen, rollRhs, simulateRoll } from "./index";

/** Uniform on [min, max] in 10⁶ steps, both ends included (fc.double is log-biased toward tiny values). */
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 1_000_000 }).map((k) => min + ((max - min) * k) / 1_000_000);

// mathjs ships solveODE but not its declaration (stack.md gotcha 3).
declare module "mathjs" {
  export function solveODE(
    f: (t: number, y: number[]) => number[],
    tspan: [number, number],
    y0: number[],
    options?: { method?: "RK23" | "RK45"; tol?: number; firstStep?: number; maxStep?: number; maxIter?: number },
  ): { t: number[]; y: number[][] };
}

const ONE_MM = 1e-3;

const green = (slopePct: number, fallLineDeg: number, stimpFt: number) => ({ slopePct, fallLineDeg, stimpFt });

test("odex and mathjs solveODE agree on the same forward roll to 1 mm", () => {
  const g = green(2.5, 120, 11);
  const v = 2.2;
  const s = (-6 * Math.PI) / 180;
  const r = simulateRoll({ ...g, distanceM: 4, launchSpeedMps: v, startLineDeg: -6 });
  if (!r.ok) throw new Error("must stop");
  const resolved = resolveGreen(g);
  const decay = resolved.rollingDecelMps2 - resolved.gravityDecelMps2;
  // In τ (dt/dτ = |v|/v_ref) the speed decays at least like exp(−(a_r − a_g)τ/v): integrate until ≤ 1e-8 of launch.
  const tauEnd = (v * Math.log(1e8)) / decay;
  const out = solveODE(rollRhs(resolved, v), [0, tauEnd], [0, 0, v * Math.sin(s), v * Math.cos(s), 0, 0], {
    method: "RK45",
    tol: 1e-9,
    maxIter: 1e5,
  });
  const last = out.y[out.y.length - 1]!;
  expect(Math.abs(last[0]! - r.roll.restM[0])).toBeLessThan(ONE_MM);
  expect(Math.abs(last[1]! - r.roll.restM[1])).toBeLessThan(ONE_MM);
  expect(Math.abs(last[5]! - r.roll.rollLengthM)).toBeLessThan(ONE_MM);
  expect(Math.abs(last[4]! - r.roll.rollTimeS)).toBeLessThan(1e-3);
  console.log(
    `odex vs mathjs rest point: Δx=${(last[0]! - r.roll.restM[0]).toExponential(2)} m, Δy=${(last[1]! - r.roll.restM[1]).toExponential(2)} m`,
  );
});

test("curved roll matches the closed-form hodograph solution (derived: v = C·tan^n(ψ/2)/sinψ, n = a_r/a_g)", () => {
  // With u = tan(ψ/2), ψ the angle from the fall line to v, every quantity to rest is a polynomial in u (derived
  // here from dv/dt = a_g cosψ − a_r, v·dψ/dt = −a_g sinψ; an independent check of the integrator and the stop).
  for (const [slopePct, stimpFt, psi0Deg, v0] of [
    [3, 10, 90, 2],
    [2, 12, 150, 1.5],
    [5, 8, 40, 2.5],
  ] as const) {
    const g = resolveGreen(green(slopePct, 90, stimpFt));
    const ag = g.gravityDecelMps2;
    const n = g.rollingDecelMps2 / ag;
    const u0 = Math.tan((psi0Deg * Math.PI) / 360);
    const C = (2 * v0) / (u0 ** (n - 1) * (1 + u0 * u0));
    const K = (C * C) / (4 * ag);
    const along = K * (u0 ** (2 * n - 2) / (2 * n - 2) - u0 ** (2 * n + 2) / (2 * n + 2));
    const across = 2 * K * (u0 ** (2 * n - 1) / (2 * n - 1) + u0 ** (2 * n + 1) / (2 * n + 1));
    const length = K * (u0 ** (2 * n - 2) / (2 * n - 2) + u0 ** (2 * n) / n + u0 ** (2 * n + 2) / (2 * n + 2));
    const time = (C / (2 * ag)) * (u0 ** (n - 1) / (n - 1) + u0 ** (n + 1) / (n + 1));
    // Fall line along +x (fallLineDeg 90); launch bearing 90 − ψ0 so it leans toward +y (across = +y).
    const r = simulateRoll({ ...green(slopePct, 90, stimpFt), distanceM: 3, launchSpeedMps: v0, startLineDeg: 90 - psi0Deg });
    if (!r.ok) throw new Error("must stop");
    expect(Math.abs(r.roll.restM[0] - along)).toBeLessThan(1e-5);
    expect(Math.abs(r.roll.restM[1] - across)).toBeLessThan(1e-5);
    expect(Math.abs(r.roll.rollLengthM - length)).toBeLessThan(1e-5);
    // The last ~1e-3 of the speed is finished in closed form: time to rest is good to about a millisecond.
    expect(Math.abs(r.roll.rollTimeS - time)).toBeLessThan(1e-3);
  }
});

const anyGreen = fc.record({
  slopePct: uniform(0, 8),
  fallLineDeg: uniform(0, 360),
  stimpFt: uniform(4, 16),
});

describe("energy never rises (rolling resistance only dissipates: dE/dt = −(1 + I/mR²)·a_r·|v|, derived)", () => {
  test("flat green: kinetic energy is non-increasing along the path", () => {
    fc.assert(
      fc.property(uniform(4, 16), uniform(0.1, 3), uniform(-40, 40), (stimpFt, v, line) => {
        const r = simulateRoll({ distanceM: 3, slopePct: 0, fallLineDeg: 0, stimpFt, launchSpeedMps: v, startLineDeg: line });
        if (!r.ok) return false;
        const sp = r.roll.samples.speedMps;
        return sp.every((x, i) => i === 0 || x <= sp[i - 1]! + 1e-9 * v);
      }),
      { numRuns: 20, seed: 7 },
    );
  });
  test("slope: kinetic + potential energy is non-increasing along the path", () => {
    fc.assert(
      fc.property(anyGreen, uniform(0.2, 3), uniform(-60, 60), (g, v, line) => {
        fc.pre(canStop(resolveGreen(g)) && resolveGreen(g).rollingDecelMps2 > 1.05 * resolveGreen(g).gravityDecelMps2);
        const r = simulateRoll({ ...g, distanceM: 3, launchSpeedMps: v, startLineDeg: line });
        if (!r.ok) return false;
        const phi = (g.fallLineDeg * Math.PI) / 180;
        const sinTheta = Math.sin(Math.atan(g.slopePct / 100));
        const k = 0.5 * (1 + DEFAULT_ROLL_MODEL.inertiaRatio);
        const { speedMps, xM, yM } = r.roll.samples;
        const energy = speedMps.map((s, i) => k * s * s - GRAVITY_MPS2 * sinTheta * (xM[i]! * Math.sin(phi) + yM[i]! * Math.cos(phi)));
        return energy.every((e, i) => i === 0 || e <= energy[i - 1]! + 1e-9 * (v * v + 1));
      }),
      { numRuns: 25, seed: 11 },
    );
  });
});

test("homogeneity: k× the launch speed gives k² the rest point and k× the time (derived)", () => {
  fc.assert(
    fc.property(anyGreen, uniform(0.3, 2.5), uniform(0.5, 2), uniform(-30, 30), (g, v, k, line) => {
      const resolved = resolveGreen(g);
      fc.pre(canStop(resolved) && resolved.rollingDecelMps2 > 1.05 * resolved.gravityDecelMps2);
      const a = simulateRoll({ ...g, distanceM: 3, launchSpeedMps: v, startLineDeg: line });
      const b = simulateRoll({ ...g, distanceM: 3, launchSpeedMps: k * v, startLineDeg: line });
      if (!a.ok || !b.ok) return false;
      const tol = 1e-6 * (1 + b.roll.rollLengthM);
      return (
        Math.abs(b.roll.restM[0] - k * k * a.roll.restM[0]) < tol &&
        Math.abs(b.roll.restM[1] - k * k * a.roll.restM[1]) < tol &&
        Math.abs(b.roll.rollTimeS - k * a.roll.rollTimeS) < 1e-5 * (1 + b.roll.rollTimeS)
      );
    }),
    { numRuns: 25, seed: 3 },
  );
});

test("a ball that cannot stop is a result value, not a hang: 8 % at Stimp 10", () => {
  const r = simulateRoll({ distanceM: 3, slopePct: 8, fallLineDeg: 0, stimpFt: 10, launchSpeedMps: 1, startLineDeg: 0 });
  expect(r.ok).toBe(false);
  if (!r.ok) expect(r.reason).toBe("cannot-stop");
});

test("a roll reports its integrator work beside the result", () => {
  const r = simulateRoll({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, launchSpeedMps: 2, startLineDeg: -5 });
  if (!r.ok) throw new Error("must stop");
  expect(r.roll.diagnostics.steps).toBeGreaterThan(0);
  expect(r.roll.diagnostics.evaluations).toBeGreaterThan(r.roll.diagnostics.steps);
  expect(r.roll.path.length).toBeGreaterThanOrEqual(20);
  expect(r.roll.path.length).toBeLessThanOrEqual(130);
});
