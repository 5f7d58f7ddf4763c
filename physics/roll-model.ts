// The rolling model: a planar green resolved into the forces' accelerations (physics/forces/), stopping and summaries.
import {
  DEFAULT_ROLL_MODEL,
  closedFormApplies,
  forcesFor,
  gravityDecelOnGrade,
  planeGround,
  rollingDecelFromStimp as decelFromStimp,
  type Force,
  type ForceInputs,
  type Ground,
  type RollModel,
} from "./forces";
import { requireFinite, requirePositive } from "./validate";

export { DEFAULT_ROLL_MODEL, type RollModel } from "./forces";
export { requireFinite, requirePositive } from "./validate";

/**
 * Rolling-resistance deceleration from a Stimp reading, m/s²: a_r = v0²/(2·S) with S in metres (constant
 * deceleration; the Stimpmeter ball leaves the bar at v0 and rolls S). Derived; docs/sources.md, "Rolling on a slope".
 * @example rollingDecelFromStimp(10) // ≈ 0.5486 m/s²
 */
export function rollingDecelFromStimp(stimpFt: number, model: RollModel = DEFAULT_ROLL_MODEL): number {
  return decelFromStimp(stimpFt, model);
}

/**
 * Gravity deceleration along the fall line for a ball rolling without slipping, m/s²:
 * a_g = g·sinθ/(1 + I/(mR²)), θ = atan(slopePct/100); (5/7)·g·sinθ for a solid sphere (textbook mechanics). The
 * gravity force's own magnitude (forces/gravity.ts) on a plane.
 * @example gravityDecelFromSlope(2) // ≈ 0.1400 m/s²
 */
export function gravityDecelFromSlope(slopePct: number, model: RollModel = DEFAULT_ROLL_MODEL): number {
  requireFinite("slopePct", slopePct);
  if (slopePct < 0) throw new RangeError(`slopePct must be ≥ 0 (got ${slopePct}); use fallLineDeg for direction`);
  return gravityDecelOnGrade(slopePct / 100, model);
}

/**
 * Two-way Stimp reading corrected for slope, ft: S = 2·S_up·S_down/(S_up + S_down) (A. D. Brede, "Measuring
 * Green Speed on Sloped Putting Greens", USGA Green Section Record 28(6), 1990; exact for constant deceleration).
 * @example stimpFromTwoWays(1.85 / 0.3048, 9.81 / 0.3048) // ≈ 10.2 ft
 */
export function stimpFromTwoWays(upFt: number, downFt: number): number {
  requirePositive("upFt", upFt);
  requirePositive("downFt", downFt);
  return (2 * upFt * downFt) / (upFt + downFt);
}

/**
 * A planar green resolved into the model's accelerations, all in the putt frame (ball at origin, hole on +y).
 * `fallLine` is the unit vector d̂ = (sin φ, cos φ) the green falls toward.
 */
export interface Green {
  readonly slopePct: number;
  readonly fallLineDeg: number;
  readonly stimpFt: number;
  readonly gravityDecelMps2: number;
  readonly rollingDecelMps2: number;
  readonly fallLine: readonly [number, number];
  readonly model: RollModel;
  /** The plane as ground for the forces (∇h = −(slope/100)·d̂), and the forces acting (physics/forces/). */
  readonly ground: Ground;
  readonly forces: readonly Force[];
  /** Every force is one the planar closed form models exactly (else the solvers integrate). */
  readonly closedForm: boolean;
}

/** The green inputs every public function takes: the plane, and the forces' inputs (Stimp, model, …). */
export interface GreenInput extends ForceInputs {
  readonly slopePct: number;
  readonly fallLineDeg: number;
}

/**
 * Resolve slope %, fall line and Stimp into accelerations (see {@link gravityDecelFromSlope} and
 * {@link rollingDecelFromStimp}). Throws RangeError on non-finite or out-of-domain inputs.
 * @example resolveGreen({ slopePct: 2, fallLineDeg: 90, stimpFt: 10 }).fallLine // [1, ≈0]
 */
