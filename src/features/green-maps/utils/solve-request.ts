// The body of POST /api/greens/:id/reads/solve from what the page holds: the tapped ball and hole (green frame,
// metres), the Stimp text and the roll-past text in the user's short unit. Null with a reason when it cannot be asked.
import { parseDecimal } from "#shared/units";
import { READ_LIMITS } from "#shared/schemas/reads";
import type { SurfaceSolveRequest } from "#shared/schemas/height-map";
import { fromShortUnit, type UnitSystem } from "#shared/units";

export const MIN_PUTT_M = 0.3;

export type SolveInputs = {
  ball: [number, number] | null;
  hole: [number, number] | null;
  stimpText: string;
  rollPastText: string;
  units: UnitSystem;
};

export type SolveRequestResult = {
  request: SurfaceSolveRequest | null;
  errors: { stimp?: string; rollPast?: string; placement?: string };
};

function parse(text: string): number {
  return parseDecimal(text) ?? Number.NaN;
}

export function surfaceSolveRequest({ ball, hole, stimpText, rollPastText, units }: SolveInputs): SolveRequestResult {
  const errors: SolveRequestResult["errors"] = {};
  const stimpFt = parse(stimpText);
  if (!(stimpFt >= READ_LIMITS.stimpFt.min && stimpFt <= READ_LIMITS.stimpFt.max)) {
    errors.stimp = `Enter a Stimp reading from ${READ_LIMITS.stimpFt.min} to ${READ_LIMITS.stimpFt.max} ft.`;
  }
  const rollPastM = fromShortUnit(parse(rollPastText), units);
  if (!(rollPastM >= READ_LIMITS.rollPastM.min && rollPastM <= READ_LIMITS.rollPastM.max + 1e-9)) {
    errors.rollPast = units === "imperial" ? "Enter a length from 0 to 118 in." : "Enter a length from 0 to 300 cm.";
  }
  if (!ball) errors.placement = "Tap the map where the ball lies.";
  else if (!hole) errors.placement = "Now tap where the hole is.";
  else if (Math.hypot(hole[0] - ball[0], hole[1] - ball[1]) < MIN_PUTT_M)
    errors.placement = "The hole must be at least 30 cm from the ball.";
  if (Object.keys(errors).length > 0 || !ball || !hole) return { request: null, errors };
  return { request: { ball, hole, stimpFt, pace: { rollPastM: Math.min(rollPastM, READ_LIMITS.rollPastM.max) } }, errors };
}
