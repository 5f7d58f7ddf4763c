// Plain words for the odds panel. Probabilities in [0, 1]; spreads as the API gives them (start line in degrees,
// pace as the σ of ln(actual ÷ intended roll length), shown as a percentage of the roll).
import { formatCount } from "#shared/format";
import { formatShort, type UnitSystem } from "#shared/units";

/** "34 %", "under 1 %", "over 99 %": a whole percentage, never a false 0 or 100. */
export function percentWords(p: number): string {
  if (!Number.isFinite(p)) return "–";
  if (p > 0 && p < 0.005) return "under 1 %";
  if (p < 1 && p > 0.995) return "over 99 %";
  return `${Math.round(p * 100)} %`;
}

/** Two probabilities to compare: whole percentages, or one decimal when whole ones would look the same. */
export function comparedPercents(a: number, b: number): [string, string] {
  const wa = percentWords(a);
  const wb = percentWords(b);
  if (wa !== wb || Math.abs(a - b) < 0.0005 || /under|over/.test(wa)) return [wa, wb];
  return [`${(a * 100).toFixed(1)} %`, `${(b * 100).toFixed(1)} %`];
}

/** The headline: "You hole this about 34 % of the time". */
export function makeHeadline(p: number): string {
  const words = percentWords(p);
  if (words.startsWith("under") || words.startsWith("over")) return `You hole this ${words} of the time`;
  return `You hole this about ${words} of the time`;
}

/** "give or take 0.5 %" for a Monte Carlo standard error (one σ), to one decimal. */
export function sampleErrorWords(standardError: number, samples: number): string {
  const pct = standardError * 100;
  return `${formatCount(samples)} simulated putts, give or take ${pct < 0.1 ? "0.1" : pct.toFixed(1)} %`;
}

/** "over 1 m" or "over 1 m (3 ft 3 in)": the second-putt length the API counts. */
export function secondPuttLengthWords(units: UnitSystem): string {
  return units === "imperial" ? "over 1 m (3 ft 3 in)" : "over 1 m";
}

/** "1.2°" and "0.8–1.9°". */
export function angleWords(deg: number): string {
  return `${deg.toFixed(1)}°`;
}

/** The pace σ as a share of the roll length: 0.12 → "12 %". */
export function paceSpreadWords(pace: number): string {
  const pct = pace * 100;
  return `${pct < 10 ? pct.toFixed(1) : Math.round(pct)} %`;
}

export function rangeWords(lo: number, hi: number, format: (v: number) => string): string {
  return `${format(lo).replace(/\s?[°%]$/, "")}–${format(hi)}`;
}

/** Where the spread comes from: the player's own putts, or mostly the club-golfer prior. */
export function basisWords(putts: number | null, usedPrior: boolean | null): string {
  if (putts === null || usedPrior === null) return "Spread given with the request.";
  if (!usedPrior) return `Based on ${formatCount(putts)} of your putts.`;
  if (putts === 0) return "No putts logged yet — using typical club-golfer values.";
  return `Few putts logged yet — using typical club-golfer values, moved a little by your ${formatCount(putts)}.`;
}

/** "Finish 14 in past" for a roll-past. */
export function rollPastWords(rollPastM: number, units: UnitSystem): string {
  return `finish ${formatShort(rollPastM, units)} past`;
}

/** Whether two paces are the same for a golfer: within 1 cm of roll-past. */
export function samePace(a: number, b: number): boolean {
  return Math.abs(a - b) < 0.01;
}
