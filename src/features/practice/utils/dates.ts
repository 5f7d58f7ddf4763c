// Dates of sessions and rounds are calendar days (YYYY-MM-DD) with no time zone: format them as such.

const long = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const short = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** "Wed 1 May 2024". */
export function formatSessionDate(isoDate: string): string {
  const t = Date.parse(`${isoDate}T00:00:00Z`);
  return Number.isNaN(t) ? isoDate : long.format(t).replace(",", "");
}

/** "1 May 2024". */
export function formatShortDate(isoDate: string): string {
  const t = Date.parse(`${isoDate}T00:00:00Z`);
  return Number.isNaN(t) ? isoDate : short.format(t);
}

/** Today in the player's own calendar (not UTC): a session at 7 am in Auckland is today's. */
export function todayIso(now = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, "0");
  const d = String(now.getDate()).padStart(2, "0");
  return `${y}-${m}-${d}`;
}
