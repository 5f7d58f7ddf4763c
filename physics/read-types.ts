// Public result types of the read calculator, and small helpers shared by its solvers.
import type { Capture } from "./capture";
import type { RollState } from "./roll";
import type { GreenInput, ModelSummary } from "./roll-model";

/**
 * How firmly the ball is rolled: how far past the hole centre it would finish along its path if the hole were
 * covered (m), or its speed at the hole centre (m/s). 0 in either means a dying putt.
 */
export type Pace = { readonly rollPastM: number } | { readonly entrySpeedMps: number };

/** Inputs of a read: distance ball→hole (m), the green, and the pace (default roll-past 0.45 m). */
export interface ReadInput extends GreenInput {
  readonly distanceM: number;
  readonly pace?: Pace;
}

/** Which side the putt breaks to, seen by the golfer. */
export type BreakDirection = "left-to-right" | "right-to-left" | "none";

/** The work a solver did, beside its result. */
export interface ReadDiagnostics {
  readonly method: "closed-form" | "direct-2d" | "surface";
  readonly iterations: number;
  readonly integrations: number;
  readonly steps: number;
  readonly evaluations: number;
}

/**
 * Widest start line (degrees either side of the line to the hole) for which the answer gives an aim offset beside
 * the hole. Beyond it D·tan(start line) grows without bound (infinite at 90°, behind the ball past it), so the answer
 * is the start line and a plain statement. A product choice. @example MAX_AIM_OFFSET_START_LINE_DEG // 60
 */
export const MAX_AIM_OFFSET_START_LINE_DEG = 60;

/** How the aim is given: an offset beside the hole, or (for a very wide line) only the start line. */
export type AimGiven = "offset" | "start-line";

/** The aim fields of a read or chart cell. */
export interface AimAnswer {
  /** D·tan(start line), m, + = right of the hole; null when the start line is wider than 60° (see `aimGiven`). */
  readonly aimOffsetM: number | null;
  readonly aimGiven: AimGiven;
  /** The aim in plain words when only the start line is given; null otherwise. */
  readonly aimNote: string | null;
}

/**
 * The aim for a start line at distance D: an offset beside the hole up to 60°, beyond it the start line alone.
 * @example aimOf(91, 3).aimGiven // "start-line"
 */
export function aimOf(startLineDeg: number, distanceM: number): AimAnswer {
  if (Math.abs(startLineDeg) <= MAX_AIM_OFFSET_START_LINE_DEG) {
    return { aimOffsetM: distanceM * Math.tan((startLineDeg * Math.PI) / 180), aimGiven: "offset", aimNote: null };
  }
  const side = startLineDeg < 0 ? "left" : "right";
  const where = Math.abs(startLineDeg) < 90 ? "far" : Math.abs(startLineDeg) === 90 ? "square" : "back";
  const words =
    where === "far"
      ? "so wide that a spot beside the hole means little"
      : where === "square"
        ? "square to the line to the hole"
        : "further back than square to that line";
  return {
    aimOffsetM: null,
    aimGiven: "start-line",
    aimNote: `Start the ball ${Math.abs(startLineDeg).toFixed(0)}° ${side} of the line to the hole: ${words}. Judge it by the start direction.`,
  };
}

/**
 * Flat-putt length, m: the length of a putt on a flat green at the same Stimp that needs the same launch speed with
 * the same roll-past, v²/(2·a_r) − P (constant-deceleration closed form, derived). A flat putt gives its own length;
 * uphill longer, downhill shorter. @example flatPuttLengthM(Math.sqrt(2 * 0.5486 * 3.45), 0.5486, 0.45) // 3
 */
export function flatPuttLengthM(launchSpeedMps: number, rollingDecelMps2: number, rollPastM: number): number {
  return (launchSpeedMps * launchSpeedMps) / (2 * rollingDecelMps2) - rollPastM;
}

