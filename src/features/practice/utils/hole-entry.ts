// Logging a round on the course, hole by hole: what a few taps turn into for PUT /api/rounds/:id/holes/:n.
import type { HoleBody, RoundHole } from "#shared/schemas/rounds";
import type { UnitSystem } from "#shared/units";

/** Leave after the first putt: feet, or metres. */
export const LEAVE_PICKS: Record<UnitSystem, readonly number[]> = { imperial: [1, 2, 3, 4, 6, 10], metric: [0.3, 0.6, 1, 1.5, 2, 3] };

export const HOLES = Array.from({ length: 18 }, (_, i) => i + 1);

export type HoleDraft = { firstPuttM: number; putts: number; leftAfterFirstM: number | null };

/** The body for one hole. No putt (holed from off the green) has no first putt; a one-putt leaves nothing. */
export function holeBody(d: HoleDraft): HoleBody {
  if (d.putts === 0) return { putts: 0 };
  if (d.putts === 1) return { firstPuttM: d.firstPuttM, putts: 1, leftAfterFirstM: null };
  return {
    firstPuttM: d.firstPuttM,
    putts: d.putts,
    leftAfterFirstM: d.leftAfterFirstM !== null && d.leftAfterFirstM > 0 ? d.leftAfterFirstM : null,
  };
}

/** The hole to show next: the first one without an entry after the last entered, else the first gap, else 18. */
export function nextHole(holes: ReadonlyArray<Pick<RoundHole, "holeNumber">>): number {
  const done = new Set(holes.map((h) => h.holeNumber));
  const last = Math.max(0, ...done);
  for (let n = last + 1; n <= 18; n++) if (!done.has(n)) return n;
  for (const n of HOLES) if (!done.has(n)) return n;
  return 18;
}

/** "+0.42" or "−1.30": strokes gained, signed, with a true minus sign. */
export function formatStrokesGained(sg: number, digits = 2): string {
  const v = Math.abs(sg) < 0.5 * 10 ** -digits ? 0 : sg;
  return `${v > 0 ? "+" : v < 0 ? "−" : ""}${Math.abs(v).toFixed(digits)}`;
}
