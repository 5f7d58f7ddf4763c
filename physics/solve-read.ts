// The inverse read: launch speed and start line whose path passes through the hole centre at a given pace.
import { captureAtRim, type RimCrossing } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { PlanarPath, planarRollField, type PlanarRollField } from "./planar-path";
import { brentRoot } from "./root-find";
import { stopsInPractice, describeModel, resolveGreen, type Green } from "./roll-model";
import { solveReadDirect } from "./solve-read-direct";
import {
  aimOf,
  cannotStop,
  flatPuttLengthM,
  validateReadInput,
  type BreakDirection,
  type Pace,
  type ReadInput,
  type ReadResult,
} from "./read-types";

/** Convergence of the pace: roll-past to 0.2 mm, entry speed to 0.1 mm/s (the hole pass is exact by construction). */
const ROLL_PAST_TOL_M = 2e-4;
const ENTRY_SPEED_TOL_MPS = 1e-4;
/** Points of the drawn path. */
const PATH_POINTS = 96;

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
 * Method (constant rolling resistance): the equation of motion is homogeneous — scaling the launch speed by k scales
 * the path by k² and keeps its shape — and on a plane the path is known in closed form (planar-roll.ts). For each
 * trial start line the unit-speed path's crossing of the ball–hole line is found (one root of a polynomial in
 * u = tan(ψ/2), by Brent's method), the path is scaled so that the crossing lands on the hole, and Brent's method on
 * the start line matches the pace. Straight putts use v = √(2·a_eff·(D + P)), a_eff = a_r ∓ a_g (derived). No
 * numerical integration: every read is re-integrated with odex in the tests (to 1 mm). Speed-dependent resistance
 * models use the direct 2-D solver (odex). Cannot-stop greens (a_g ≥ a_r) return `{ ok: false, reason: "cannot-stop" }`.
 * @example solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }) // { ok: true, read: { aimOffsetM: ≈ −0.19, … } }
 */
export function solveRead(input: ReadInput): ReadResult {
  const pace = validateReadInput(input);
  const fold = foldFallLine(input.fallLineDeg);
  const green = resolveGreen({ ...input, fallLineDeg: fold.canonicalDeg });
  const model = describeModel(resolveGreen(input));
  if (!stopsInPractice(green)) return cannotStop(model);
  if (!green.closedForm) return solveReadDirect(input);
  const D = input.distanceM;
  const phi = (fold.canonicalDeg * Math.PI) / 180;
  const ar = green.rollingDecelMps2;
  const ag = green.gravityDecelMps2;
  const aLine = ar - ag * Math.cos(phi);
  const field = planarRollField(green);
  const stats = { iterations: 0, evaluations: 0 };

  // Straight when the cross-slope pull is below 1e-6 of the rolling resistance (a break of micrometres).
  if (fold.straight || ag * Math.abs(Math.sin(phi)) < 1e-6 * ar) {
    const rollPastM = "rollPastM" in pace ? pace.rollPastM : (pace.entrySpeedMps * pace.entrySpeedMps) / (2 * aLine);
    const v = Math.sqrt(2 * aLine * (D + rollPastM));
    const entry = Math.sqrt(2 * aLine * rollPastM);
    const rimSpeed = Math.sqrt(entry * entry + 2 * aLine * Math.min(HOLE_RADIUS_M, D));
    const L = D + rollPastM;
    const path: [number, number][] = Array.from({ length: PATH_POINTS + 1 }, (_, i) => [0, (L * i) / PATH_POINTS]);
    return finish(input, green, v, 0, entry, rollPastM, "none", path, [0, L], { offsetM: 0, speedMps: rimSpeed }, fold.mirror, stats);
  }

  // Canonical frame: the ball breaks to +x, so the start line is a > 0 radians to the left of the hole.
  const unit = new PlanarPath();
  const aCap = Math.PI - phi;
  const target = "rollPastM" in pace ? pace.rollPastM / D : (pace.entrySpeedMps * pace.entrySpeedMps) / D;
  const squash = (m: number): number => (m === Number.POSITIVE_INFINITY ? 1 : m / (1 + m));
  const goal = squash(target);
  const cache = new Map<number, Trial>();
  const trial = (a: number): Trial => {
    const hit = cache.get(a);
    if (hit !== undefined) return hit;
    stats.iterations++;
    const t = evaluateTrial(field, unit, a, pace, D, stats);
    cache.set(a, t);
    return t;
  };
  const g = (a: number): number => squash(trial(a).metric) - goal;

  // First guess from small-angle theory: lateral drift ½·a_g·sinφ·t² over the time to reach the hole.
  const rollPastGuess = "rollPastM" in pace ? pace.rollPastM : (pace.entrySpeedMps * pace.entrySpeedMps) / (2 * aLine);
  const vRef = Math.sqrt(2 * aLine * (D + rollPastGuess));
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
    const want = pace.entrySpeedMps;
    return Math.abs(v - want) < ENTRY_SPEED_TOL_MPS || Math.abs(v * v - want * want) / (2 * (ar - ag)) < ROLL_PAST_TOL_M;
  };
  let rootX = accept(a1) ? a1 : accept(a0) ? a0 : brentRoot(g, a0, a1, g0, g1, accept, 1e-15).x;
  if (!accept(rootX)) for (const a of cache.keys()) if (accept(a)) rootX = a;
  const best = trial(rootX);
  if (best.kScale === null || !accept(rootX)) {
    throw new Error(`solveRead: pace did not converge (a=${rootX} rad, metric=${best.metric}); input ${JSON.stringify(input)}`);
  }
  const k = best.kScale;
  const breaks: BreakDirection = fold.mirror > 0 ? "left-to-right" : "right-to-left";
  // The solved path at its launch speed: drawn, its rest point, and where it crosses the hole's edge.
  const path = new PlanarPath();
  path.reset(field, k, -Math.sin(rootX), Math.cos(rootX));
  const points: [number, number][] = [[0, 0]];
  for (let i = 1; i <= PATH_POINTS; i++) {
    const w = (1 - i / PATH_POINTS) ** 2;
    path.at(w);
    points.push([fold.mirror * path.x, path.y]);
  }
  path.set(0, 0);
  const rest: [number, number] = [fold.mirror * path.x, path.y];
  const rim = rimCrossing(path, best.crossW, D);
  return finish(input, green, k, -rootX, k * best.entryRef, k * k * best.rollPastRef, breaks, points, rest, rim, fold.mirror, stats);
}

