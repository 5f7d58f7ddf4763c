// A plain baseline for the inverse read, for the benchmark only: mathjs solveODE (Dormand–Prince RK45) forward
// rolls and nested bisection — start line outside, launch speed inside — each to the same 1 mm tolerance.
import { solveODE } from "mathjs";
import { resolveGreen, rollRhs, type Green } from "../physics/index";

declare module "mathjs" {
  export function solveODE(
    f: (t: number, y: number[]) => number[],
    tspan: [number, number],
    y0: number[],
    options?: { method?: "RK23" | "RK45"; tol?: number; firstStep?: number; maxStep?: number; maxIter?: number },
  ): { t: number[]; y: number[][] };
}

const TOL_M = 1e-3;

interface Pass {
  miss: number;
  rollPast: number;
}

/** One forward roll with mathjs, then the closest approach to the hole from its samples (Hermite-refined). */
function rollPast(green: Green, v: number, s: number, D: number, counter: { rolls: number }): Pass {
  counter.rolls++;
  const f = rollRhs(green, v);
  const decay = green.rollingDecelMps2 - green.gravityDecelMps2;
  const tauEnd = (v * Math.log(1e4)) / decay;
  const out = solveODE(f, [0, tauEnd], [0, 0, v * Math.sin(s), v * Math.cos(s), 0, 0], { method: "RK45", tol: 1e-7, maxIter: 1e5 });
  const ys = out.y;
  const ts = out.t;
  const g = (y: readonly number[]) => y[0]! * y[2]! + (y[1]! - D) * y[3]!;
  const last = ys[ys.length - 1]!;
  let at: number[] = last;
  for (let i = 1; i < ys.length; i++) {
    if (g(ys[i - 1]!) < 0 && g(ys[i]!) >= 0) {
      at = refine(f, ts[i - 1]!, ys[i - 1]!, ts[i]!, ys[i]!, g);
      break;
    }
  }
  const sp = Math.hypot(at[2]!, at[3]!);
  const ux = sp > 0 ? at[2]! / sp : 0;
  const uy = sp > 0 ? at[3]! / sp : 1;
  const miss = uy * at[0]! - ux * (at[1]! - D);
  return { miss, rollPast: at === last ? -Math.hypot(at[0]!, at[1]! - D) : last[5]! - at[5]! };
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

/** Baseline inverse read (roll-past pace): returns launch speed, start line (rad) and the number of rolls. */
export function baselineRead(input: { distanceM: number; slopePct: number; fallLineDeg: number; stimpFt: number; rollPastM: number }) {
  const green = resolveGreen(input);
  const D = input.distanceM;
  const counter = { rolls: 0 };
  // Inner: launch speed for the pace on a given start line (roll-past grows with speed).
  const speedFor = (s: number): { v: number; pass: Pass } => {
    let lo = 0.05;
    let hi = 6;
    let v = 0.5 * (lo + hi);
    let pass = rollPast(green, v, s, D, counter);
    while (Math.abs(pass.rollPast - input.rollPastM) > TOL_M && hi - lo > 1e-9) {
      if (pass.rollPast < input.rollPastM) lo = v;
      else hi = v;
      v = 0.5 * (lo + hi);
      pass = rollPast(green, v, s, D, counter);
    }
    return { v, pass };
  };
  // Outer: start line for no miss at the hole (the miss grows to the right as the line moves right).
  let lo = (-70 * Math.PI) / 180;
  let hi = (70 * Math.PI) / 180;
  let s = 0;
  let r = speedFor(s);
  while (Math.abs(r.pass.miss) > TOL_M && hi - lo > 1e-12) {
    if (r.pass.miss > 0) hi = s;
    else lo = s;
    s = 0.5 * (lo + hi);
    r = speedFor(s);
  }
  return { launchSpeedMps: r.v, startLineRad: s, aimOffsetM: D * Math.tan(s), rolls: counter.rolls };
}
