// Pure data shaping for the make-rate charts and tables: what the API answers, laid out per band in the user's
// units, with the tour baseline beside it and the cautions a small sample needs.
import { formatDate } from "#shared/format";
import { interpolateBaseline, type BaselineSeries } from "#shared/stats/baseline";
import type { UnitSystem } from "#shared/units";
import type { BandRate, Compare, Rate, SessionStat, Trend } from "../api/types";
import { bandLabel } from "./bands";

/** Below this many attempts a band's interval is wide enough to say so. Rule of thumb (n ≥ 30) [common practice]. */
export const SMALL_SAMPLE = 30;

const pct = (x: number | null | undefined) => (x === null || x === undefined ? null : Math.round(x * 1000) / 10);

/**
 * The tour's one-putt rate over a band: the interpolated table curve averaged over the band's span (24 evenly spaced
 * distances), so a wide band is not judged by one point. An open-ended last band takes the value at its lower edge.
 */
export function tourRateForBand(series: BaselineSeries, fromM: number, toM: number | null): number {
  if (toM === null) return interpolateBaseline(series, fromM);
  const n = 24;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += interpolateBaseline(series, fromM + ((i + 0.5) / n) * (toM - fromM));
  return sum / n;
}

export type MakeRateRow = {
  key: string;
  label: string;
  attempts: number;
  made: number;
  /** Percent, one decimal; null without attempts. */
  rate: number | null;
  lo: number | null;
  hi: number | null;
  /** [lo, hi] for a range Area; null without attempts (a gap in the band). */
  range: [number, number] | null;
  /** The same interval as [below, above] the rate, for error bars (a band with no neighbour draws no area). */
  err: [number, number] | null;
  tour: number | null;
  caution: string | null;
};

/** "based on 7 putts — wide interval", or null when the band has enough putts (or none at all). */
export function sampleCaution(attempts: number): string | null {
  if (attempts === 0 || attempts >= SMALL_SAMPLE) return null;
  return `based on ${attempts} ${attempts === 1 ? "putt" : "putts"} — wide interval`;
}

export function makeRateRows(bands: ReadonlyArray<BandRate>, units: UnitSystem, tour?: BaselineSeries | null): MakeRateRow[] {
  return bands.map((b, i) => {
    const lo = pct(b.ci95?.[0]);
    const hi = pct(b.ci95?.[1]);
    return {
      key: `band-${i}`,
      label: bandLabel(b.fromM, b.toM, units),
      attempts: b.attempts,
      made: b.made,
      rate: pct(b.rate),
      lo,
      hi,
      range: lo !== null && hi !== null ? [lo, hi] : null,
      err:
        lo !== null && hi !== null && b.rate !== null
          ? [Math.round((pct(b.rate)! - lo) * 10) / 10, Math.round((hi - pct(b.rate)!) * 10) / 10]
          : null,
      tour: tour ? pct(tourRateForBand(tour, b.fromM, b.toM)) : null,
      caution: sampleCaution(b.attempts),
    };
  });
}

export function totalAttempts(bands: ReadonlyArray<{ attempts: number }>): number {
  return bands.reduce((s, b) => s + b.attempts, 0);
}

// ---- trend -------------------------------------------------------------------------------------------

export type TrendRow = { weekStart: string; label: string } & Record<string, number | string | null>;
export type TrendSeries = { key: string; band: number; label: string };

/** "6 May" / "May 6" (the reader's locale): the Monday a week starts on. */
export function weekLabel(isoDate: string): string {
  return formatDate(isoDate, "day");
}

/**
 * One row per week with the chosen bands' rates in percent (`b{i}`) and their attempts (`b{i}n`). A week without
 * attempts in a band is null there, so the line has a gap rather than a false zero.
 */
export function trendRows(trend: Trend, chosen: readonly number[], units: UnitSystem): { rows: TrendRow[]; series: TrendSeries[] } {
  const series = chosen
    .filter((i) => i >= 0 && i < trend.bands.length)
    .map((i) => ({ key: `b${i}`, band: i, label: bandLabel(trend.bands[i]!.fromM, trend.bands[i]!.toM, units) }));
  const rows = trend.weeks.map((w) => {
    const row: TrendRow = { weekStart: w.weekStart, label: weekLabel(w.weekStart) };
    for (const s of series) {
      const cell: Rate | undefined = w.bands[s.band];
      row[s.key] = cell && cell.attempts > 0 ? pct(cell.rate) : null;
      row[`${s.key}n`] = cell?.attempts ?? 0;
    }
    return row;
  });
  return { rows, series };
}

/** The bands worth showing first: up to three with the most attempts over the whole trend, in distance order. */
export function defaultTrendBands(trend: Trend, max = 3): number[] {
  const totals = trend.bands.map((_, i) => ({ i, n: trend.weeks.reduce((s, w) => s + (w.bands[i]?.attempts ?? 0), 0) }));
  return totals
    .filter((t) => t.n > 0)
    .sort((a, b) => b.n - a.n || a.i - b.i)
    .slice(0, max)
    .map((t) => t.i)
    .sort((a, b) => a - b);
}

// ---- compare -----------------------------------------------------------------------------------------

