// Dates of sessions and rounds are calendar days (YYYY-MM-DD); shared/format.ts formatDate shows them (as that
// day, in the reader's locale). Here only today's date in the player's own calendar.

/** Today in the player's own calendar (not UTC): a session at 7 am in Auckland is today's. */
export function todayIso(now = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, "0");
  const d = String(now.getDate()).padStart(2, "0");
  return `${y}-${m}-${d}`;
}
