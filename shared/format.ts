// Numbers and dates for people: the one place they are rounded and worded (issue 14). Storage stays SI and
// unrounded; only what is shown or exported passes through here. Lengths come from units.ts (re-exported).
import { formatLength, formatShort, metresToHoleWidths, mpsToFtps, toShortUnit, type UnitSystem } from "./units";

export { formatLength, formatShort };

/** Rounds to `decimals` places, -0 made 0. */
export function roundTo(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f + 0;
}

/** At most `decimals` places, no trailing zeros: 9.58974 → "9.6", 10 → "10". */
export function formatNumber(value: number, decimals: number): string {
  return String(roundTo(value, decimals));
}

/** A Stimp reading as the trade quotes it, to 0.1 ft: "9.6". */
export function formatStimp(ft: number): string {
  return roundTo(ft, 1).toFixed(1).replace(/\.0$/, "");
}

/** "Stimp 9.6". */
export function stimpText(ft: number): string {
  return `Stimp ${formatStimp(ft)}`;
}

/** A slope in percent, to 0.1: "2.5 %". */
export function formatSlope(pct: number): string {
  return `${formatNumber(pct, 1)} %`;
}

/** A ball speed in the user's units: "2.6 ft/s" or "0.80 m/s". */
export function formatSpeed(mps: number, units: UnitSystem): string {
  return units === "imperial" ? `${mpsToFtps(mps).toFixed(1)} ft/s` : `${mps.toFixed(2)} m/s`;
}

/** Metres for a file (CSV, JSON): to the millimetre, so 6 ft is 1.829, never 1.8288000000000002. */
export function exportMetres(m: number): number {
  return roundTo(m, 3);
}
/** A Stimp reading for a file: to 0.01 ft (people see 0.1 ft; the file keeps one more place for a re-import). */
export function exportStimp(ft: number): number {
  return roundTo(ft, 2);
}
/** A speed for a file: to the mm/s. */
export function exportSpeed(mps: number): number {
  return roundTo(mps, 3);
}

// ---- dates ------------------------------------------------------------------------------------------------
// One format, in the reader's own locale (undefined = the browser's). Calendar dates ("2026-12-02", a session's
// or a due date) are read as that day wherever the reader is (UTC); instants (an ISO timestamp) in local time.

type DateInput = string | number | Date;

