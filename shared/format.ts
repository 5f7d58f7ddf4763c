// Numbers and dates for people: the one place they are rounded and worded (issue 14). Storage stays SI and
// unrounded; only what is shown or exported passes through here. Lengths come from units.ts (re-exported).
import { formatLength, formatShort, mpsToFtps, type UnitSystem } from "./units";

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
