// The Stimp helper's arithmetic: two rolls on a slope entered in ft + in or m + cm, corrected with Brede's formula
// (physics owns it, and the server uses the same function on save).
import { stimpFromTwoWays } from "#physics";
import { ONE_WAY_LIMITS, STIMP_LIMITS } from "#shared/schemas/greens";
import { METRES_PER_FOOT, parseDecimal, type UnitSystem } from "#shared/units";

/** One roll as typed: feet and inches, or metres and centimetres. Empty parts count as 0. */
export type RollText = { major: string; minor: string };

function part(text: string): number | null {
  if (text.trim() === "") return 0;
  const n = parseDecimal(text);
  return n !== null && n >= 0 ? n : null;
}

/** A roll in feet, or null when a part is not a number or the whole is zero. */
export function rollFt(roll: RollText, units: UnitSystem): number | null {
  const major = part(roll.major);
  const minor = part(roll.minor);
  if (major === null || minor === null) return null;
  const ft = units === "imperial" ? major + minor / 12 : (major + minor / 100) / METRES_PER_FOOT;
  return ft > 0 ? ft : null;
}

/** "10.2 ft (10 ft 2 in)": Stimp as the trade writes it, with feet and inches beside it. */
export function stimpFeetAndInches(ft: number): string {
  // Feet and inches of the rounded figure, so the two never disagree (10.2 ft is 10 ft 2 in, not 10 ft 3 in).
  const totalIn = Math.round(Number(ft.toFixed(1)) * 12);
  const whole = Math.floor(totalIn / 12);
  const inches = totalIn % 12;
  return `${ft.toFixed(1)} ft (${whole} ft ${inches} in)`;
}

/** A roll for people in the user's units: "32 ft 2 in" or "9.81 m". */
export function formatRoll(ft: number, units: UnitSystem): string {
  if (units === "metric") return `${(ft * METRES_PER_FOOT).toFixed(2)} m`;
  const totalIn = Math.round(ft * 12);
  return `${Math.floor(totalIn / 12)} ft ${totalIn % 12} in`;
}

export type TwoWayResult =
  { ok: true; stimpFt: number; plainAverageFt: number; upFt: number; downFt: number } | { ok: false; reason: string };

/**
 * The corrected Stimp of two rolls in opposite directions on a slope: S = 2·S↑·S↓/(S↑ + S↓)
 * (A. D. Brede, "Measuring Green Speed on Sloped Putting Greens", USGA Green Section Record 28(6), 1990).
 */
export function twoWayStimp(upFt: number | null, downFt: number | null): TwoWayResult {
  if (upFt === null || downFt === null) return { ok: false, reason: "Enter both rolls." };
  for (const [name, v] of [
    ["up-slope", upFt],
    ["down-slope", downFt],
  ] as const) {
    if (v < ONE_WAY_LIMITS.minFt || v > ONE_WAY_LIMITS.maxFt)
      return { ok: false, reason: `The ${name} roll must be ${ONE_WAY_LIMITS.minFt}–${ONE_WAY_LIMITS.maxFt} ft.` };
  }
  if (upFt > downFt) return { ok: false, reason: "The up-slope roll is longer than the down-slope one: check which is which." };
  const stimpFt = stimpFromTwoWays(upFt, downFt);
  if (stimpFt < STIMP_LIMITS.minFt || stimpFt > STIMP_LIMITS.maxFt) {
    return {
      ok: false,
      reason: `These rolls give ${stimpFt.toFixed(1)} ft, outside ${STIMP_LIMITS.minFt}–${STIMP_LIMITS.maxFt} ft: check both.`,
    };
  }
  return { ok: true, stimpFt, plainAverageFt: (upFt + downFt) / 2, upFt, downFt };
}