/**
 * A solved read. Angles in degrees, signed + = golfer's right; lengths in m; speeds in m/s. The aim is an offset
 * beside the hole (D·tan(start line)) while the start line is within 60° of the line to the hole, and the start line
 * with a plain statement beyond (near the cannot-stop threshold a dying putt can need a line sideways or behind).
 */
export interface Read extends AimAnswer {
  readonly launchSpeedMps: number;
  readonly startLineDeg: number;
  readonly entrySpeedMps: number;
  readonly rollPastM: number;
  /** Length of the flat putt (same Stimp) needing the same launch speed with the same roll-past, m. */
  readonly flatPuttLengthM: number;
  readonly breaks: BreakDirection;
  readonly capture: Capture;
  /** [x, y] points in m from the ball to its rest point (hole covered), in the putt frame. */
  readonly path: [number, number][];
  readonly restM: [number, number];
  readonly model: ModelSummary;
  readonly diagnostics: ReadDiagnostics;
}

/** The expected outcome "this ball cannot stop on this green" (a_g ≥ a_r), as a value. */
export interface CannotStop {
  readonly ok: false;
  readonly reason: "cannot-stop";
  /** True when a_g < a_r but within the practical margin (the ball would stop only hundreds of metres away). */
  readonly nearThreshold: boolean;
  readonly message: string;
  readonly model: ModelSummary;
}

/** Result of a read: `{ ok: true, read }` or the cannot-stop value. */
export type ReadResult = { readonly ok: true; readonly read: Read } | CannotStop;

/**
 * The cannot-stop value for a green (a_g ≥ a_r: a ball on it never comes to rest; derived from the equation of
 * motion). @example cannotStop(describeModel(green)).reason // "cannot-stop"
 */
export function cannotStop(model: ModelSummary): CannotStop {
  const nearThreshold = model.gravityDecelMps2 < model.rollingDecelMps2;
  return {
    ok: false,
    reason: "cannot-stop",
    nearThreshold,
    message:
      (nearThreshold
        ? "A ball would roll hundreds of metres before stopping on this green, so it is treated as unable to stop: gravity"
        : "A ball cannot stop on this green: gravity") +
      ` along the slope (${model.gravityDecelMps2.toFixed(3)} m/s²) is ${nearThreshold ? "within 1 % of" : "at least"} ` +
      `the rolling resistance (${model.rollingDecelMps2.toFixed(3)} m/s²); ` +
      `the steepest stoppable slope at this Stimp is ${model.maxStoppableSlopePct.toFixed(1)} %.`,
    model,
  };
}

/**
 * Turn roll samples into a drawable path: scaled by `scale`, mirrored by `mirror` (±1) in x, ending at `rest`,
 * with points closer than `minGapM` dropped and at most ~120 points kept.
 * @example toPath(trace.samples, trace.rest, 1, 1) // [[0, 0], …, [xRest, yRest]]
 */
export function toPath(samples: readonly RollState[], rest: RollState, scale: number, mirror: number): [number, number][] {
  const total = rest.alongPathM * scale;
  const minGap = Math.max(total / 110, 1e-4);
  const out: [number, number][] = [[0, 0]];
  let lastS = 0;
  for (const p of samples) {
    const s = p.alongPathM * scale;
    if (s - lastS >= minGap && total - s >= minGap / 2) {
      out.push([mirror * p.xM * scale, p.yM * scale]);
      lastS = s;
    }
  }
  out.push([mirror * rest.xM * scale, rest.yM * scale]);
  return out;
}

/** Check a distance, pace and the green's numbers are in the model's domain; throws RangeError otherwise. */
export function validateReadInput(input: ReadInput): Pace {
  if (!Number.isFinite(input.distanceM) || input.distanceM <= 0) {
    throw new RangeError(`distanceM must be a finite number > 0 (got ${input.distanceM})`);
  }
  const pace = input.pace ?? { rollPastM: 0.45 };
  const value = "rollPastM" in pace ? pace.rollPastM : pace.entrySpeedMps;
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`pace must be a finite number ≥ 0 (got ${value})`);
  return pace;
}
