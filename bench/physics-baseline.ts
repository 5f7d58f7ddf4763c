// The honest baseline a competent engineer would write for the benchmarks only: mathjs solveODE (Dormand–Prince
// RK45) forward rolls at a tolerance that holds 1 mm, a closest approach located on cubic Hermite interpolation of
// the RK steps, and 2-D Newton shooting on (launch speed, start line) with a finite-difference Jacobian until the
// ball passes within 1 mm of the hole centre at the pace to 1 mm. `rk45Roll` is also the plain per-roll reference
// of the make-probability benchmark.
import { solveODE } from "mathjs";
import { HOLE_RADIUS_M, maxCaptureSpeedMps, resolveGreen, rollRhs, type Green } from "../physics/index";

declare module "mathjs" {
  export function solveODE(
    f: (t: number, y: number[]) => number[],
    tspan: [number, number],
    y0: number[],
    options?: { method?: "RK23" | "RK45"; tol?: number; firstStep?: number; maxStep?: number; maxIter?: number },
  ): { t: number[]; y: number[][] };
}

const TOL_M = 1e-3;
/** solveODE's tolerance: 1e-7 holds the closest pass to well under 1 mm on putts up to 20 m (printed by the bench). */
const RK_TOL = 1e-7;

/** One RK45 roll: closest pass to the hole (signed miss, + = ball right of the hole), its speed and the roll-past. */
export interface Rk45Pass {
  missM: number;
  passSpeedMps: number;
  rollPastM: number;
  restM: [number, number];
}

/** A forward roll with mathjs solveODE (RK45) in the time-like variable of rollRhs, to rest. */
export function rk45Roll(green: Green, v: number, s: number, D: number): Rk45Pass {
  const f = rollRhs(green, v);
  const decay = green.rollingDecelMps2 - green.gravityDecelMps2;
  const tauEnd = (v * Math.log(1e4)) / decay;
  const out = solveODE(f, [0, tauEnd], [0, 0, v * Math.sin(s), v * Math.cos(s), 0, 0], { method: "RK45", tol: RK_TOL, maxIter: 1e5 });
  const ys = out.y;
  const ts = out.t;
  const g = (y: readonly number[]) => y[0]! * y[2]! + (y[1]! - D) * y[3]!;
  const last = ys[ys.length - 1]!;
  let at: number[] = last;
  let best = Number.POSITIVE_INFINITY;
  for (let i = 1; i < ys.length; i++) {
    if (g(ys[i - 1]!) < 0 && g(ys[i]!) >= 0) {
      const p = refine(f, ts[i - 1]!, ys[i - 1]!, ts[i]!, ys[i]!, g);
      const d = Math.hypot(p[0]!, p[1]! - D);
      if (d < best) {
        best = d;
        at = p;
      }
    }
  }
  const sp = Math.hypot(at[2]!, at[3]!);
  const ux = sp > 0 ? at[2]! / sp : 0;
  const uy = sp > 0 ? at[3]! / sp : 1;
  const missM = uy * at[0]! - ux * (at[1]! - D);
  return {
    missM: at === last ? Math.hypot(at[0]!, at[1]! - D) * Math.sign(at[0]! || 1) : missM,
    passSpeedMps: at === last ? 0 : sp,
    rollPastM: at === last ? -Math.hypot(at[0]!, at[1]! - D) : last[5]! - at[5]!,
    restM: [last[0]!, last[1]!],
  };
}

/** Bisection for g = 0 on cubic Hermite interpolation of the state between two RK samples. */
function refine(
  f: (t: number, y: number[]) => number[],
  t0: number,
  y0: number[],
  t1: number,
  y1: number[],
  g: (y: number[]) => number,
): number[] {
  const d0 = f(t0, y0);
  const d1 = f(t1, y1);
  const h = t1 - t0;
  const at = (t: number) => {
    const u = (t - t0) / h;
    const h00 = 2 * u ** 3 - 3 * u ** 2 + 1;
    const h10 = u ** 3 - 2 * u ** 2 + u;
    const h01 = -2 * u ** 3 + 3 * u ** 2;
    const h11 = u ** 3 - u ** 2;
    return y0.map((_, i) => h00 * y0[i]! + h10 * h * d0[i]! + h01 * y1[i]! + h11 * h * d1[i]!);
  };
  let a = t0;
  let b = t1;
  for (let k = 0; k < 50; k++) {
    const m = 0.5 * (a + b);
    if (g(at(m)) < 0) a = m;
    else b = m;
  }
  return at(b);
}

/** Whether a baseline roll is holed by the capture criterion at the closest pass (for the Monte Carlo reference). */
export function rk45Holed(pass: Rk45Pass): boolean {
  const b = Math.abs(pass.missM);
  return b < HOLE_RADIUS_M && pass.passSpeedMps < maxCaptureSpeedMps(b);
}

/**
 * Baseline inverse read (roll-past pace): 2-D Newton shooting on (v, s) with a forward-difference Jacobian (two extra
 * rolls per step) and step halving, from the straight-putt guess; stops when miss and pace are both within 1 mm.
 */
export function baselineRead(input: { distanceM: number; slopePct: number; fallLineDeg: number; stimpFt: number; rollPastM: number }) {
  const green = resolveGreen(input);
  const D = input.distanceM;
  let rolls = 0;
  const residual = (v: number, s: number): [number, number] => {
    rolls++;
    const p = rk45Roll(green, v, s, D);
    return [p.missM, p.rollPastM - input.rollPastM];
  };
  const phi = (input.fallLineDeg * Math.PI) / 180;
  let v = Math.sqrt(2 * (green.rollingDecelMps2 - green.gravityDecelMps2 * Math.cos(phi)) * (D + input.rollPastM));
  let s = 0;
  let r = residual(v, s);
  for (let it = 0; it < 40 && (Math.abs(r[0]) > TOL_M || Math.abs(r[1]) > TOL_M); it++) {
    const hv = 1e-4 * v;
    const hs = 1e-4;
    const rv = residual(v + hv, s);
    const rs = residual(v, s + hs);
    const j11 = (rv[0] - r[0]) / hv;
    const j21 = (rv[1] - r[1]) / hv;
    const j12 = (rs[0] - r[0]) / hs;
    const j22 = (rs[1] - r[1]) / hs;
    const det = j11 * j22 - j12 * j21;
    let dv = (-r[0] * j22 + r[1] * j12) / det;
    let ds = (-j11 * r[1] + j21 * r[0]) / det;
    const norm = Math.hypot(r[0], r[1]);
    for (let k = 0; k < 8; k++) {
      const next = residual(v + dv, s + ds);
      if (Math.hypot(next[0], next[1]) < norm || k === 7) {
        v += dv;
        s += ds;
        r = next;
        break;
      }
      dv /= 2;
      ds /= 2;
    }
  }
  return { launchSpeedMps: v, startLineRad: s, rolls };
}
