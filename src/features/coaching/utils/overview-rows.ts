// The squad overview (GET /api/coach/squads/:id/overview) as flat table rows: numbers to sort by, words to show.
import type { SquadOverview } from "#shared/schemas/squads";

export type OverviewBand = { recent: number | null; past: number | null; recentN: number; pastN: number; change: number | null };
export type OverviewRow = {
  playerId: string;
  name: string;
  email: string;
  sessions: number;
  putts: number;
  lastSession: string | null;
  bands: OverviewBand[];
  sgRecent: number | null;
  sgPast: number | null;
  /** Recent minus past strokes gained per putt: above 0 is improving. */
  sgChange: number | null;
  ladder: string;
  /** Sort key: overdue first, then open, then done, then none. */
  ladderOrder: number;
};

/** Below this many putts in a band and period the rate is shown but not compared (it swings too much). */
export const COMPARE_MIN_PUTTS = 10;

export function overviewRows(o: SquadOverview): OverviewRow[] {
  return o.players.map((p) => {
    const l = p.ladders;
    const ladder = l.latest
      ? `${l.latest.name}: rung ${l.latest.rungReached} of ${l.latest.rungsTotal}${l.latest.overdue ? ", overdue" : l.latest.status === "completed" ? ", completed" : ""}`
      : "No ladder yet";
    return {
      playerId: p.id,
      name: p.name,
      email: p.email,
      sessions: p.recent.sessions,
      putts: p.recent.putts,
      lastSession: p.recent.lastSession,
      bands: p.bands.map((b) => ({
        recent: b.recent.rate,
        past: b.past.rate,
        recentN: b.recent.attempts,
        pastN: b.past.attempts,
        change:
          b.recent.rate !== null && b.past.rate !== null && b.recent.attempts >= COMPARE_MIN_PUTTS && b.past.attempts >= COMPARE_MIN_PUTTS
            ? b.recent.rate - b.past.rate
            : null,
      })),
      sgRecent: p.recent.strokesGainedPerPutt,
      sgPast: p.past.strokesGainedPerPutt,
      sgChange:
        p.recent.strokesGainedPerPutt !== null && p.past.strokesGainedPerPutt !== null
          ? p.recent.strokesGainedPerPutt - p.past.strokesGainedPerPutt
          : null,
      ladder,
      ladderOrder: l.overdue > 0 ? 0 : l.active > 0 ? 1 : l.completed > 0 ? 2 : 3,
    };
  });
}

/** "Improving", "Slipping" or "Steady" for a change in strokes gained per putt (0.02 a putt ≈ half a stroke a round of 25 putts). */
export function sgTrendWord(change: number | null): string {
  if (change === null) return "Not enough putts";
  if (change > 0.02) return "Improving";
  if (change < -0.02) return "Slipping";
  return "Steady";
}