interface Trial {
  /** Pace measure of the unit-speed path: roll-past/crossing or entry²/crossing; ≤ 0 when it stops short of the line. */
  readonly metric: number;
  /** √(D / crossing distance): the speed that puts the crossing on the hole, or null if no crossing. */
  readonly kScale: number | null;
  readonly rollPastRef: number;
  readonly entryRef: number;
  /** w of the crossing on the unit-speed path (0 for a dying putt whose rest is on the line). */
  readonly crossW: number;
}

/** The unit-speed path launched a radians left of the hole line: its crossing of the line toward +x, in closed form. */
function evaluateTrial(field: PlanarRollField, path: PlanarPath, a: number, pace: Pace, D: number, stats: { evaluations: number }): Trial {
  const none = (metric: number): Trial => ({ metric, kScale: null, rollPastRef: 0, entryRef: 0, crossW: Number.NaN });
  if (!path.reset(field, 1, -Math.sin(a), Math.cos(a))) return none(0);
  path.set(0, 0);
  stats.evaluations++;
  const restX = path.x;
  const restY = path.y;
  const total = path.totalLength;
  // The heading's x component changes sign once (it turns monotonically toward the fall line), so x falls from 0 to
  // its minimum at w* and rises after: one crossing of the line, in (0, w*), exactly when the rest point is on +x.
  const wStar = path.wWhereHeadingXIsZero();
  if (restX <= 0 || wStar === null) {
    // A dying putt whose rest point is on the line: the hole is the rest point.
    if (restY > 0 && Math.abs(restX) <= 1e-8 * restY)
      return { metric: 0, kScale: Math.sqrt(D / restY), rollPastRef: 0, entryRef: 0, crossW: 0 };
    return none(Math.max(restX / Math.hypot(restX, restY), -0.99));
  }
  path.at(wStar);
  const xStar = path.x;
  const f = (w: number): number => {
    stats.evaluations++;
    path.at(w);
    return path.x;
  };
  const root = xStar >= 0 ? wStar : brentRoot(f, 0, wStar, restX, xStar, (_w, fx) => Math.abs(fx) < 1e-15 * total, 1e-16, 200).x;
  path.at(root);
  if (!(path.y > 0)) return none(Number.POSITIVE_INFINITY);
  const rollPastRef = total - path.length;
  const entryRef = path.speed;
  const metric = "rollPastM" in pace ? rollPastRef / path.y : (entryRef * entryRef) / path.y;
  return { metric, kScale: Math.sqrt(D / path.y), rollPastRef, entryRef, crossW: root };
}

/** Where the solved path's centre crosses the hole's edge on its way to the centre (null when it starts inside). */
function rimCrossing(path: PlanarPath, crossW: number, D: number): RimCrossing | null {
  if (!(D > HOLE_RADIUS_M) || !Number.isFinite(crossW)) return null;
  const r2 = HOLE_RADIUS_M * HOLE_RADIUS_M;
  const e = (w: number): number => {
    path.at(w);
    return path.x * path.x + (path.y - D) * (path.y - D) - r2;
  };
  const root = brentRoot(e, crossW, 1, -r2, D * D - r2, (_w, fx) => Math.abs(fx) < 1e-12 * r2, 1e-16, 200).x;
  path.at(root);
  return { offsetM: Math.abs(path.hy * path.x - path.hx * (path.y - D)), speedMps: path.speed };
}

function finish(
  input: ReadInput,
  green: Green,
  launchSpeedMps: number,
  startLineRad: number,
  entrySpeedMps: number,
  rollPastM: number,
  breaks: BreakDirection,
  path: [number, number][],
  restM: [number, number],
  rim: RimCrossing | null,
  mirror: 1 | -1,
  stats: { iterations: number; evaluations: number },
): ReadResult {
  const startLineDeg = (mirror * startLineRad * 180) / Math.PI;
  return {
    ok: true,
    read: {
      launchSpeedMps,
      startLineDeg,
      ...aimOf(startLineDeg, input.distanceM),
      entrySpeedMps,
      rollPastM,
      flatPuttLengthM: flatPuttLengthM(launchSpeedMps, green.rollingDecelMps2, rollPastM),
      breaks,
      capture: captureAtRim(0, rim, entrySpeedMps, rollPastM < HOLE_RADIUS_M),
      path,
      restM,
      model: describeModel(resolveGreen(input)),
      diagnostics: { method: "closed-form", iterations: stats.iterations, integrations: 0, steps: 0, evaluations: stats.evaluations },
    },
  };
}
