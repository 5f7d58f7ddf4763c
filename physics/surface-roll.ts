// The surface integrator: the roll on a green that is not a plane, the ball on a height map's interpolated surface,
// under the shared forces (physics/forces/). The read on a surface is surface-read.ts.
import { captureAtRim, type Capture, type RimCrossing } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { forceRhs, forcesFor, gravityDecelOnGrade } from "./forces";
import type { HeightSurface } from "./height-surface";
import { integrateWithEvents, type OdeEvent } from "./integrate";
import { DEFAULT_ROLL_MODEL, maxStoppableSlopePct, rollingDecelFromStimp, type RollModel } from "./roll-model";

/** Inputs of a roll on a surface: ball and hole in the green's frame (m), launch speed (m/s), start line (°, + = right of the line to the hole). */
export interface SurfaceRollInput {
  readonly surface: HeightSurface;
  readonly stimpFt: number;
  readonly model?: RollModel;
  readonly ballM: readonly [number, number];
  readonly holeM: readonly [number, number];
  readonly launchSpeedMps: number;
  readonly startLineDeg: number;
}

/** A roll on a surface to rest. Points in the green's frame (m). */
export interface SurfaceRoll {
  readonly path: [number, number][];
  readonly restM: [number, number];
  readonly restHeightM: number;
  readonly rollLengthM: number;
  readonly rollTimeS: number;
  readonly closestApproach: {
    readonly distanceM: number;
    readonly offsetM: number;
    readonly speedMps: number;
    readonly alongPathM: number;
    readonly pointM: [number, number];
    readonly atRest: boolean;
  };
  readonly capture: Capture;
  /** Where the ball's centre crossed the hole's edge before its closest pass (null if it never did). */
  readonly rim: RimCrossing | null;
  /** Samples along the path: time (s), speed (m/s), position (m) and height (m). */
  readonly samples: {
    readonly timeS: number[];
    readonly speedMps: number[];
    readonly xM: number[];
    readonly yM: number[];
    readonly heightM: number[];
  };
  /** Times the ball stopped where the slope was too steep to hold it and rolled on from rest. */
  readonly restarts: number;
  readonly diagnostics: { readonly steps: number; readonly evaluations: number };
}

/** The expected outcomes "this ball does not come to rest on the map", as values (bounded work, never a hang). */
export interface SurfaceNoRest {
  readonly ok: false;
  readonly reason: "off-map" | "cannot-stop";
  readonly message: string;
  /** Where the ball was when the roll was given up (the edge crossing, or the last point). */
  readonly lastM: [number, number];
  readonly localSlopePct: number;
  readonly maxStoppableSlopePct: number;
  readonly path: [number, number][];
}

/** `{ ok: true, roll }`, or the value saying the ball does not come to rest on the map. */
export type SurfaceRollResult = { readonly ok: true; readonly roll: SurfaceRoll } | SurfaceNoRest;

const STOP_SPEED_FRACTION = 1e-3;
const MAX_RESTARTS = 40;
const RESTART_SPEED_MPS = 1e-4;

/**
 * Roll a true-rolling ball on a height map's surface from `ballM` until it stops for good, reporting the path, its
 * closest pass at the hole (local minima of |p − h| and the rest point, as simulateRoll) and Holmes's capture outcome
 * there (Am. J. Phys. 59(2), 1991; the hole covered for the path).
 *
 * Equation of motion in the map's horizontal coordinates: the shared forces (physics/forces/) on the surface, for the
 * default model the planar model's with a local slope: dv/dt = a_g(p)·d̂(p) − a_r·v̂, a_g = g·sinθ/(1 + I/mR²) = (5/7)·g·|∇h|/√(1 + |∇h|²) along the steepest descent d̂ = −∇h/|∇h| (textbook
 * rigid-body mechanics; Penner, Can. J. Phys. 80, 2002), a_r = v0²/(2S) from the Stimp (derived). On a plane this is
 * exactly rollRhs. Integrated with odex (integrate.ts) in τ (dt/dτ = |v|/v_ref) with events: stop, closest approach,
 * leaving the map. When the ball stops where the local a_g ≥ a_r it rolls on from rest down the slope (up to 40 times).
 * Leaving the map, or no rest within that budget, returns a {@link SurfaceNoRest} value.
 * @example simulateRollOnSurface({ surface, stimpFt: 10, ballM: [1, 1], holeM: [1, 4], launchSpeedMps: 2, startLineDeg: -3 })
 */
