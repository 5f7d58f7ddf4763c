// The read on a green that is not a plane: the launch speed and start line whose roll on a height map's surface
// (surface-roll.ts) passes through the hole at the pace asked for.
// Over 300 lines on purpose (issue 16): one shooting solver, its fall-backs and the answer it builds share the
// tolerances and the rolls already made; the roll itself is surface-roll.ts.
import type { Capture } from "./capture";
import type { HeightSurface } from "./height-surface";
import { aimOf, cannotStop, flatPuttLengthM, type AimGiven, type BreakDirection, type Pace } from "./read-types";
import { brentRoot } from "./root-find";
import {
  DEFAULT_ROLL_MODEL,
  describeModel,
  maxStoppableSlopePct,
  resolveGreen,
  stopsInPractice,
  type ModelSummary,
  type RollModel,
} from "./roll-model";
import { solveRead } from "./solve-read";
import { simulateRollOnSurface, type SurfaceRoll } from "./surface-roll";

/** Inputs of a read on a surface: ball and hole in the green's frame, Stimp, pace (default roll-past 0.45 m). */
export interface SurfaceReadInput {
  readonly surface: HeightSurface;
  readonly stimpFt: number;
  readonly model?: RollModel;
  readonly ballM: readonly [number, number];
  readonly holeM: readonly [number, number];
  readonly pace?: Pace;
}

/** A read on a surface: the planar Read's numbers, the path in the green's frame and in the putt frame. */
export interface SurfaceRead {
  readonly launchSpeedMps: number;
  readonly startLineDeg: number;
  readonly aimOffsetM: number | null;
  readonly aimGiven: AimGiven;
  readonly aimNote: string | null;
  readonly entrySpeedMps: number;
  readonly rollPastM: number;
  /** Length of the flat putt (same Stimp) needing the same launch speed with the same roll-past, m. */
  readonly flatPuttLengthM: number;
  readonly breaks: BreakDirection;
  readonly capture: Capture;
  /** [x, y] in the green's frame from the ball to rest (hole covered). */
  readonly path: [number, number][];
  /** The same path in the putt frame (ball at 0,0, hole at 0,D, x to the golfer's right). */
  readonly puttFramePath: [number, number][];
  readonly restM: [number, number];
  readonly distanceM: number;
  /** The plane of the surface's mean gradient along the ball→hole line (the first guess): slope %, fall line °. */
  readonly meanPlane: { readonly slopePct: number; readonly fallLineDeg: number };
  /** The model on that mean plane (its gravity term is the mean one; the roll feels the local slope). */
  readonly model: ModelSummary;
  readonly diagnostics: {
    readonly method: "surface-newton" | "surface-bracketed";
    readonly iterations: number;
    readonly integrations: number;
  };
}

/** No read: the roll cannot be made to pass the hole at that pace (e.g. every trial leaves the map). */
export interface NoSurfaceRead {
  readonly ok: false;
  readonly reason: "no-read" | "off-map" | "cannot-stop";
  readonly message: string;
  /** For "cannot-stop": the steepest slope a ball can stop on at this Stimp (%) and the slope found (%). */
  readonly maxStoppableSlopePct?: number;
  readonly slopePct?: number;
}

/** `{ ok: true, read }`, or why no read exists. */
export type SurfaceReadResult = { readonly ok: true; readonly read: SurfaceRead } | NoSurfaceRead;

const MISS_TOL_M = 1e-4;
const ROLL_PAST_TOL_M = 2e-4;
const ENTRY_SPEED_TOL_MPS = 1e-4;

/**
 * The read from any ball position to any hole position on a height map: the launch speed and start line whose roll
 * on the surface ({@link simulateRollOnSurface}) passes through the hole centre (to 0.1 mm) at the requested pace
 * (roll-past to 0.2 mm, or entry speed to 0.1 mm/s).
 *
 * Method: a first guess from the planar read (solveRead) of the plane with the surface's mean gradient along the
 * ball→hole line; Newton's method on (speed, start line) with a finite-difference Jacobian and step halving, as
 * solveReadDirect; if Newton fails, a bracketed fallback (Brent's method on the start line for the miss, each trial
 * line with Brent's method on the speed for the pace). On a plane the answer is solveRead's (tested to 1 mm).
 * @example solveReadOnSurface({ surface, stimpFt: 10, ballM: [2, 1], holeM: [2, 5] }) // { ok: true, read: { aimOffsetM, … } }
 */
