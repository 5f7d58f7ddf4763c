// Gravity along the surface: the pull down the local fall line on a ball rolling without slipping.
import type { RollModel } from "./model";
import type { BallState, Force } from "./types";

/**
 * Gravity's deceleration along the fall line on ground of grade `grade` (rise over run, |∇h|), m/s²:
 * a_g = g·sinθ/(1 + I/(mR²)) with tanθ = grade, i.e. g·grade/√(1 + grade²)/(1 + I/(mR²)); (5/7)·g·sinθ for a solid
 * sphere (textbook rigid-body mechanics; Penner, "The physics of putting", Can. J. Phys. 80, 2002; docs/sources.md).
 * @example gravityDecelOnGrade(0.02, DEFAULT_ROLL_MODEL) // ≈ 0.1400
 */
export function gravityDecelOnGrade(grade: number, model: RollModel): number {
  return ((model.gravityMps2 / (1 + model.inertiaRatio)) * grade) / Math.sqrt(1 + grade * grade);
}

/**
 * The force: a_g along the steepest descent d̂ = −∇h/|∇h|, which is −g/(1 + I/(mR²))·∇h/√(1 + |∇h|²) as a vector
 * (zero on level ground). On a plane it is the constant a_g·d̂ of the closed form.
 * @example gravityAlongSurface(DEFAULT_ROLL_MODEL).add(state, acc)
 */
export function gravityAlongSurface(model: RollModel): Force {
  const gf = model.gravityMps2 / (1 + model.inertiaRatio);
  return {
    name: "gravity",
    closedForm: true,
    add(s: BallState, acc: [number, number]): void {
      const k = -gf / Math.sqrt(1 + s.gradX * s.gradX + s.gradY * s.gradY);
      acc[0] += k * s.gradX;
      acc[1] += k * s.gradY;
    },
  };
}
