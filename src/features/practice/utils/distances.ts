// Distance steps and quick picks for logging on the green, in the player's units; stored in metres.
import { fromLongUnit, fromShortUnit, toLongUnit, toShortUnit, type UnitSystem } from "#shared/units";
import { PUTT_LIMITS } from "#shared/schemas/putts";

/** Quick picks for a putt's length: feet, or metres. */
export const DISTANCE_PICKS: Record<UnitSystem, readonly number[]> = {
  imperial: [3, 4, 5, 6, 8, 10, 15, 20, 30],
  metric: [1, 1.5, 2, 3, 5, 7, 10],
};
/** The stepper moves 1 ft or 0.25 m. */
export const DISTANCE_STEP: Record<UnitSystem, number> = { imperial: 1, metric: 0.25 };

/** How far a miss finished: inches, or centimetres. */
export const MISS_PICKS: Record<UnitSystem, readonly number[]> = { imperial: [4, 12, 24, 36], metric: [10, 30, 60, 100] };
export const MISS_STEP: Record<UnitSystem, number> = { imperial: 2, metric: 5 };

export const DEFAULT_DISTANCE: Record<UnitSystem, number> = { imperial: 6, metric: 2 };

/** Rounds to the stepper's grid so repeated steps do not collect floating-point dust (0.1 + 0.2). */
function snap(value: number, step: number): number {
  return Math.round(value / step) * step;
}

/** The distance (m) one step up or down in the user's unit, kept inside what the API accepts. */
export function stepDistanceM(distanceM: number, direction: 1 | -1, units: UnitSystem): number {
  const step = DISTANCE_STEP[units];
  const shown = snap(toLongUnit(distanceM, units), step);
  const minShown = units === "imperial" ? 1 : 0.25;
  const maxShown = toLongUnit(PUTT_LIMITS.distanceM.max, units);
  const next = Math.min(Math.floor(maxShown), Math.max(minShown, snap(shown + direction * step, step)));
  return fromLongUnit(next, units);
}

/** A miss length (m, unsigned) one step up or down in inches or centimetres, at least one step. */
export function stepMissM(missM: number, direction: 1 | -1, units: UnitSystem): number {
  const step = MISS_STEP[units];
  const shown = snap(toShortUnit(missM, units), step);
  const maxShown = toShortUnit(PUTT_LIMITS.missLengthM.max, units);
  return fromShortUnit(Math.min(maxShown, Math.max(step, shown + direction * step)), units);
}

/** "8 ft" / "2.25 m": the distance as the stepper shows it. */
export function distanceLabel(distanceM: number, units: UnitSystem): string {
  if (units === "imperial") return `${Math.round(toLongUnit(distanceM, units))} ft`;
  return `${Number(distanceM.toFixed(2))} m`;
}

/** "12 in" / "30 cm". */
export function missLabel(missM: number, units: UnitSystem): string {
  return units === "imperial" ? `${Math.round(toShortUnit(missM, units))} in` : `${Math.round(toShortUnit(missM, units))} cm`;
}

/** Whether two distances are the same pick in the user's unit (so a chip shows as chosen). */
export function samePick(aM: number, bM: number, units: UnitSystem): boolean {
  return Math.abs(toLongUnit(aM, units) - toLongUnit(bM, units)) < 1e-6;
}
