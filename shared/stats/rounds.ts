import type { RoundHole, RoundTotals } from "../schemas/rounds";
import { tourExpectedPutts } from "./baseline";
import { LONG_PUTT_M, THREE_PUTT_RANGE_M } from "./strokes-gained";

export type HoleRow = { holeNumber: number; firstPuttM: number | null; putts: number; leftAfterFirstM: number | null };

/** A hole with its baseline figures: E(first putt) and SG = E − putts (null for a hole with no putt). */
export function valueHole(h: HoleRow): RoundHole {
  const putted = h.putts > 0 && h.firstPuttM !== null;
  const expectedPutts = putted ? tourExpectedPutts(h.firstPuttM!) : null;
  return { ...h, expectedPutts, strokesGained: expectedPutts === null ? null : expectedPutts - h.putts };
}

/** Round totals: putts, one- and three-putts (3 or more), expected putts and strokes gained, long lags. */
export function roundTotals(holes: readonly HoleRow[]): RoundTotals {
  const t: RoundTotals = {
    holes: holes.length,
    putts: 0,
    onePutts: 0,
    threePutts: 0,
    expectedPutts: 0,
    strokesGained: 0,
    longFirstPutts: 0,
    longLagsOutside1m: 0,
  };
  for (const h of holes) {
    const v = valueHole(h);
    t.putts += h.putts;
    if (h.putts === 1) t.onePutts += 1;
    if (h.putts >= 3) t.threePutts += 1;
    if (v.expectedPutts !== null) {
      t.expectedPutts += v.expectedPutts;
      t.strokesGained += v.strokesGained!;
    }
    if (h.firstPuttM !== null && h.putts > 0 && h.firstPuttM >= LONG_PUTT_M) {
      t.longFirstPutts += 1;
      if (h.leftAfterFirstM !== null && h.leftAfterFirstM > THREE_PUTT_RANGE_M) t.longLagsOutside1m += 1;
    }
  }
  return t;
}