/** Below this p-value a difference is called "likely a real change" (the conventional 5 % level). */
export const SIGNIFICANT_P = 0.05;

export type Verdict = { words: string; tone: "real" | "chance" | "none" };

/** "p = 0.031", "p < 0.001". */
export function formatP(p: number): string {
  if (p < 0.001) return "p < 0.001";
  return `p = ${p < 0.01 ? p.toFixed(3) : p.toFixed(2)}`;
}

/** The difference and its p-value in words: "likely a real change" / "could be chance" / not enough to compare. */
export function verdict(side: { a: Rate; b: Rate; difference: number | null; z?: number | null; pValue: number | null }): Verdict {
  if (side.a.attempts === 0 || side.b.attempts === 0) return { words: "no putts in one of the periods", tone: "none" };
  if (side.difference === null || side.pValue === null) {
    const none = side.a.made + side.b.made === 0;
    return { words: none ? "none holed in either period: nothing to test" : "all holed in both periods: nothing to test", tone: "none" };
  }
  const dir = side.difference > 0 ? "better" : side.difference < 0 ? "worse" : "no change";
  if (side.pValue < SIGNIFICANT_P) return { words: `likely a real change (${dir}, ${formatP(side.pValue)})`, tone: "real" };
  return { words: `could be chance (${formatP(side.pValue)})`, tone: "chance" };
}

export type CompareRow = {
  key: string;
  label: string;
  a: number | null;
  b: number | null;
  /** Error bars as [below, above] the rate, in percentage points (recharts ErrorBar). */
  aErr: [number, number] | null;
  bErr: [number, number] | null;
  aAttempts: number;
  bAttempts: number;
  aRange: string;
  bRange: string;
  /** Percentage points, B − A. */
  difference: number | null;
  verdict: Verdict;
  caution: string | null;
};

function errOf(r: Rate): [number, number] | null {
  if (r.rate === null || !r.ci95) return null;
  return [pct(r.rate - r.ci95[0])!, pct(r.ci95[1] - r.rate)!];
}

function rangeText(r: Rate): string {
  if (!r.ci95 || r.rate === null) return "–";
  return `${Math.round(r.ci95[0] * 100)}–${Math.round(r.ci95[1] * 100)} %`;
}

export function compareRows(compare: Compare, units: UnitSystem): CompareRow[] {
  return compare.bands.map((b, i) => {
    const smaller = Math.min(b.a.attempts, b.b.attempts);
    const v = verdict(b);
    return {
      key: `band-${i}`,
      label: bandLabel(b.fromM, b.toM, units),
      a: pct(b.a.rate),
      b: pct(b.b.rate),
      aErr: errOf(b.a),
      bErr: errOf(b.b),
      aAttempts: b.a.attempts,
      bAttempts: b.b.attempts,
      aRange: rangeText(b.a),
      bRange: rangeText(b.b),
      difference: pct(b.difference),
      verdict: v,
      // Only where a test was made: "nothing to test" needs no second warning.
      caution:
        v.tone !== "none" && smaller < SMALL_SAMPLE ? `${smaller} putts in the smaller period — read the intervals, not the test` : null,
    };
  });
}

// ---- sessions ----------------------------------------------------------------------------------------

export type SessionRow = { sessionId: string; date: string; label: string; strokesGained: number; perPutt: number | null; putts: number };

/** Strokes gained per session, oldest first for a chart read left to right. Sessions without putts are left out. */
export function sessionRows(items: ReadonlyArray<SessionStat>): SessionRow[] {
  return items
    .filter((s) => s.putts > 0)
    .map((s) => ({
      sessionId: s.sessionId,
      date: s.date,
      label: weekLabel(s.date),
      strokesGained: Math.round(s.strokesGained * 100) / 100,
      perPutt: s.putts > 0 ? Math.round((s.strokesGained / s.putts) * 1000) / 1000 : null,
      putts: s.putts,
    }))
    .sort((a, b) => a.date.localeCompare(b.date));
}

export type LagSummary = { lags: number; known: number; outside: number; share: number | null; assumedLeaves: number };

/** Across sessions: lags (putts from 6 m or more) whose finish is known, and the share left outside 1 m. */
export function lagSummary(items: ReadonlyArray<SessionStat>): LagSummary {
  const lags = items.reduce((s, x) => s + x.longPutts, 0);
  const known = items.reduce((s, x) => s + x.longPuttsKnown, 0);
  const outside = items.reduce((s, x) => s + x.longLagsOutside1m, 0);
  const assumedLeaves = items.reduce((s, x) => s + x.leavesAssumed, 0);
  return { lags, known, outside, share: known === 0 ? null : outside / known, assumedLeaves };
}

/** The API's baseline series in the shape shared/stats interpolates. */
export function toBaselineSeries(s: {
  label: string;
  source: string;
  firmness: string;
  points: { distanceFt: number; value: number }[];
}): BaselineSeries {
  const firmness = s.firmness === "published" || s.firmness === "memory" ? s.firmness : "secondary";
  return { label: s.label, source: s.source, firmness, points: s.points.map((p) => ({ distanceFt: p.distanceFt, value: p.value })) };
}