export function solveReadOnSurface(input: SurfaceReadInput): SurfaceReadResult {
  const { surface, ballM, holeM } = input;
  const model = input.model ?? DEFAULT_ROLL_MODEL;
  const pace = input.pace ?? { rollPastM: 0.45 };
  const paceValue = "rollPastM" in pace ? pace.rollPastM : pace.entrySpeedMps;
  if (!(paceValue >= 0) || !Number.isFinite(paceValue)) throw new RangeError(`pace must be a finite number ≥ 0 (got ${paceValue})`);
  if (!surface.contains(ballM[0], ballM[1])) throw new RangeError(`ballM (${ballM.join(", ")}) is outside the height map`);
  if (!surface.contains(holeM[0], holeM[1])) throw new RangeError(`holeM (${holeM.join(", ")}) is outside the height map`);
  const D = Math.hypot(holeM[0] - ballM[0], holeM[1] - ballM[1]);
  if (!(D >= 0.05)) throw new RangeError("ball and hole must be at least 5 cm apart");
  const ey: [number, number] = [(holeM[0] - ballM[0]) / D, (holeM[1] - ballM[1]) / D];
  const ex: [number, number] = [ey[1], -ey[0]];

  // First guess: the planar read on the mean slope along the line.
  const grad: [number, number] = [0, 0];
  let gx = 0;
  let gy = 0;
  for (let k = 0; k <= 8; k++) {
    surface.gradientAt(ballM[0] + ((holeM[0] - ballM[0]) * k) / 8, ballM[1] + ((holeM[1] - ballM[1]) * k) / 8, grad);
    gx += grad[0] / 9;
    gy += grad[1] / 9;
  }
  // Too steep to stop where the putt finishes (at the hole) or on the mean slope along the line: the planar read's
  // cannot-stop answer, with the same message and numbers.
  surface.gradientAt(holeM[0], holeM[1], grad);
  const holeSlopePct = 100 * Math.hypot(grad[0], grad[1]);
  const steepest = Math.max(holeSlopePct, 100 * Math.hypot(gx, gy));
  const steepGreen = resolveGreen({ slopePct: steepest, fallLineDeg: 0, stimpFt: input.stimpFt, model });
  if (!stopsInPractice(steepGreen)) {
    const planarAnswer = cannotStop(describeModel(steepGreen));
    return {
      ok: false,
      reason: "cannot-stop",
      message: planarAnswer.message,
      maxStoppableSlopePct: planarAnswer.model.maxStoppableSlopePct,
      slopePct: steepest,
    };
  }
  const slopePct = Math.min(100 * Math.hypot(gx, gy), 0.9 * maxStoppableSlopePct(input.stimpFt, model));
  const fallLineDeg = ((Math.atan2(-(gx * ex[0] + gy * ex[1]), -(gx * ey[0] + gy * ey[1])) * 180) / Math.PI + 360) % 360;
  const planar = solveRead({ distanceM: D, slopePct, fallLineDeg, stimpFt: input.stimpFt, model, pace });
  const meanPlane = {
    slopePct,
    fallLineDeg,
    summary: describeModel(resolveGreen({ slopePct, fallLineDeg, stimpFt: input.stimpFt, model })),
  };
  if (!planar.ok) return cannotStopRead(meanPlane.summary.maxStoppableSlopePct);
  let v = planar.read.launchSpeedMps;
  let s = (planar.read.startLineDeg * Math.PI) / 180;

  let integrations = 0;
  type Trial = { miss: number; pace: number; roll: SurfaceRoll } | null;
  const trial = (speed: number, line: number): Trial => {
    integrations++;
    const r = simulateRollOnSurface({
      surface,
      stimpFt: input.stimpFt,
      model,
      ballM,
      holeM,
      launchSpeedMps: speed,
      startLineDeg: (line * 180) / Math.PI,
    });
    if (!r.ok) return null;
    const c = r.roll.closestApproach;
    const paceNow = "rollPastM" in pace ? r.roll.rollLengthM - c.alongPathM : c.speedMps;
    return { miss: c.offsetM, pace: paceNow - paceValue, roll: r.roll };
  };
  const paceTol = "rollPastM" in pace ? ROLL_PAST_TOL_M : ENTRY_SPEED_TOL_MPS;
  const converged = (t: Trial) => t !== null && Math.abs(t.miss) < MISS_TOL_M && Math.abs(t.pace) < paceTol;
  const norm = (t: Trial) => (t === null ? Number.POSITIVE_INFINITY : Math.hypot(t.miss / MISS_TOL_M, t.pace / paceTol));

  let current = trial(v, s);
  let iterations = 0;
  for (; iterations < 30 && current !== null && !converged(current); iterations++) {
    const hv = 1e-6 * v;
    const hs = 1e-6;
    const tv = trial(v + hv, s);
    const ts = trial(v, s + hs);
    if (tv === null || ts === null) break;
    const j11 = (tv.miss - current.miss) / hv;
    const j12 = (ts.miss - current.miss) / hs;
    const j21 = (tv.pace - current.pace) / hv;
    const j22 = (ts.pace - current.pace) / hs;
    const det = j11 * j22 - j12 * j21;
    if (!(Math.abs(det) > 0) || !Number.isFinite(det)) break;
    let dv = -(j22 * current.miss - j12 * current.pace) / det;
    let ds = -(-j21 * current.miss + j11 * current.pace) / det;
    let accepted = false;
    for (let half = 0; half < 12; half++) {
      const nv = v + dv;
      const ns = s + ds;
      if (nv > 0) {
        const next = trial(nv, ns);
        if (next !== null && norm(next) < norm(current)) {
          v = nv;
          s = ns;
          current = next;
          accepted = true;
          break;
        }
      }
      dv /= 2;
      ds /= 2;
    }
    if (!accepted) break;
  }
  if (current !== null && converged(current))
    return finishSurfaceRead(input, D, ex, ey, v, s, current.roll, "surface-newton", iterations, integrations, meanPlane);

  // Bracketed fallback: for each trial start line, Brent on the speed for the pace; then Brent on the line for the miss.
  const speedFor = (line: number): { speed: number; t: NonNullable<Trial> } | null => {
    const f = (speed: number) => trial(speed, line);
    let lo = v0Guess(planar.read.launchSpeedMps) * 0.5;
    let hi = lo * 4;
    let tlo = f(lo);
    let thi = f(hi);
    for (let k = 0; k < 6 && (tlo === null || thi === null || tlo.pace * thi.pace > 0); k++) {
      if (tlo !== null && tlo.pace > 0) lo /= 2;
      else hi *= 1.5;
      tlo = f(lo);
      thi = f(hi);
    }
    if (tlo === null || thi === null || tlo.pace * thi.pace > 0) return null;
    let best: NonNullable<Trial> = tlo;
    const root = brentRoot(
      (speed) => {
        const t = f(speed);
        if (t === null) return Number.NaN;
        best = t;
        return t.pace;
      },
      lo,
      hi,
      tlo.pace,
      thi.pace,
      (_x, fx) => Math.abs(fx) < paceTol,
      1e-10,
    );
    return { speed: root.x, t: best };
  };
  const missAt = (line: number) => speedFor(line)?.t.miss ?? Number.NaN;
  let a = s - 0.02;
  let bLine = s + 0.02;
  let fa = missAt(a);
  let fb = missAt(bLine);
  for (let k = 0; k < 6 && !(fa * fb <= 0); k++) {
    a -= 0.04 * (k + 1);
    bLine += 0.04 * (k + 1);
    fa = missAt(a);
    fb = missAt(bLine);
  }
  if (fa * fb <= 0) {
    const root = brentRoot(missAt, a, bLine, fa, fb, (_x, fx) => Math.abs(fx) < MISS_TOL_M, 1e-12);
    const sol = speedFor(root.x);
    if (sol !== null && converged(sol.t))
      return finishSurfaceRead(input, D, ex, ey, sol.speed, root.x, sol.t.roll, "surface-bracketed", iterations, integrations, meanPlane);
  }
  return {
    ok: false,
    reason: "no-read",
    message:
      "No start line and speed on this surface send the ball through the hole at that pace without leaving the map or failing to stop.",
  };
}