export function resolveGreen(input: GreenInput): Green {
  const model = input.model ?? DEFAULT_ROLL_MODEL;
  requireFinite("fallLineDeg", input.fallLineDeg);
  const phi = (input.fallLineDeg * Math.PI) / 180;
  const fallLine: [number, number] = [Math.sin(phi), Math.cos(phi)];
  const forces = forcesFor(input);
  return {
    slopePct: input.slopePct,
    fallLineDeg: input.fallLineDeg,
    stimpFt: input.stimpFt,
    gravityDecelMps2: gravityDecelFromSlope(input.slopePct, model),
    rollingDecelMps2: rollingDecelFromStimp(input.stimpFt, model),
    fallLine,
    model,
    ground: planeGround(input.slopePct, fallLine),
    forces,
    closedForm: closedFormApplies(forces),
  };
}

/**
 * Rolling deceleration at a speed, m/s²: a_r times the model's speed factor (1 for the default model).
 * @example rollingDecelAt(resolveGreen({ slopePct: 0, fallLineDeg: 0, stimpFt: 10 }), 1) // ≈ 0.5486
 */
export function rollingDecelAt(green: Green, speedMps: number): number {
  const f = green.model.resistanceSpeedFactor;
  return f === null ? green.rollingDecelMps2 : green.rollingDecelMps2 * f(speedMps);
}

/**
 * Whether a ball on this green can come to rest: it stays put once stopped only if a_g < a_r at rest, and a
 * moving ball on a slope with a_g ≥ a_r never stops (derived from the equation of motion). About 7.9 % at Stimp
 * 10, 6.5 % at 12 and 5.6 % at 14 in the default model.
 * @example canStop(resolveGreen({ slopePct: 8, fallLineDeg: 0, stimpFt: 10 })) // false
 */
export function canStop(green: Green): boolean {
  return green.gravityDecelMps2 < rollingDecelAt(green, 0);
}

/**
 * Margin below the exact threshold inside which the solvers treat a green as cannot-stop too: with a_g within 1 %
 * of a_r a putt would roll over 100× its flat distance before stopping (v²/(2(a_r − a_g))), far off any green,
 * and the integration becomes stiff. A product choice, not physics.
 */
export const PRACTICAL_STOP_MARGIN = 0.01;

/**
 * Whether a ball stops within a practical distance: a_g < (1 − {@link PRACTICAL_STOP_MARGIN})·a_r at rest.
 * @example stopsInPractice(resolveGreen({ slopePct: 7.8, fallLineDeg: 0, stimpFt: 10 })) // false (canStop: true)
 */
export function stopsInPractice(green: Green): boolean {
  return green.gravityDecelMps2 < (1 - PRACTICAL_STOP_MARGIN) * rollingDecelAt(green, 0);
}

/**
 * Steepest slope on which a ball can stop at this Stimp, % (a_g = a_r solved for θ; default model only).
 * @example maxStoppableSlopePct(10) // ≈ 7.86
 */
export function maxStoppableSlopePct(stimpFt: number, model: RollModel = DEFAULT_ROLL_MODEL): number {
  const sinTheta = (rollingDecelFromStimp(stimpFt, model) * (1 + model.inertiaRatio)) / model.gravityMps2;
  if (sinTheta >= 1) return Number.POSITIVE_INFINITY;
  return 100 * Math.tan(Math.asin(sinTheta));
}

/** The model and green figures reported beside every result. */
export interface ModelSummary {
  readonly name: string;
  readonly v0Mps: number;
  readonly inertiaRatio: number;
  /** 1/(1 + I/(mR²)): 5/7 for the solid sphere. */
  readonly gravityFactor: number;
  readonly gravityMps2: number;
  readonly rollingDecelMps2: number;
  readonly gravityDecelMps2: number;
  readonly resistance: "constant" | "speed-dependent";
  readonly maxStoppableSlopePct: number;
}

/**
 * Summarise the model and the green's accelerations for display and audit.
 * @example describeModel(resolveGreen({ slopePct: 2, fallLineDeg: 90, stimpFt: 10 })).gravityFactor // 0.714…
 */
export function describeModel(green: Green): ModelSummary {
  const m = green.model;
  return {
    name: m.name,
    v0Mps: m.stimpExitSpeedMps,
    inertiaRatio: m.inertiaRatio,
    gravityFactor: 1 / (1 + m.inertiaRatio),
    gravityMps2: m.gravityMps2,
    rollingDecelMps2: green.rollingDecelMps2,
    gravityDecelMps2: green.gravityDecelMps2,
    resistance: m.resistanceSpeedFactor === null ? "constant" : "speed-dependent",
    maxStoppableSlopePct: maxStoppableSlopePct(green.stimpFt, m),
  };
}
