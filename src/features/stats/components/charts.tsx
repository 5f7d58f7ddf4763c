// Every recharts chart of the make-rates page, in one lazily loaded module (its own chunk with recharts).
// The numbers are shaped in utils/chart-data.ts; these components only draw them.
import {
  Area,
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  ComposedChart,
  ErrorBar,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { CHART_GRID, ROLE_COLOURS, patternId, seriesLook } from "../../../lib/chart-palette";
import { ChartPatterns, legendProps, seriesDot, tickStyle, figureChart } from "../../../components/charts/chart-parts";
import type { CompareRow, MakeRateRow, SessionRow, TrendRow, TrendSeries } from "../utils/chart-data";

const grid = <CartesianGrid stroke={CHART_GRID} vertical={false} />;
const percentAxis = <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit=" %" width={52} tick={tickStyle} />;
const pct = (v: unknown) => (typeof v === "number" ? `${v.toFixed(1)} %` : "–");

export type MakeRateChartProps = {
  rows: MakeRateRow[];
  tourSource: string | null;
  /** The line's name: "Your make rate", or the player's for their coach. */ rateLabel?: string;
};

/** Your make rate per band (line and points), its 95 % interval as a shaded band, and the tour's one-putt rate. */
export function MakeRateChart({ rows, tourSource, rateLabel = "Your make rate" }: MakeRateChartProps) {
  return (
    <figure className="flex flex-col gap-2">
      <div
        className="h-72 w-full sm:h-80"
        role="img"
        aria-label="Make rate by distance band with its 95 % interval, and the tour one-putt rate for comparison"
      >
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart {...figureChart} data={rows} margin={{ top: 8, right: 8, bottom: 4, left: 0 }}>
            {grid}
            <XAxis
              dataKey="label"
              tick={tickStyle}
              interval={0}
              angle={rows.length > 6 ? -30 : 0}
              textAnchor={rows.length > 6 ? "end" : "middle"}
              height={rows.length > 6 ? 48 : 28}
            />
            {percentAxis}
            <Tooltip
              formatter={(v) => (Array.isArray(v) ? `${pct(v[0])} – ${pct(v[1])}` : pct(v))}
              labelFormatter={(l, payload) => {
                const row = payload?.[0]?.payload as MakeRateRow | undefined;
                return row ? `${l}: ${row.made} of ${row.attempts} holed` : String(l);
              }}
            />
            <Legend verticalAlign="top" height={28} {...legendProps} />
            <Area
              type="linear"
              dataKey="range"
              name="95 % interval"
              legendType="rect"
              stroke="none"
              fill={ROLE_COLOURS.band}
              fillOpacity={0.3}
              connectNulls={false}
              isAnimationActive={false}
            />
            <Line
              type="linear"
              dataKey="tour"
              name="Tour one-putt rate"
              legendType="triangle"
              stroke={ROLE_COLOURS.tour}
              strokeWidth={2}
              strokeDasharray="6 4"
              dot={seriesDot(1, 40)}
              isAnimationActive={false}
            />
            <Line
              type="linear"
              dataKey="rate"
              name={rateLabel}
              legendType="circle"
              stroke={ROLE_COLOURS.you}
              strokeWidth={2.5}
              dot={seriesDot(0, 56)}
              connectNulls={false}
              isAnimationActive={false}
            >
              <ErrorBar dataKey="err" width={6} stroke={ROLE_COLOURS.you} strokeWidth={1.5} direction="y" />
            </Line>
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      {tourSource ? <figcaption className="text-xs text-ink-500">{tourSource}</figcaption> : null}
    </figure>
  );
}

export type TrendChartProps = { rows: TrendRow[]; series: TrendSeries[]; rolling: boolean };

/** Each chosen band's make rate week by week; a week without putts in a band is a gap. */
export function TrendChart({ rows, series, rolling }: TrendChartProps) {
  return (
    <div
      className="h-72 w-full sm:h-80"
      role="img"
      aria-label={`Make rate per ${rolling ? "rolling window" : "week"} for the chosen distance bands`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart {...figureChart} data={rows} margin={{ top: 8, right: 12, bottom: 4, left: 0 }}>
          {grid}
          <XAxis dataKey="label" tick={tickStyle} minTickGap={16} />
          {percentAxis}
          <Tooltip
            formatter={(v, _name, item) => {
              const n = (item?.payload as Record<string, unknown> | undefined)?.[`${String(item?.dataKey)}n`];
              return typeof v === "number" ? `${v.toFixed(1)} % (${String(n)} putts)` : "no putts";
            }}
            labelFormatter={(l) => (rolling ? `Window ending the week of ${l}` : `Week of ${l}`)}
          />
          <Legend verticalAlign="top" height={28} {...legendProps} />
          {series.map((s, i) => (
            <Line
              key={s.key}
              type="monotone"
              dataKey={s.key}
              name={s.label}
              legendType={seriesLook(i).shape}
              stroke={seriesLook(i).colour}
              strokeDasharray={seriesLook(i).dash}
              strokeWidth={2.5}
              dot={seriesDot(i)}
              connectNulls={false}
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}

export type CompareChartProps = { rows: CompareRow[]; aLabel: string; bLabel: string };

/** Two periods side by side per band, each bar with its 95 % interval. */
export function CompareChart({ rows, aLabel, bLabel }: CompareChartProps) {
  return (
    <div className="h-72 w-full sm:h-80" role="img" aria-label="Make rate per band in the two periods, with 95 % intervals">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart {...figureChart} data={rows} margin={{ top: 8, right: 8, bottom: 4, left: 0 }} barGap={2}>
          {grid}
          <XAxis
            dataKey="label"
            tick={tickStyle}
            interval={0}
            angle={rows.length > 6 ? -30 : 0}
            textAnchor={rows.length > 6 ? "end" : "middle"}
            height={rows.length > 6 ? 48 : 28}
          />
          {percentAxis}
          <Tooltip formatter={(v) => pct(v)} />
          <Legend verticalAlign="top" height={28} {...legendProps} />
          <ChartPatterns />
          <Bar dataKey="a" name={aLabel} fill={`url(#${patternId(1)})`} isAnimationActive={false}>
            <ErrorBar dataKey="aErr" width={4} stroke={ROLE_COLOURS.you} direction="y" />
          </Bar>
          <Bar dataKey="b" name={bLabel} fill={`url(#${patternId(0)})`} isAnimationActive={false}>
            <ErrorBar dataKey="bErr" width={4} stroke={ROLE_COLOURS.you} direction="y" />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}

/** Strokes gained per session against the tour baseline; above the line is better than a tour player. */
export function SessionsChart({ rows }: { rows: SessionRow[] }) {
  return (
    <div className="h-56 w-full" role="img" aria-label="Strokes gained per session; above zero is better than the tour average">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart {...figureChart} data={rows} margin={{ top: 8, right: 8, bottom: 4, left: 0 }}>
          {grid}
          <XAxis dataKey="label" tick={tickStyle} minTickGap={12} />
          <YAxis width={44} tick={tickStyle} />
          <ReferenceLine y={0} stroke={ROLE_COLOURS.you} />
          <Tooltip
            formatter={(v) => (typeof v === "number" ? `${v > 0 ? "+" : ""}${v.toFixed(2)} strokes` : "–")}
            labelFormatter={(l, p) => `${l} · ${(p?.[0]?.payload as SessionRow | undefined)?.putts ?? 0} putts`}
          />
          <Bar dataKey="strokesGained" name="Strokes gained" isAnimationActive={false}>
            {rows.map((r) => (
              <Cell key={r.sessionId} fill={r.strokesGained >= 0 ? ROLE_COLOURS.gain : ROLE_COLOURS.loss} />
            ))}
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