const cache = new Map<string, Intl.DateTimeFormat>();
function formatter(locale: string | undefined, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale ?? ""}|${JSON.stringify(options)}`;
  let f = cache.get(key);
  if (!f) cache.set(key, (f = new Intl.DateTimeFormat(locale, options)));
  return f;
}

const CALENDAR_DAY = /^\d{4}-\d{2}-\d{2}$/;

function toDate(value: DateInput): { date: Date; calendar: boolean } {
  if (typeof value === "string" && CALENDAR_DAY.test(value)) return { date: new Date(`${value}T00:00:00Z`), calendar: true };
  return { date: value instanceof Date ? value : new Date(value), calendar: false };
}

export type DateStyle = "date" | "day" | "weekday" | "long" | "dateTime" | "instant";

const STYLES: Record<DateStyle, Intl.DateTimeFormatOptions> = {
  /** "2 Dec 2026" / "Dec 2, 2026" as the reader's locale writes it. */
  date: { day: "numeric", month: "short", year: "numeric" },
  /** "2 Dec": within a chart or a short list. */
  day: { day: "numeric", month: "short" },
  /** "Wed 2 Dec 2026". */
  weekday: { weekday: "short", day: "numeric", month: "short", year: "numeric" },
  /** "Wednesday 2 December 2026". */
  long: { weekday: "long", day: "numeric", month: "long", year: "numeric" },
  /** "2 Dec 2026, 14:05". */
  dateTime: { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" },
  /** "2 Dec 2026, 14:05:09": a record (audit, mail) to the second. */
  instant: { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", second: "2-digit" },
};

/** The one date formatter. `locale` is for tests; the app passes none (the reader's locale). */
export function formatDate(value: DateInput, style: DateStyle = "date", locale?: string): string {
  const { date, calendar } = toDate(value);
  if (Number.isNaN(date.getTime())) return typeof value === "string" ? value : "";
  return formatter(locale, { ...STYLES[style], ...(calendar ? { timeZone: "UTC" } : {}) }).format(date);
}

/** A count with the reader's grouping: "10,000" / "10 000". */
export function formatCount(n: number, locale?: string): string {
  return new Intl.NumberFormat(locale).format(n);
}

/** Below this the ball is all but still at the hole (5 cm/s): it topples in, and is said so in words. */
export const STOPPED_AT_HOLE_MPS = 0.05;

/** The ball at the hole for a sentence "… at the hole": "just reaching the hole, dying" or "rolling at 2.2 ft/s". */
export function atHoleText(entrySpeedMps: number, units: UnitSystem): string {
  return entrySpeedMps < STOPPED_AT_HOLE_MPS ? "just reaching the hole, dying" : `rolling at ${formatSpeed(entrySpeedMps, units)}`;
}

// ---- a read in words (issue 16: aim, fall line and pace are worded here, once) --------------------------------
// Signed sideways lengths and angles: + = the golfer's right. Fall lines: the direction the green falls toward,
// clockwise from the line ball→hole seen from above (0 = away toward the hole: a downhill putt; 90 = to the right).

/** Which side a signed sideways length or angle lies on. */
export function sideOf(signed: number): "left" | "right" {
  return signed < 0 ? "left" : "right";
}

/** Under this an aim is the centre of the hole: about a fifth of an inch, less than anyone can aim. */
export const AIM_CENTRE_M = 0.005;

/** A start line wider than the API gives an offset for (aimOffsetM null): "75° left of the hole". */
export function startLineAimText(startLineDeg: number): string {
  return `${Math.abs(startLineDeg).toFixed(0)}° ${sideOf(startLineDeg)} of the hole`;
}

/** The aim in a few words: "39 cm left of the hole", "straight at the hole", or "start it 75° left of the hole". */
export function aimWords(aimOffsetM: number | null, units: UnitSystem, startLineDeg = 0): string {
  if (aimOffsetM === null) return `start it ${startLineAimText(startLineDeg)}`;
  if (Math.abs(aimOffsetM) < AIM_CENTRE_M) return "straight at the hole";
  const size = isLongAim(aimOffsetM, units) ? formatLength(Math.abs(aimOffsetM), units) : formatShort(aimOffsetM, units);
  return `${size} ${sideOf(aimOffsetM)} of the hole`;
}

/** From a yard (36 in, as rounded) or a metre (100 cm) on, an aim reads better as a length, "10 ft 9 in" or "3.28 m",
 *  than as "129 in": a long putt across a slope is aimed that far outside. */
export function isLongAim(m: number, units: UnitSystem): boolean {
  return Math.round(toShortUnit(Math.abs(m), units)) >= (units === "imperial" ? 36 : 100);
}

/** "3.6 hole widths", "1 hole width", "12 hole widths". */
export function holeWidthsWords(m: number): string {
  const w = metresToHoleWidths(Math.abs(m));
  return `${w < 10 ? w.toFixed(1) : Math.round(w)} hole width${w >= 0.95 && w < 1.05 ? "" : "s"}`;
}

/**
 * The two leans of a fall line: toward the hole or the golfer, and to a side. Within 15° of a quarter only that
 * quarter's lean counts (null for the other), as a golfer would call it.
 */
export function fallLineLeans(fallLineDeg: number): { along: "downhill" | "uphill" | null; side: "left" | "right" | null } {
  const r = (fallLineDeg * Math.PI) / 180;
  const along = Math.cos(r);
  const side = Math.sin(r);
  const slight = Math.sin((15 * Math.PI) / 180);
  return {
    along: Math.abs(along) <= slight ? null : along > 0 ? "downhill" : "uphill",
    side: Math.abs(side) <= slight ? null : side > 0 ? "right" : "left",
  };
}

/** The fall line from where the golfer stands: "falls to your right and toward the hole (downhill)". */
export function fallLineWords(fallLineDeg: number): string {
  const { along, side } = fallLineLeans(fallLineDeg);
  if (side === null) return along === "downhill" ? "falls toward the hole (downhill putt)" : "falls toward you (uphill putt)";
  const sideWords = `falls to your ${side}`;
  if (along === null) return `${sideWords} (side hill)`;
  return `${sideWords} and ${along === "downhill" ? "toward the hole (downhill)" : "toward you (uphill)"}`;
}

/** The fall line in a read's short words: "falls to the right", "straight uphill", "downhill, falls left". */
export function describeFallLine(fallLineDeg: number): string {
  const { along, side } = fallLineLeans(fallLineDeg);
  if (side === null) return along === "downhill" ? "straight downhill" : "straight uphill";
  if (along === null) return `falls to the ${side}`;
  return `${along}, falls ${side}`;
}

/** Under this roll-past (1 cm) the answer calls the pace dying: the ball just reaches the hole. */
export const DYING_ROLL_PAST_M = 0.01;

/** The answer's pace: "Firm enough to finish 17 in past if it misses" and "Hit it as hard as a flat 11 ft 3 in putt". */
export function paceWords(rollPastM: number, flatPuttLengthM: number, units: UnitSystem): { headline: string; flatPutt: string } {
  return {
    headline:
      rollPastM < DYING_ROLL_PAST_M
        ? "Just reach the hole: a dying pace"
        : `Firm enough to finish ${formatShort(rollPastM, units)} past if it misses`,
    flatPutt: `Hit it as hard as a flat ${formatLength(Math.max(0, flatPuttLengthM), units)} putt`,
  };
}

/** A roll-past on the pace scale: "45 cm" or "1 ft 6 in"; 0 reads "0 cm" / "0 in". */
export function rollPastWords(m: number, units: UnitSystem): string {
  if (units === "metric") return `${Math.round(m * 100)} cm`;
  return m < 0.0127 ? "0 in" : formatLength(m, units);
}

/** Where a roll-past sits between dying and firm, in words (the pace scale's bands). */
export function paceFeel(rollPastM: number): string {
  if (rollPastM < 0.05) return "dying: just reaches the hole";
  if (rollPastM < 0.3) return "soft";
  if (rollPastM < 0.7) return "a makeable pace";
  if (rollPastM < 1.1) return "firm";
  return "very firm";
}
