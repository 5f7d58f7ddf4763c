// The planar integrator: one forward roll to rest on a plane with its events (odex); the forces are physics/forces/.
import { forceRhs } from "./forces";
import { integrateWithEvents, type IntegrationStats, type OdeEvent } from "./integrate";
import { rollingDecelAt, type Green } from "./roll-model";

/**
 * Index of each state component. The independent variable is τ with dt/dτ = |v|/v_ref (v_ref = launch speed):
 * a time change that removes the 1/|v| singularity of v̂ at rest, so the ball's stop is approached smoothly and
 * the step size never collapses. Components: position (m), velocity (m/s), time t (s), path length s (m).
 */
export const STATE = { x: 0, y: 1, vx: 2, vy: 3, t: 4, s: 5 } as const;

/** Speed below which the last few micrometres are finished in closed form, as a fraction of launch speed. */
export const STOP_SPEED_FRACTION = 1e-4;

/**
 * Right-hand side of the equation of motion on a resolved planar green: the shared force sum (physics/forces/,
 * dv/dt = a_g·d̂ − a_r(|v|)·v̂ for the default forces) written in τ, dv/dτ = |v|·a/v_ref, dp/dτ = |v|v/v_ref,
 * dt/dτ = |v|/v_ref, ds/dτ = |v|²/v_ref. Array state, usable by any integrator.
 * @example rollRhs(green, 1)(0, [0, 0, 0, 1, 0, 0]) // [0, 1, a_g·dx, a_g·dy − a_r, 1, 1]
 */
export function rollRhs(green: Green, refSpeedMps: number): (tau: number, y: number[]) => number[] {
  return forceRhs(green.ground, green.forces, refSpeedMps);
}

/** A point of a roll: position (m), velocity (m/s), time (s) and path length from launch (m). */
export interface RollState {
  readonly xM: number;
  readonly yM: number;
  readonly vxMps: number;
  readonly vyMps: number;
  readonly timeS: number;
  readonly alongPathM: number;
}

/** Options of one forward roll: a target point for closest-approach events, a line x = 0 crossing side. */
export interface RollOptions {
  /** Report local minima of the distance to this point (d/dt|p − h|² crossing from − to +). */
  readonly target?: readonly [number, number];
  /** With `target`: report where the ball's centre enters the circle of this radius around it (the hole's edge). */
  readonly rimRadiusM?: number;
  /** Report crossings of the line x = 0 towards this side (+1: to x > 0, −1: to x < 0). */
  readonly crossToward?: 1 | -1;
  /** Dense points recorded inside each integrator step (for drawing the path). */
  readonly samplesPerStep?: number;
  /** Relative integration tolerance (default 1e-8: positions to about 1e-8 of the path length). */
  readonly tolerance?: number;
}

/** One roll from launch to rest, with the located events and the integrator's work. */
export interface RollTrace {
  readonly rest: RollState;
  readonly approaches: RollState[];
  readonly crossings: RollState[];
  /** Entries into the circle of `rimRadiusM` around the target, in order. */
  readonly rimEntries: RollState[];
  readonly samples: RollState[];
  readonly stats: IntegrationStats;
}

function toState(y: readonly number[]): RollState {
  return { xM: y[0]!, yM: y[1]!, vxMps: y[2]!, vyMps: y[3]!, timeS: y[4]!, alongPathM: y[5]! };
}

/**
 * Roll a ball launched from the origin at `launchSpeedMps` in direction `(ux, uy)` (unit vector) until it stops.
 * The caller must have checked {@link canStop}; the run is bounded by the exact bound on τ to reach the stop speed
 * (|v| ≤ v_L·exp(−(a_r,min − a_g)τ/v_ref)) and by a step limit, and throws if either is exceeded.
 * @example rollToRest(green, 2, [0, 1]).rest.yM // straight flat putt: 2²/(2 a_r)
 */