const v0Guess = (v: number) => (v > 0 ? v : 1);

function cannotStopRead(maxSlope: number): NoSurfaceRead {
  return {
    ok: false,
    reason: "cannot-stop",
    message: `A ball cannot stop on the slope between ball and hole: the steepest stoppable slope at this Stimp is ${maxSlope.toFixed(1)} %.`,
    maxStoppableSlopePct: maxSlope,
  };
}

function finishSurfaceRead(
  input: SurfaceReadInput,
  D: number,
  ex: [number, number],
  ey: [number, number],
  v: number,
  s: number,
  roll: SurfaceRoll,
  method: SurfaceRead["diagnostics"]["method"],
  iterations: number,
  integrations: number,
  meanPlane: { slopePct: number; fallLineDeg: number; summary: ModelSummary },
): SurfaceReadResult {
  const green = resolveGreen({ slopePct: 0, fallLineDeg: 0, stimpFt: input.stimpFt, model: input.model });
  const [bx, by] = input.ballM;
  const toPutt = ([x, y]: [number, number]): [number, number] => [(x - bx) * ex[0] + (y - by) * ex[1], (x - bx) * ey[0] + (y - by) * ey[1]];
  const startLineDeg = (s * 180) / Math.PI;
  const c = roll.closestApproach;
  return {
    ok: true,
    read: {
      launchSpeedMps: v,
      startLineDeg,
      ...aimOf(startLineDeg, D),
      entrySpeedMps: c.speedMps,
      rollPastM: roll.rollLengthM - c.alongPathM,
      flatPuttLengthM: flatPuttLengthM(v, green.rollingDecelMps2, roll.rollLengthM - c.alongPathM),
      breaks: Math.abs(startLineDeg) < 1e-6 ? "none" : startLineDeg < 0 ? "left-to-right" : "right-to-left",
      capture: roll.capture,
      path: roll.path,
      puttFramePath: roll.path.map(toPutt),
      restM: roll.restM,
      distanceM: D,
      meanPlane: { slopePct: meanPlane.slopePct, fallLineDeg: meanPlane.fallLineDeg },
      model: meanPlane.summary,
      diagnostics: { method, iterations, integrations },
    },
  };
}
