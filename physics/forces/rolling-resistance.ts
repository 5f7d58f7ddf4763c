// Rolling resistance: the green's drag on the rolling ball, calibrated from the Stimpmeter.
import { FOOT_M } from "../constants";
import { requirePositive } from "../validate";
import type { RollModel } from "./model";
import type { BallState, Force } from "./types";

/**
 * Rolling-resistance deceleration from a Stimp reading, m/s²: a_r = v0²/(2·S) with S in metres (constant
 * deceleration; the Stimpmeter ball leaves the bar at v0 and rolls S). Derived; docs/sources.md, "Rolling on a slope".
 * @example rollingDecelFromStimp(10, DEFAULT_ROLL_MODEL) // ≈ 0.5486 m/s²
 */
export function rollingDecelFromStimp(stimpFt: number, model: RollModel): number {
  requirePositive("stimpFt", stimpFt);
  return (model.stimpExitSpeedMps * model.stimpExitSpeedMps) / (2 * stimpFt * FOOT_M);
}

/**
 * The force: a_r(|v|) against the velocity, a_r times the model's speed factor (1 for the default, constant model;
 * only that one has the planar closed form). Zero at rest (the integrators' stop logic handles a ball at rest).
 * @example rollingResistance(0.5486, DEFAULT_ROLL_MODEL).add(state, acc)
 */
export function rollingResistance(rollingDecelMps2: number, model: RollModel): Force {
  const factor = model.resistanceSpeedFactor;
  return {
    name: "rolling resistance",
    closedForm: factor === null,
    add(s: BallState, acc: [number, number]): void {
      if (!(s.speed > 0)) return;
      const a = (factor === null ? rollingDecelMps2 : rollingDecelMps2 * factor(s.speed)) / s.speed;
      acc[0] -= a * s.vx;
      acc[1] -= a * s.vy;
    },
  };
}