export function rollToRest(
  green: Green,
  launchSpeedMps: number,
  direction: readonly [number, number],
  options: RollOptions = {},
): RollTrace {
  const v = launchSpeedMps;
  const ag = green.gravityDecelMps2;
  let arMin = rollingDecelAt(green, 0);
  for (let k = 1; k <= 16; k++) arMin = Math.min(arMin, rollingDecelAt(green, (v * k) / 16));
  if (!(arMin > ag)) throw new Error(`rollToRest: ball cannot stop (a_g=${ag}, min a_r=${arMin}); check canStop first`);
  const vStop = v * STOP_SPEED_FRACTION;
  const tauMax = (1.05 * v * Math.log(1 / STOP_SPEED_FRACTION)) / (arMin - ag) + v / arMin;
  const events: OdeEvent[] = [{ value: (_t, y) => Math.hypot(y[2]!, y[3]!) - vStop, direction: -1, terminal: true }];
  const target = options.target;
  if (target !== undefined) {
    events.push({
      value: (_t, y) => (y[0]! - target[0]) * y[2]! + (y[1]! - target[1]) * y[3]!,
      direction: 1,
      terminal: false,
      scan: () => 16,
    });
  }
  const rim = options.rimRadiusM;
  const idxRim = target !== undefined && rim !== undefined ? events.length : -1;
  if (target !== undefined && rim !== undefined) {
    events.push({
      value: (_t, y) => (y[0]! - target[0]) ** 2 + (y[1]! - target[1]) ** 2 - rim * rim,
      direction: -1,
      terminal: false,
      // A step's points lie within half its length of one of its ends: scan only steps that can reach the circle.
      scan: (a, b) => {
        const ds = b[5]! - a[5]!;
        const d = Math.min(Math.hypot(a[0]! - target[0], a[1]! - target[1]), Math.hypot(b[0]! - target[0], b[1]! - target[1]));
        return d - ds / 2 > rim ? 0 : ds / (rim / 8);
      },
    });
  }
  const side = options.crossToward;
  if (side !== undefined) events.push({ value: (_t, y) => side * y[0]!, direction: 1, terminal: false });

  const lengthScale = Math.max((v * v) / (2 * (arMin - ag)), 1e-3);
  const tol = options.tolerance ?? 1e-8;
  const a = 0.1 * tol;
  const absTol = [a * lengthScale, a * lengthScale, a * v, a * v, (a * v) / arMin, a * lengthScale];
  const run = integrateWithEvents(rollRhs(green, v), 0, [0, 0, v * direction[0], v * direction[1], 0, 0], tauMax, events, {
    relTol: tol,
    absTol,
    maxSteps: 5000,
    initialStep: (0.01 * v) / arMin,
    samplesPerStep: options.samplesPerStep ?? 0,
  });
  if (run.terminalEvent !== 0) {
    throw new Error(`rollToRest: no stop within τ=${tauMax} (bound); state [${run.y.join(", ")}]`);
  }
  const approaches: RollState[] = [];
  const crossings: RollState[] = [];
  const rimEntries: RollState[] = [];
  const idxTarget = target !== undefined ? 1 : -1;
  for (const hit of run.hits) {
    if (hit.event === idxTarget) approaches.push(toState(hit.y));
    else if (hit.event === idxRim) rimEntries.push(toState(hit.y));
    else if (hit.event > 0) crossings.push(toState(hit.y));
  }
  return {
    rest: finishInClosedForm(green, run.y),
    approaches,
    crossings,
    rimEntries,
    samples: run.samples.y.map(toState),
    stats: run.stats,
  };
}

/**
 * The last tiny bit to rest in closed form: from speed v with angle ψ to the fall line, constant deceleration
 * a = a_r − a_g·cos ψ along v̂ gives v²/(2a) more metres and v/a more seconds (a few nanometres at most).
 */
function finishInClosedForm(green: Green, y: readonly number[]): RollState {
  const vx = y[2]!;
  const vy = y[3]!;
  const sp = Math.hypot(vx, vy);
  const [dx, dy] = green.fallLine;
  const cosPsi = sp > 0 ? (vx * dx + vy * dy) / sp : 1;
  const a = rollingDecelAt(green, 0) - green.gravityDecelMps2 * cosPsi;
  const ds = (sp * sp) / (2 * a);
  const ux = sp > 0 ? vx / sp : 0;
  const uy = sp > 0 ? vy / sp : 0;
  return { xM: y[0]! + ux * ds, yM: y[1]! + uy * ds, vxMps: 0, vyMps: 0, timeS: y[4]! + sp / a, alongPathM: y[5]! + ds };
}
