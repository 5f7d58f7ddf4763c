// The make-rates page keeps its choices in the URL query, so a reload or a shared link shows the same view.
import { STAT_SOURCES, type StatSource } from "#shared/schemas/stats";
import type { CompareParams, StatsParams, TrendParams } from "../api/types";
import { bandsParam, edgesFromParam } from "./bands";
import { parseDecimal } from "#shared/units";

const ISO = /^\d{4}-\d{2}-\d{2}$/;
const date = (q: URLSearchParams, k: string) => {
  const v = q.get(k);
  return v && ISO.test(v) && !Number.isNaN(Date.parse(v)) ? v : undefined;
};

/** YYYY-MM-DD `days` before `iso` (calendar arithmetic in UTC, so no time-zone drift). */
export function addDays(iso: string, days: number): string {
  const t = Date.parse(`${iso}T00:00:00Z`) + days * 86_400_000;
  return new Date(t).toISOString().slice(0, 10);
}

export type StatsView = {
  stats: StatsParams;
  edgesM: number[] | null;
  trend: TrendParams;
  trendBands: number[] | null;
  compare: CompareParams;
};

export function statsView(q: URLSearchParams, today: string): StatsView {
  const src = q.get("src");
  const source: StatSource = (STAT_SOURCES as readonly string[]).includes(src ?? "") ? (src as StatSource) : "practice";
  let from = date(q, "from");
  let to = date(q, "to");
  if (from && to && from > to) [from, to] = [to, from];
  const edgesM = edgesFromParam(q.get("bands"));
  const bands = bandsParam(edgesM);
  const base = { ...(from ? { from } : {}), ...(to ? { to } : {}), ...(bands ? { bands } : {}), source };
  const win = q.get("win") === "rolling" ? "rolling" : "week";
  const ww = parseDecimal(q.get("ww"));
  const windowWeeks = ww !== null && Number.isInteger(ww) && ww >= 2 && ww <= 12 ? ww : 4;
  const tb = q.get("tb");
  const trendBands =
    tb === null
      ? null
      : tb
          .split(",")
          .map(parseDecimal)
          .filter((n): n is number => n !== null && Number.isInteger(n) && n >= 0 && n < 21);

  // Compare: by default the last four weeks against the four before them.
  let bTo = date(q, "bTo") ?? today;
  let bFrom = date(q, "bFrom") ?? addDays(bTo, -27);
  if (bFrom > bTo) [bFrom, bTo] = [bTo, bFrom];
  let aTo = date(q, "aTo") ?? addDays(bFrom, -1);
  let aFrom = date(q, "aFrom") ?? addDays(aTo, -27);
  if (aFrom > aTo) [aFrom, aTo] = [aTo, aFrom];

  return {
    stats: base,
    edgesM,
    trend: { ...base, window: win, ...(win === "rolling" ? { windowWeeks } : {}) },
    trendBands,
    compare: { aFrom, aTo, bFrom, bTo, ...(bands ? { bands } : {}), source },
  };
}
