// The inverse read: launch speed and start line whose path passes through the hole centre at a given pace.
import { captureOutcome } from "./capture";
import { brentRoot } from "./root-find";
import { rollToRest, type RollTrace } from "./roll";
import { stopsInPractice, describeModel, resolveGreen, type Green } from "./roll-model";
import { solveReadDirect } from "./solve-read-direct";
import {
  cannotStop,
  toPath,
  validateReadInput,
  type BreakDirection,
  type Pace,
  type Read,
  type ReadInput,
  type ReadResult,
} from "./read-types";

const SAMPLES_PER_STEP = 7;
/** Convergence of the pace: roll-past to 0.2 mm, entry speed to 0.1 mm/s (the hole pass is exact by construction). */
const ROLL_PAST_TOL_M = 2e-4;
const ENTRY_SPEED_TOL_MPS = 1e-4;

/** The fall line folded so the ball always breaks to +x ("canonical"), and the sign to unfold results. */
export function foldFallLine(fallLineDeg: number): { canonicalDeg: number; mirror: 1 | -1; straight: boolean } {
  let w = ((fallLineDeg % 360) + 360) % 360;
  if (w > 180) w -= 360;
  const canonicalDeg = Math.abs(w);
  const straight = Math.abs(Math.sin((canonicalDeg * Math.PI) / 180)) < 1e-9;
  return { canonicalDeg, mirror: w < 0 ? -1 : 1, straight };
}

/**
 * Solve a read on a uniform planar green: the launch speed and start line whose path passes through the hole
 * centre at the requested pace (roll-past, default 0.45 m — common practice — or entry speed).
 *
 * Method: the equation of motion (see rollRhs) is homogeneous, so scaling the launch speed by k scales the path by
 * k² and keeps its shape; the path shape depends only on the launch angle to the fall line. For each trial start
 * line one path is integrated with odex, scaled so that its crossing of the ball–hole line lands on the hole, and
 * Brent's method on the start line matches the pace. Straight putts use the closed form
 * v = √(2·a_eff·(D + P)), a_eff = a_r ∓ a_g (derived). Speed-dependent resistance models use the direct 2-D solver.
 * Cannot-stop greens (a_g ≥ a_r) return `{ ok: false, reason: "cannot-stop" }`.
 * @example solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }) // { ok: true, read: { aimOffsetM: ≈ −0.19, … } }
 */
export function solveRead(input: ReadInput): ReadResult {
  const pace = validateReadInput(input);
  const fold = foldFallLine(input.fallLineDeg);
  const green = resolveGreen({ ...input, fallLineDeg: fold.canonicalDeg });
  const model = describeModel(resolveGreen(input));
  if (!stopsInPractice(green)) return cannotStop(model);
  if (green.model.resistanceSpeedFactor !== null) return solveReadDirect(input);
  const D = input.distanceM;
  const phi = (fold.canonicalDeg * Math.PI) / 180;
  const ar = green.rollingDecelMps2;
  const ag = green.gravityDecelMps2;
  const aLine = ar - ag * Math.cos(phi);
  const rollPastGuess = "rollPastM" in pace ? pace.rollPastM : (pace.entrySpeedMps * pace.entrySpeedMps) / (2 * aLine);
  const vRef = Math.sqrt(2 * aLine * (D + rollPastGuess));
  const stats = { iterations: 0, integrations: 0, steps: 0, evaluations: 0 };
  const count = (t: RollTrace): RollTrace => {
    stats.integrations++;
    stats.steps += t.stats.steps;
    stats.evaluations += t.stats.evaluations;
    return t;
  };

  // Straight when the cross-slope pull is below 1e-6 of the rolling resistance (a break of micrometres).
  if (fold.straight || ag * Math.abs(Math.sin(phi)) < 1e-6 * ar) {
    const trace = count(rollToRest(green, vRef, [0, 1], { samplesPerStep: SAMPLES_PER_STEP }));
    const entry = Math.sqrt(2 * aLine * rollPastGuess);
    return finish(input, pace, green, trace, 1, fold.mirror, 0, entry, rollPastGuess, "none", "straight-closed-form", stats);
  }

  // Canonical frame: the ball breaks to +x, so the start line is a > 0 radians to the left of the hole.
  const aCap = Math.PI - phi;
  const target = "rollPastM" in pace ? pace.rollPastM / D : (pace.entrySpeedMps * pace.entrySpeedMps) / D;
  const squash = (m: number): number => (m === Number.POSITIVE_INFINITY ? 1 : m / (1 + m));
  const goal = squash(target);
  const cache = new Map<number, Trial>();
  const trial = (a: number): Trial => {
    const hit = cache.get(a);
    if (hit !== undefined) return hit;
    const trace = count(rollToRest(green, vRef, [-Math.sin(a), Math.cos(a)], { crossToward: 1, samplesPerStep: SAMPLES_PER_STEP }));
    const t = evaluateTrial(trace, pace, D);
    cache.set(a, t);
    return t;
  };
  const g = (a: number): number => squash(trial(a).metric) - goal;

  // First guess from small-angle theory: lateral drift ½·a_g·sinφ·t² over the time to reach the hole.
  const tHole = (vRef - Math.sqrt(2 * aLine * rollPastGuess)) / aLine;
  let a0 = Math.asin(Math.min(0.95, (ag * Math.sin(phi) * tHole) / (2 * vRef)));
  a0 = Math.min(Math.max(a0, 1e-12), 0.9 * aCap);
  let g0 = g(a0);
  let a1 = g0 > 0 ? Math.min(a0 * 1.2, 0.5 * (a0 + aCap)) : a0 / 1.2;
  let g1 = g(a1);
  for (let k = 0; g0 * g1 > 0; k++) {
    if (k > 60) throw new Error(`solveRead: no bracket for the start line near a=${a1} rad (g=${g1}); input ${JSON.stringify(input)}`);
    let next = g1 !== g0 ? a1 - (g1 * (a1 - a0)) / (g1 - g0) : a1 * 2;
    const lo = g1 > 0 ? a1 : a1 / 4;
    const hi = g1 > 0 ? Math.min(a1 * 4, 0.5 * (a1 + aCap)) : a1;
    if (!(next > lo && next < hi)) next = g1 > 0 ? Math.min(a1 * 2, 0.5 * (a1 + aCap)) : a1 / 2;
    else next = g1 > 0 ? Math.min(next * 1.05, hi) : Math.max(next / 1.05, lo);
    a0 = a1;
    g0 = g1;
    a1 = next;
    g1 = g(a1);
  }
  // Entry speeds are matched to 0.1 mm/s, or (for a nearly dying ball) to the same 0.2 mm of roll-past that a
  // speed difference means at the weakest deceleration, Δ(v²)/(2(a_r − a_g)).
  const accept = (a: number): boolean => {
    const t = trial(a);
    if (t.kScale === null) return false;
    if ("rollPastM" in pace) return Math.abs(t.kScale * t.kScale * t.rollPastRef - pace.rollPastM) < ROLL_PAST_TOL_M;
    const v = t.kScale * t.entryRef;
    const target = pace.entrySpeedMps;
    return Math.abs(v - target) < ENTRY_SPEED_TOL_MPS || Math.abs(v * v - target * target) / (2 * (ar - ag)) < ROLL_PAST_TOL_M;
  };
  let rootX = accept(a1) ? a1 : accept(a0) ? a0 : brentRoot(g, a0, a1, g0, g1, accept, 1e-15).x;
  if (!accept(rootX)) for (const a of cache.keys()) if (accept(a)) rootX = a;
  const root = { x: rootX };
  stats.iterations = stats.integrations;
  const best = trial(root.x);
  if (best.kScale === null || !accept(root.x)) {
    throw new Error(`solveRead: pace did not converge (a=${root.x} rad, metric=${best.metric}); input ${JSON.stringify(input)}`);
  }
  const k = best.kScale;
  const breaks: BreakDirection = fold.mirror > 0 ? "left-to-right" : "right-to-left";
  return finish(
    input,
    pace,
    green,
    best.trace,
    k,
    fold.mirror,
    -root.x,
    k * best.entryRef,
    k * k * best.rollPastRef,
    breaks,
    "homogeneous-1d",
    stats,
  );
}