export function simulateRollOnSurface(input: SurfaceRollInput): SurfaceRollResult {
  const { surface, ballM, holeM } = input;
  const model = input.model ?? DEFAULT_ROLL_MODEL;
  if (!surface.contains(ballM[0], ballM[1])) throw new RangeError(`ballM (${ballM.join(", ")}) is outside the height map`);
  if (!(input.launchSpeedMps >= 0) || !Number.isFinite(input.launchSpeedMps))
    throw new RangeError(`launchSpeedMps must be ≥ 0 (got ${input.launchSpeedMps})`);
  if (!Number.isFinite(input.startLineDeg)) throw new RangeError(`startLineDeg must be finite (got ${input.startLineDeg})`);
  const D = Math.hypot(holeM[0] - ballM[0], holeM[1] - ballM[1]);
  if (!(D > 0)) throw new RangeError("ball and hole must be apart");
  const ar = rollingDecelFromStimp(input.stimpFt, model);
  const maxSlope = maxStoppableSlopePct(input.stimpFt, model);
  // Launch direction: the ball→hole line turned by the start line (+ = clockwise, to the golfer's right).
  const ey: [number, number] = [(holeM[0] - ballM[0]) / D, (holeM[1] - ballM[1]) / D];
  const s = (input.startLineDeg * Math.PI) / 180;
  const dir: [number, number] = [Math.cos(s) * ey[0] + Math.sin(s) * ey[1], Math.cos(s) * ey[1] - Math.sin(s) * ey[0]];

  const vRef = Math.max(input.launchSpeedMps, 0.05);
  const grad: [number, number] = [0, 0];
  const localAg = (x: number, y: number) => {
    surface.gradientAt(x, y, grad);
    const grade = Math.hypot(grad[0], grad[1]);
    return { ag: gravityDecelOnGrade(grade, model), slopePct: 100 * grade, gx: grad[0], gy: grad[1] };
  };
  // The equation of motion: the shared force sum on this surface (on a plane it is exactly rollRhs).
  const rhs = forceRhs(surface, forcesFor({ stimpFt: input.stimpFt, model }), vRef);
  const b = surface.bounds;
  const events: OdeEvent[] = [
    { value: (_t, y) => Math.hypot(y[2]!, y[3]!) - STOP_SPEED_FRACTION * vRef, direction: -1, terminal: true },
    { value: (_t, y) => Math.min(y[0]! - b.minX, b.maxX - y[0]!, y[1]! - b.minY, b.maxY - y[1]!), direction: -1, terminal: true },
    { value: (_t, y) => (y[0]! - holeM[0]) * y[2]! + (y[1]! - holeM[1]) * y[3]!, direction: 1, terminal: false },
    {
      // The ball's centre entering the hole's edge (scanned inside the steps that can reach it).
      value: (_t, y) => (y[0]! - holeM[0]) ** 2 + (y[1]! - holeM[1]) ** 2 - HOLE_RADIUS_M ** 2,
      direction: -1,
      terminal: false,
      scan: (a, c) => {
        const ds = c[5]! - a[5]!;
        const d = Math.min(Math.hypot(a[0]! - holeM[0], a[1]! - holeM[1]), Math.hypot(c[0]! - holeM[0], c[1]! - holeM[1]));
        return d - ds / 2 > HOLE_RADIUS_M ? 0 : ds / (HOLE_RADIUS_M / 8);
      },
    },
  ];
  const lengthScale = Math.max((vRef * vRef) / (2 * ar), 1e-3);
  const a = 1e-9;
  const absTol = [a * lengthScale, a * lengthScale, a * vRef, a * vRef, (a * vRef) / ar, a * lengthScale];
  const tauMax = (200 * vRef * Math.log(1 / STOP_SPEED_FRACTION)) / ar;

  const samples = { timeS: [] as number[], speedMps: [] as number[], xM: [] as number[], yM: [] as number[], heightM: [] as number[] };
  const record = (y: readonly number[]) => {
    samples.timeS.push(y[4]!);
    samples.speedMps.push(Math.hypot(y[2]!, y[3]!));
    samples.xM.push(y[0]!);
    samples.yM.push(y[1]!);
    samples.heightM.push(surface.heightAt(y[0]!, y[1]!));
  };
  const approaches: number[][] = [];
  const rimEntries: number[][] = [];
  let state = [ballM[0], ballM[1], input.launchSpeedMps * dir[0], input.launchSpeedMps * dir[1], 0, 0];
  record(state);
  let steps = 0;
  let evaluations = 0;
  const path = (): [number, number][] => thin(samples.xM.map((x, i) => [x, samples.yM[i]!] as [number, number]));
  const noRest = (reason: SurfaceNoRest["reason"], y: readonly number[], why: string): SurfaceNoRest => {
    const local = localAg(y[0]!, y[1]!);
    return {
      ok: false,
      reason,
      message: why,
      lastM: [y[0]!, y[1]!],
      localSlopePct: local.slopePct,
      maxStoppableSlopePct: maxSlope,
      path: path(),
    };
  };

  let restarts = 0;
  for (;;) {
    if (Math.hypot(state[2]!, state[3]!) > 0) {
      let run;
      try {
        run = integrateWithEvents(rhs, 0, state, tauMax, events, {
          relTol: 1e-9,
          absTol,
          maxSteps: 20000,
          initialStep: (0.01 * vRef) / ar,
          samplesPerStep: 5,
        });
      } catch (error) {
        return noRest("cannot-stop", state, `The roll did not settle: ${(error as Error).message}`);
      }
      steps += run.stats.steps;
      evaluations += run.stats.evaluations;
      for (let k = 1; k < run.samples.y.length; k++) record(run.samples.y[k]!);
      for (const hit of run.hits) {
        if (hit.event === 2) approaches.push(hit.y);
        else if (hit.event === 3) rimEntries.push(hit.y);
      }
      if (run.terminalEvent === 1) {
        return noRest("off-map", run.y, "The ball rolls off the height map before it stops; extend the map or roll it more gently.");
      }
      if (run.terminalEvent !== 0) {
        return noRest(
          "cannot-stop",
          run.y,
          "The ball does not come to rest on this surface within the roll's budget (the slopes are too steep to hold it).",
        );
      }
      state = finishInClosedForm(run.y, localAg(run.y[0]!, run.y[1]!), ar);
      record(state);
    }
    const local = localAg(state[0]!, state[1]!);
    if (local.ag < ar) break;
    if (restarts >= MAX_RESTARTS) {
      return noRest(
        "cannot-stop",
        state,
        `The ball cannot stay at rest here: the local slope (${local.slopePct.toFixed(1)} %) is steeper than the ${maxSlope.toFixed(1)} % a ball can stop on at Stimp ${input.stimpFt}.`,
      );
    }
    // Too steep to hold the ball: it rolls on from rest down the steepest descent.
    restarts++;
    const gn = Math.hypot(local.gx, local.gy);
    state = [state[0]!, state[1]!, (-RESTART_SPEED_MPS * local.gx) / gn, (-RESTART_SPEED_MPS * local.gy) / gn, state[4]!, state[5]!];
  }

  const rest = state;
  const dist = (y: readonly number[]) => Math.hypot(y[0]! - holeM[0], y[1]! - holeM[1]);
  let closest: readonly number[] = rest;
  for (const p of approaches) if (dist(p) < dist(closest)) closest = p;
  const atRest = closest === rest;
  let vx = closest[2]!;
  let vy = closest[3]!;
  if (atRest && samples.xM.length >= 2) {
    const n = samples.xM.length;
    vx = samples.xM[n - 1]! - samples.xM[n - 2]!;
    vy = samples.yM[n - 1]! - samples.yM[n - 2]!;
  }
  const sp = Math.hypot(vx, vy);
  const dx = closest[0]! - holeM[0];
  const dy = closest[1]! - holeM[1];
  const side = sp > 0 ? (vy * dx - vx * dy) / sp : dx;
  const d = dist(closest);
  const speed = atRest ? 0 : Math.hypot(closest[2]!, closest[3]!);
  let rim: RimCrossing | null = null;
  if (d < HOLE_RADIUS_M && !atRest) {
    for (const e of rimEntries) {
      if (e[4]! > closest[4]!) break;
      const es = Math.hypot(e[2]!, e[3]!);
      rim = { offsetM: Math.abs((e[3]! * (e[0]! - holeM[0]) - e[2]! * (e[1]! - holeM[1])) / es), speedMps: es };
    }
  }
  return {
    ok: true,
    roll: {
      path: path(),
      restM: [rest[0]!, rest[1]!],
      restHeightM: surface.heightAt(rest[0]!, rest[1]!),
      rollLengthM: rest[5]!,
      rollTimeS: rest[4]!,
      closestApproach: {
        distanceM: d,
        offsetM: side >= 0 ? d : -d,
        speedMps: speed,
        alongPathM: closest[5]!,
        pointM: [closest[0]!, closest[1]!],
        atRest,
      },
      capture: captureAtRim(d, rim, speed, dist(rest) < HOLE_RADIUS_M),
      rim,
      samples,
      restarts,
      diagnostics: { steps, evaluations },
    },
  };
}

