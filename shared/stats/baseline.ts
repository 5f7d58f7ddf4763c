import { METRES_PER_FOOT } from "../units";

/**
 * The published tour baseline the make rates are compared with. Two series with their own sources and
 * firmness (see docs/sources.md, "Make rates"): the one-putt percentage by distance and the average putts to hole out.
 */
export type BaselinePoint = { distanceFt: number; value: number };
export type BaselineSeries = { label: string; source: string; firmness: "published" | "secondary" | "memory"; points: BaselinePoint[] };

export const TOUR_ONE_PUTT_RATE: BaselineSeries = {
  label: "Tour one-putt rate by distance",
  source: 'M. Broadie, "Every Shot Counts", 2014 (PGA TOUR one-putt percentage by distance; secondary, attributed to the book)',
  firmness: "secondary",
  points: [
    { distanceFt: 2, value: 0.99 },
    { distanceFt: 3, value: 0.96 },
    { distanceFt: 4, value: 0.88 },
    { distanceFt: 5, value: 0.77 },
    { distanceFt: 8, value: 0.5 },
    { distanceFt: 10, value: 0.4 },
    { distanceFt: 15, value: 0.23 },
    { distanceFt: 20, value: 0.15 },
    { distanceFt: 30, value: 0.07 },
    { distanceFt: 40, value: 0.04 },
    { distanceFt: 50, value: 0.03 },
    { distanceFt: 60, value: 0.02 },
  ],
};

export const TOUR_EXPECTED_PUTTS: BaselineSeries = {
  label: "Tour average putts to hole out",
  source:
    'PGA TOUR average putts to hole out by distance, attributed to M. Broadie, "Every Shot Counts", 2014 (values from memory; consistent with M. Broadie, "Putts Gained", 2011: 1.5 putts from 8 ft, 2.0 from 33 ft)',
  firmness: "memory",
  points: [
    { distanceFt: 2, value: 1.01 },
    { distanceFt: 3, value: 1.04 },
    { distanceFt: 4, value: 1.13 },
    { distanceFt: 5, value: 1.23 },
    { distanceFt: 6, value: 1.34 },
    { distanceFt: 7, value: 1.42 },
    { distanceFt: 8, value: 1.5 },
    { distanceFt: 10, value: 1.61 },
    { distanceFt: 15, value: 1.78 },
    { distanceFt: 20, value: 1.87 },
    { distanceFt: 30, value: 1.98 },
    { distanceFt: 40, value: 2.06 },
    { distanceFt: 50, value: 2.14 },
    { distanceFt: 60, value: 2.21 },
  ],
};

export const BASELINE_INTERPOLATION =
  "Linear in log-distance between neighbouring table points: t = ln(d/d₀)/ln(d₁/d₀), value = v₀ + t·(v₁ − v₀). " +
  "Outside the table the end value is held (below 2 ft the 2 ft value, beyond 60 ft the 60 ft value), so expected putts beyond 60 ft are a floor.";

/**
 * A series' value at distanceM by log-distance linear interpolation between table points (why log: the
 * table's distances are roughly geometric and make rates fall off roughly with log-distance), held constant
 * outside the table.
 * @example interpolateBaseline(TOUR_EXPECTED_PUTTS, 8 * 0.3048) // 1.5
 */
export function interpolateBaseline(series: BaselineSeries, distanceM: number): number {
  if (!Number.isFinite(distanceM) || distanceM < 0) throw new RangeError(`distanceM must be ≥ 0 (got ${distanceM})`);
  const ft = distanceM / METRES_PER_FOOT;
  const pts = series.points;
  const first = pts[0]!;
  const last = pts[pts.length - 1]!;
  if (ft <= first.distanceFt) return first.value;
  if (ft >= last.distanceFt) return last.value;
  let i = 1;
  while (pts[i]!.distanceFt < ft) i++;
  const a = pts[i - 1]!;
  const b = pts[i]!;
  const t = Math.log(ft / a.distanceFt) / Math.log(b.distanceFt / a.distanceFt);
  return a.value + t * (b.value - a.value);
}

/** Tour probability of holing a putt of distanceM in one. */
export function tourOnePuttRate(distanceM: number): number {
  return interpolateBaseline(TOUR_ONE_PUTT_RATE, distanceM);
}

/** Tour average number of putts to hole out from distanceM. */
export function tourExpectedPutts(distanceM: number): number {
  return interpolateBaseline(TOUR_EXPECTED_PUTTS, distanceM);
}
