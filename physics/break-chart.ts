// Sweeps of the read: aim against pace, and a chart of aims over distances × fall-line directions.
import { DEFAULT_ROLL_PAST_M } from "./constants";
import { stopsInPractice, describeModel, resolveGreen, type GreenInput, type ModelSummary } from "./roll-model";
import { cannotStop, type AimGiven, type CannotStop, type Pace } from "./read-types";
import { solveRead } from "./solve-read";

/** Default roll-past sweep for {@link breakVsPace}, m: dying (0) to firm (1.5). */
export const DEFAULT_ROLL_PAST_SWEEP_M: readonly number[] = [0, 0.1, 0.2, 0.3, 0.45, 0.6, 0.9, 1.2, 1.5];

/** One pace of a {@link breakVsPace} sweep. */
export interface PaceRow {
  readonly rollPastM: number;
  /** Null beyond a 60° start line (see Read.aimGiven). */
  readonly aimOffsetM: number | null;
  readonly aimGiven: AimGiven;
  readonly startLineDeg: number;
  readonly launchSpeedMps: number;
  readonly entrySpeedMps: number;
}

/** Inputs of a pace sweep. */
export interface PaceSweepInput extends GreenInput {
  readonly distanceM: number;
  readonly rollPastsM?: readonly number[];
}

/**
 * Aim offset and launch speed for a sweep of roll-past paces on one putt: a dying ball needs more borrow (slower
 * balls break more: docs/sources.md, "Break").
 * @example breakVsPace({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }) // rows from dying to firm
 */
export function breakVsPace(
  input: PaceSweepInput,
): { readonly ok: true; readonly rows: PaceRow[]; readonly model: ModelSummary } | CannotStop {
  const green = resolveGreen(input);
  if (!stopsInPractice(green)) return cannotStop(describeModel(green));
  const rows: PaceRow[] = [];
  for (const rollPastM of input.rollPastsM ?? DEFAULT_ROLL_PAST_SWEEP_M) {
    const r = solveRead({ ...input, pace: { rollPastM } });
    if (!r.ok) return r;
    const { aimOffsetM, aimGiven, startLineDeg, launchSpeedMps, entrySpeedMps } = r.read;
    rows.push({ rollPastM, aimOffsetM, aimGiven, startLineDeg, launchSpeedMps, entrySpeedMps });
  }
  return { ok: true, rows, model: describeModel(green) };
}

/** One cell of a break chart; `ok: false` marks a cell whose ball cannot stop. */
export type ChartCell =
  | {
      readonly ok: true;
      readonly distanceM: number;
      readonly fallLineDeg: number;
      /** Null beyond a 60° start line: the cell then gives the start line only (`aimGiven: "start-line"`). */
      readonly aimOffsetM: number | null;
      readonly aimGiven: AimGiven;
      readonly startLineDeg: number;
      readonly launchSpeedMps: number;
      readonly entrySpeedMps: number;
    }
  | { readonly ok: false; readonly distanceM: number; readonly fallLineDeg: number; readonly reason: "cannot-stop" };

/** Inputs of a break chart: one slope, Stimp and pace; a grid of distances (m) × fall lines (deg). */
export interface BreakChartInput extends Omit<GreenInput, "fallLineDeg"> {
  readonly distancesM: readonly number[];
  readonly fallLineDegs: readonly number[];
  readonly pace?: Pace;
}

/** A break chart: `cells[i][j]` is distance i, fall line j; diagnostics summed over the cells. */
export interface BreakChart {
  readonly distancesM: readonly number[];
  readonly fallLineDegs: readonly number[];
  readonly cells: ChartCell[][];
  readonly canStop: boolean;
  readonly model: ModelSummary;
  readonly diagnostics: { readonly integrations: number; readonly evaluations: number };
}

/**
 * Aim offsets and launch speeds over distances × fall-line directions at one slope, Stimp and pace (each cell a
 * {@link solveRead}). On a green where the ball cannot stop every cell is marked `{ ok: false, reason: "cannot-stop" }`.
 * @example breakChart({ slopePct: 2, stimpFt: 10, distancesM: [1, 2, 3], fallLineDegs: [0, 90, 180, 270] })
 */
export function breakChart(input: BreakChartInput): BreakChart {
  const green = resolveGreen({ ...input, fallLineDeg: 0 });
  const stoppable = stopsInPractice(green);
  const pace = input.pace ?? { rollPastM: DEFAULT_ROLL_PAST_M };
  let integrations = 0;
  let evaluations = 0;
  const cells = input.distancesM.map((distanceM) =>
    input.fallLineDegs.map((fallLineDeg): ChartCell => {
      if (!stoppable) return { ok: false, distanceM, fallLineDeg, reason: "cannot-stop" };
      const r = solveRead({ ...input, distanceM, fallLineDeg, pace });
      if (!r.ok) return { ok: false, distanceM, fallLineDeg, reason: r.reason };
      integrations += r.read.diagnostics.iterations;
      evaluations += r.read.diagnostics.evaluations;
      const { aimOffsetM, aimGiven, startLineDeg, launchSpeedMps, entrySpeedMps } = r.read;
      return { ok: true, distanceM, fallLineDeg, aimOffsetM, aimGiven, startLineDeg, launchSpeedMps, entrySpeedMps };
    }),
  );
  return {
    distancesM: input.distancesM,
    fallLineDegs: input.fallLineDegs,
    cells,
    canStop: stoppable,
    model: describeModel(green),
    diagnostics: { integrations, evaluations },
  };
}
