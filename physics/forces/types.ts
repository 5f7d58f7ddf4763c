// What a force on the ball is: a function of the ball's state, the ground under it and the read's inputs.
import type { RollModel } from "./model";

/**
 * The ball at one instant, horizontal components (the putt frame or the green's frame, whichever the integrator
 * uses): position (m), velocity and speed (m/s), and the ground's gradient under the ball (rise over run). One
 * mutable scratch object per roll, refilled before each evaluation, so summing the forces allocates nothing.
 */
export interface BallState {
  x: number;
  y: number;
  vx: number;
  vy: number;
  speed: number;
  gradX: number;
  gradY: number;
}

/** The ground the ball rolls on: the gradient of its height at a point, written into `out` (a plane or a height map). */
export interface Ground {
  gradientAt(x: number, y: number, out: [number, number]): [number, number];
}

/** The read's inputs the forces are made from (a new force's input field goes here and in the shared schema). */
export interface ForceInputs {
  readonly stimpFt: number;
  readonly model?: RollModel;
}

/**
 * One force on a true-rolling ball, per unit mass with the ball's rotational inertia included (so an acceleration,
 * m/s², horizontal). `add` adds it to `acc` at the state `s`; it must not allocate (it runs at every integrator
 * evaluation). `closedForm` says the planar closed form (planar-roll.ts) models it exactly; a force that is not
 * (wind, grain, speed-dependent resistance) makes every solver take the integrating path.
 */
export interface Force {
  readonly name: string;
  readonly closedForm: boolean;
  add(s: BallState, acc: [number, number]): void;
}
