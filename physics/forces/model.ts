// The named parameters of the forces on the ball (the rolling model), so that a richer model can replace any of them.
import { GRAVITY_MPS2, SOLID_SPHERE_INERTIA_RATIO, STIMP_EXIT_SPEED_MPS } from "../constants";

/**
 * Named, documented parameters of the rolling model, so that a richer model can replace any of them.
 * - `stimpExitSpeedMps` v0: ball speed leaving the Stimpmeter (USGA booklet; 6 ft/s).
 * - `inertiaRatio` I/(mR²): 2/5 for a uniform solid sphere; gravity along the slope is g·sinθ/(1 + I/(mR²)).
 * - `gravityMps2`: g.
 * - `resistanceSpeedFactor`: multiplies the Stimp-calibrated rolling deceleration as a function of speed; `null`
 *   means constant resistance (the default). Only the constant model is homogeneous (see `solveRead`); a
 *   speed-dependent factor should also keep `factor(0) > 0`.
 * @example const model: RollModel = { ...DEFAULT_ROLL_MODEL, inertiaRatio: 0.38 };
 */
export interface RollModel {
  readonly name: string;
  readonly stimpExitSpeedMps: number;
  readonly inertiaRatio: number;
  readonly gravityMps2: number;
  readonly resistanceSpeedFactor: ((speedMps: number) => number) | null;
}

/**
 * Default model: true-rolling solid sphere on a plane, constant rolling resistance calibrated from the Stimp
 * (a_r = v0²/(2S), derived from constant deceleration; Brede 1990 relies on the same assumption), gravity
 * a_g = (5/7)·g·sinθ (textbook rigid-body mechanics; Penner, "The physics of putting", Can. J. Phys. 2002).
 * @example DEFAULT_ROLL_MODEL.stimpExitSpeedMps // 1.8288
 */
export const DEFAULT_ROLL_MODEL: RollModel = Object.freeze({
  name: "rolling-sphere-constant-resistance",
  stimpExitSpeedMps: STIMP_EXIT_SPEED_MPS,
  inertiaRatio: SOLID_SPHERE_INERTIA_RATIO,
  gravityMps2: GRAVITY_MPS2,
  resistanceSpeedFactor: null,
});