interface Trial {
  readonly trace: RollTrace;
  /** Pace measure of the unscaled path: roll-past/D or entry²/D; ≤ 0 when the ball stops short of the line. */
  readonly metric: number;
  /** √(D / crossing distance): the speed scale that puts the crossing on the hole, or null if no crossing. */
  readonly kScale: number | null;
  readonly rollPastRef: number;
  readonly entryRef: number;
}

function evaluateTrial(trace: RollTrace, pace: Pace, D: number): Trial {
  const cross = trace.crossings.find((c) => c.yM > 0);
  const rest = trace.rest;
  if (cross === undefined && rest.yM > 0 && Math.abs(rest.xM) <= 1e-8 * rest.yM) {
    // A dying putt whose rest point is on the line: the hole is the rest point.
    return { trace, metric: 0, kScale: Math.sqrt(D / rest.yM), rollPastRef: 0, entryRef: 0 };
  }
  if (cross === undefined) {
    // Never came back to the line: a negative measure that reaches 0 where the rest point sits on the line. A rest
    // point on the low side means the crossing happened too close to launch to see: treat as infinitely firm.
    const metric = rest.xM > 0 ? Number.POSITIVE_INFINITY : Math.max(rest.xM / Math.hypot(rest.xM, rest.yM), -0.99);
    return { trace, metric, kScale: null, rollPastRef: 0, entryRef: 0 };
  }
  const rollPastRef = rest.alongPathM - cross.alongPathM;
  const entryRef = Math.hypot(cross.vxMps, cross.vyMps);
  const metric = "rollPastM" in pace ? rollPastRef / cross.yM : (entryRef * entryRef) / cross.yM;
  return { trace, metric, kScale: Math.sqrt(D / cross.yM), rollPastRef, entryRef };
}

function finish(
  input: ReadInput,
  pace: Pace,
  green: Green,
  trace: RollTrace,
  k: number,
  mirror: 1 | -1,
  startLineRad: number,
  entrySpeedMps: number,
  rollPastM: number,
  breaks: BreakDirection,
  method: Read["diagnostics"]["method"],
  stats: { iterations: number; integrations: number; steps: number; evaluations: number },
): ReadResult {
  void pace;
  const launchSpeedMps = k * Math.hypot(trace.samples[0]!.vxMps, trace.samples[0]!.vyMps);
  const startLine = mirror * startLineRad;
  const k2 = k * k;
  return {
    ok: true,
    read: {
      launchSpeedMps,
      startLineDeg: (startLine * 180) / Math.PI,
      aimOffsetM: input.distanceM * Math.tan(startLine),
      entrySpeedMps,
      rollPastM,
      playsLikeM: (launchSpeedMps * launchSpeedMps) / (2 * green.rollingDecelMps2),
      breaks,
      capture: captureOutcome(0, entrySpeedMps),
      path: toPath(trace.samples, trace.rest, k2, mirror),
      restM: [mirror * trace.rest.xM * k2, trace.rest.yM * k2],
      model: describeModel(resolveGreen(input)),
      diagnostics: { method, ...stats },
    },
  };
}
