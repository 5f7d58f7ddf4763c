// The putt on the rehearse page: a read with its pace as a roll-past (the pace control's own scale). Its URL is
// the one read codec (src/lib/read-url.ts), so a read, a chart and rehearse link to each other unchanged.
import { solveRead } from "#physics/solve-read";
import type { ReadRequest } from "#shared/schemas/reads";
import type { UnitSystem } from "#shared/units";
import { decodeReadQueryChecked, encodeReadQuery, type ReadKey, type ReadValues } from "../../../lib/read-url";

/** The read input of the shared schema with its pace as a roll-past (a field added to the schema is part of it). */
export type RehearsePutt = Omit<ReadRequest, "pace"> & { rollPastM: number };

/** The pace control runs from dying (0) to firm (1.5 m past). */
export const ROLL_PAST_RANGE_M = { min: 0, max: 1.5 } as const;

export type DecodedRehearse = {
  putt: RehearsePutt;
  /** Keys whose link values could not be used (not numbers, outside the limits). */
  replaced: ReadKey[];
  /** The link gave the pace as an entry speed: it became the roll-past that speed gives on this putt. */
  fromEntrySpeedMps: number | null;
  /** The link's roll-past lay past the control's firm end and was brought back to it. */
  clampedRollPastM: number | null;
};

/** Query → the putt to rehearse; an entry-speed pace is turned into its roll-past by the same physics the page runs. */
export function decodeRehearse(params: URLSearchParams, units: UnitSystem): DecodedRehearse {
  const { values, replaced } = decodeReadQueryChecked(params, units);
  let rollPastM = values.rollPastM;
  let fromEntrySpeedMps: number | null = null;
  if (values.paceMode === "entrySpeed") {
    const read = solveRead({ ...values, pace: { entrySpeedMps: values.entrySpeedMps } });
    if (read.ok) {
      rollPastM = read.read.rollPastM;
      fromEntrySpeedMps = values.entrySpeedMps;
    }
  }
  let clampedRollPastM: number | null = null;
  if (rollPastM > ROLL_PAST_RANGE_M.max) {
    clampedRollPastM = rollPastM;
    rollPastM = ROLL_PAST_RANGE_M.max;
  }
  const { distanceM, slopePct, fallLineDeg, stimpFt } = values;
  return { putt: { distanceM, slopePct, fallLineDeg, stimpFt, rollPastM }, replaced, fromEntrySpeedMps, clampedRollPastM };
}

export function rehearseValues(p: RehearsePutt): ReadValues {
  return { ...p, paceMode: "rollPast", entrySpeedMps: 0 };
}

/** Putt → the one read query. */
export function encodeRehearse(p: RehearsePutt): string {
  return encodeReadQuery(rehearseValues(p));
}
