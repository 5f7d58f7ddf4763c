// The forces on the ball, defined once. Every way of rolling a ball uses this sum: the planar integrator (roll.ts),
// the surface integrator (surface-roll.ts) and, through the accelerations it is built from, the closed form
// (planar-path.ts) that the read, the chart and the Monte Carlo (make-probability.ts, dispersion.ts) run on.
// A new force (wind, grain): its own file here, one entry in `forcesFor`, its input field in ForceInputs
// (types.ts) and in the shared schema (DEVELOPERS.md, "Adding a force").
import { gravityAlongSurface } from "./gravity";
import { DEFAULT_ROLL_MODEL } from "./model";
import { rollingDecelFromStimp, rollingResistance } from "./rolling-resistance";
import type { BallState, Force, ForceInputs, Ground } from "./types";

export { gravityAlongSurface, gravityDecelOnGrade } from "./gravity";
export { DEFAULT_ROLL_MODEL, type RollModel } from "./model";
export { rollingDecelFromStimp, rollingResistance } from "./rolling-resistance";
export type { BallState, Force, ForceInputs, Ground } from "./types";

/**
 * The forces acting for a read's inputs, in a fixed order: gravity along the surface, rolling resistance (a_r from
 * the Stimp), then any further force the inputs ask for.
 * @example forcesFor({ stimpFt: 10 }).map((f) => f.name) // ["gravity", "rolling resistance"]
 */
export function forcesFor(inputs: ForceInputs): readonly Force[] {
  const model = inputs.model ?? DEFAULT_ROLL_MODEL;
  return [gravityAlongSurface(model), rollingResistance(rollingDecelFromStimp(inputs.stimpFt, model), model)];
}

/** Whether the planar closed form models every one of these forces exactly (else: integrate). */
export function closedFormApplies(forces: readonly Force[]): boolean {
  return forces.every((f) => f.closedForm);
}

/**
 * A plane of grade `slopePct` % falling toward the unit vector `fallLine`: ∇h = −(slopePct/100)·d̂ everywhere.
 * @example planeGround(2, [1, 0]).gradientAt(0, 0, [0, 0]) // [−0.02, 0]
 */
export function planeGround(slopePct: number, fallLine: readonly [number, number]): Ground {
  const gx = (-slopePct / 100) * fallLine[0];
  const gy = (-slopePct / 100) * fallLine[1];
  return {
    gradientAt(_x, _y, out) {
      out[0] = gx;
      out[1] = gy;
      return out;
    },
  };
}

/** A fresh scratch state for {@link accelerationInto}. */
export function newBallState(): BallState {
  return { x: 0, y: 0, vx: 0, vy: 0, speed: 0, gradX: 0, gradY: 0 };
}

/**
 * The sum of the forces at position (x, y) with velocity (vx, vy), written into `acc` (m/s²). `s` and `grad` are the
 * caller's scratch; nothing is allocated.
 * @example accelerationInto(planeGround(0, [0, 1]), forcesFor({ stimpFt: 10 }), newBallState(), [0, 0], 0, 0, 0, 1, acc) // acc ≈ [0, −0.5486]
 */
export function accelerationInto(
  ground: Ground,
  forces: readonly Force[],
  s: BallState,
  grad: [number, number],
  x: number,
  y: number,
  vx: number,
  vy: number,
  acc: [number, number],
): [number, number] {
  ground.gradientAt(x, y, grad);
  s.x = x;
  s.y = y;
  s.vx = vx;
  s.vy = vy;
  s.speed = Math.sqrt(vx * vx + vy * vy);
  s.gradX = grad[0];
  s.gradY = grad[1];
  acc[0] = 0;
  acc[1] = 0;
  for (let i = 0; i < forces.length; i++) forces[i]!.add(s, acc);
  return acc;
}

/**
 * The equation of motion dv/dt = Σ forces, dp/dt = v as a first-order system for an integrator, written in τ with
 * dt/dτ = |v|/v_ref (a time change that removes the 1/|v| of v̂ at rest, so a stop is approached smoothly): state
 * [x, y, vx, vy, t, s] (m, m/s, s, path length m); dp/dτ = |v|·v/v_ref, dv/dτ = |v|·a/v_ref, dt/dτ = |v|/v_ref,
 * ds/dτ = |v|²/v_ref. The only right-hand side of the rolling ball in physics/.
 * @example forceRhs(planeGround(0, [0, 1]), forcesFor({ stimpFt: 10 }), 1)(0, [0, 0, 0, 1, 0, 0]) // [0, 1, 0, −0.5486, 1, 1]
 */
export function forceRhs(ground: Ground, forces: readonly Force[], refSpeedMps: number): (tau: number, y: number[]) => number[] {
  const inv = 1 / refSpeedMps;
  const s = newBallState();
  const grad: [number, number] = [0, 0];
  const acc: [number, number] = [0, 0];
  return (_tau, y) => {
    const vx = y[2]!;
    const vy = y[3]!;
    accelerationInto(ground, forces, s, grad, y[0]!, y[1]!, vx, vy, acc);
    const sp = s.speed;
    const w = sp * inv;
    return [vx * w, vy * w, acc[0] * w, acc[1] * w, w, sp * w];
  };
}
