// Pieces every recharts chart shares so that it reads outdoors (see lib/chart-palette.ts): dark-ink legend text,
// a shape per series for its points, and fill patterns for bars. Imported only by lazily loaded chart modules, so
// recharts stays out of the pages' own chunks.
import type { ReactNode } from "react";
import { Symbols } from "recharts";
import { CHART_TEXT, SERIES, patternId, seriesLook, type PatternKind } from "../../lib/chart-palette";

/**
 * Every chart is a figure: an image with a spoken label, its numbers in the table beside it. recharts 3 otherwise
 * makes the drawing a focusable "application" with no name (a Tab stop that says nothing).
 */
export const figureChart = { accessibilityLayer: false } as const;

/** Legend text in dark ink (recharts colours it like the series by default, too faint for the lighter ones). */
export function inkLegend(value: ReactNode): ReactNode {
  return <span style={{ color: CHART_TEXT.ink }}>{value}</span>;
}

/** Props for a recharts `<Legend>`: ink text at 13 px with the series' own icons. */
export const legendProps = { formatter: inkLegend, wrapperStyle: { fontSize: 13 }, iconSize: 12 } as const;

/** Axis tick text: dark enough on paper and white, 12 px. */
export const tickStyle = { fontSize: 12, fill: CHART_TEXT.muted } as const;

type DotProps = { cx?: number; cy?: number; value?: unknown };

/** A point drawn as the i-th series' shape (empty where the value is missing). */
export function seriesDot(i: number, size = 48) {
  const look = seriesLook(i);
  return function SeriesDot({ cx, cy, value }: DotProps) {
    if (cx === undefined || cy === undefined || value === null || value === undefined) return <g />;
    return <Symbols cx={cx} cy={cy} type={look.shape} size={size} fill={look.colour} stroke="#ffffff" strokeWidth={1} />;
  };
}

const MARKS: Record<PatternKind, ReactNode> = {
  solid: null,
  diagonal: <path d="M-1,1 l2,-2 M0,8 l8,-8 M7,9 l2,-2" stroke="#ffffff" strokeWidth={1.6} />,
  reverse: <path d="M-1,7 l2,2 M0,0 l8,8 M7,-1 l2,2" stroke="#ffffff" strokeWidth={1.6} />,
  dots: <circle cx={4} cy={4} r={1.6} fill="#ffffff" />,
  horizontal: <path d="M0,4 h8" stroke="#ffffff" strokeWidth={1.6} />,
  vertical: <path d="M4,0 v8" stroke="#ffffff" strokeWidth={1.6} />,
  cross: <path d="M0,4 h8 M4,0 v8" stroke="#ffffff" strokeWidth={1.2} />,
};

/** `<defs>` with one fill pattern per series (the series colour with white marks); put it inside the chart. */
export function ChartPatterns() {
  return (
    <defs>
      {SERIES.map((s, i) => (
        <pattern key={i} id={patternId(i)} width={8} height={8} patternUnits="userSpaceOnUse">
          <rect width={8} height={8} fill={s.colour} />
          {MARKS[s.pattern]}
        </pattern>
      ))}
    </defs>
  );
}