/** The last few micrometres to rest at constant deceleration a = a_r − a_g·cosψ (as roll.ts does on a plane). */
function finishInClosedForm(y: readonly number[], local: { ag: number; gx: number; gy: number }, ar: number): number[] {
  const vx = y[2]!;
  const vy = y[3]!;
  const sp = Math.hypot(vx, vy);
  const gn = Math.hypot(local.gx, local.gy);
  const cosPsi = sp > 0 && gn > 0 ? -(vx * local.gx + vy * local.gy) / (sp * gn) : 0;
  const a = Math.max(ar - local.ag * cosPsi, 1e-9);
  const ds = (sp * sp) / (2 * a);
  const ux = sp > 0 ? vx / sp : 0;
  const uy = sp > 0 ? vy / sp : 0;
  return [y[0]! + ux * ds, y[1]! + uy * ds, 0, 0, y[4]! + sp / a, y[5]! + ds];
}

/** At most ~150 points, closer ones dropped, first and last kept. */
function thin(points: [number, number][]): [number, number][] {
  if (points.length <= 150) return points;
  const step = Math.ceil(points.length / 150);
  const out = points.filter((_, i) => i % step === 0);
  const last = points[points.length - 1]!;
  if (out[out.length - 1] !== last) out.push(last);
  return out;
}
