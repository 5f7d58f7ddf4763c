// Pure data shaping for the break chart: what to ask the API for, and how to lay its answer out as a table and as
// chart series in the user's units.
import { feetToMetres, metresToFeet, shortUnitLabel, toShortUnit, type UnitSystem } from "#shared/units";
import type { ChartCellAnswer, ChartResponse } from "#shared/schemas/reads";
import { directionHeading } from "./directions";

/** Every 30°, clockwise from straight downhill. */
export const CHART_DIRECTIONS_DEG: ReadonlyArray<number> = [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330];

/** Distances in the user's units, returned in metres: 3–30 ft every 3 ft, or 1–10 m every metre. */
export function chartDistancesM(units: UnitSystem): number[] {
  if (units === "imperial") return Array.from({ length: 10 }, (_, i) => feetToMetres(3 * (i + 1)));
  return Array.from({ length: 10 }, (_, i) => i + 1);
}

export type { ChartCellAnswer };
/** The part of the chart answer (POST /api/reads/chart) the table, graph and aim rings lay out. */
export type BreakChartAnswer = Pick<ChartResponse, "distances" | "fallLineDegs" | "canStop" | "cells">;

/** Under a centimetre either side is "centre": nobody aims finer than that. */
const CENTRE_M = 0.01;

/** A cell as the table prints it: "11 in left", "28 cm right", "centre", or "won't stop". */
export function cellText(cell: ChartCellAnswer, units: UnitSystem): string {
  if (!cell.ok) return "won't stop";
  if (cell.aimOffsetM === null) return `start ${Math.abs(Math.round(cell.startLineDeg))}° ${cell.startLineDeg < 0 ? "left" : "right"}`;
  if (Math.abs(cell.aimOffsetM) < CENTRE_M) return "centre";
  const v = toShortUnit(Math.abs(cell.aimOffsetM), units);
  const shown = v < 10 ? v.toFixed(1).replace(/\.0$/, "") : String(Math.round(v));
  return `${shown} ${shortUnitLabel(units)} ${cell.aimOffsetM < 0 ? "left" : "right"}`;
}

/** A distance as a row heading: "9 ft" or "3 m". */
export function distanceHeading(distanceM: number, units: UnitSystem): string {
  if (units === "imperial") return `${Math.round(metresToFeet(distanceM))} ft`;
  return `${Number(distanceM.toFixed(1))} m`;
}

export type TableCell = { key: string; text: string; ok: boolean; side: "left" | "right" | "centre" | "none" };
export type TableRow = { key: string; heading: string; cells: TableCell[] };
export type TableColumn = { key: string; deg: number; main: string; minor?: string };

/** Rows = distances, columns = directions. */
export function toChartTable(answer: BreakChartAnswer, units: UnitSystem): { columns: TableColumn[]; rows: TableRow[] } {
  const columns = answer.fallLineDegs.map((deg) => ({ key: `c${deg}`, deg, ...directionHeading(deg) }));
  const rows = answer.distances.map((distanceM, i) => ({
    key: `r${i}`,
    heading: distanceHeading(distanceM, units),
    cells: (answer.cells[i] ?? []).map((cell, j): TableCell => {
      const aim = cell.ok ? cell.aimOffsetM : null;
      const side = !cell.ok
        ? "none"
        : aim === null
          ? cell.startLineDeg < 0
            ? "left"
            : "right"
          : Math.abs(aim) < CENTRE_M
            ? "centre"
            : aim < 0
              ? "left"
              : "right";
      return { key: `r${i}c${j}`, text: cellText(cell, units), ok: cell.ok, side };
    }),
  }));
  return { columns, rows };
}

export type SeriesPoint = { distance: number } & Record<string, number | null>;

/** The key of a direction's series in the chart data. */
export function seriesKey(deg: number): string {
  return `f${deg}`;
}

/**
 * Chart data: one point per distance (in ft or m), one value per chosen direction: the aim offset in in or cm,
 * signed (negative = left), or null where the ball would not stop (the line breaks there).
 */
export function toChartSeries(answer: BreakChartAnswer, units: UnitSystem, directions: ReadonlyArray<number>): SeriesPoint[] {
  const columnOf = new Map(answer.fallLineDegs.map((deg, j) => [deg, j]));
  return answer.distances.map((distanceM, i) => {
    const point: SeriesPoint = { distance: Number((units === "imperial" ? metresToFeet(distanceM) : distanceM).toFixed(2)) };
    for (const deg of directions) {
      const j = columnOf.get(deg);
      const cell = j === undefined ? undefined : answer.cells[i]?.[j];
      point[seriesKey(deg)] = cell?.ok && cell.aimOffsetM !== null ? Number(toShortUnit(cell.aimOffsetM, units).toFixed(2)) : null;
    }
    return point;
  });
}

/** How many cells of an answer would not stop. */
export function cannotStopCount(answer: BreakChartAnswer): number {
  return answer.cells.reduce((n, row) => n + row.filter((c) => !c.ok).length, 0);
}
