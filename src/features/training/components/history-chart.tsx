// The history chart (recharts; loaded lazily, so recharts stays out of the page's own chunk).
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_GRID, CHART_TEXT, seriesLook } from "../../../lib/chart-palette";
import { inkLegend, seriesDot, tickStyle, figureChart } from "../../../components/charts/chart-parts";
import type { HistoryRow } from "../utils/history-chart-data";

export default function HistoryChart({ rows, window }: { rows: HistoryRow[]; window: number }) {
  return (
    <div
      className="h-64 w-full"
      role="img"
      aria-label={`Score of each read, and the mean of the last ${window}, over ${rows.length} reads`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart {...figureChart} data={rows} margin={{ top: 8, right: 12, bottom: 4, left: -12 }}>
          <CartesianGrid stroke={CHART_GRID} strokeDasharray="3 4" />
          <XAxis
            dataKey="attempt"
            tick={tickStyle}
            label={{ value: "read", position: "insideBottomRight", offset: -2, fontSize: 12, fill: CHART_TEXT.muted }}
          />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={tickStyle} />
          <Tooltip
            formatter={(v, name) => [String(v), name === "score" ? "Score" : `Mean of last ${window}`]}
            labelFormatter={(l) => `Read ${l}`}
          />
          <Legend
            formatter={(name) => inkLegend(name === "score" ? "Score of each read" : `Mean of the last ${window}`)}
            wrapperStyle={{ fontSize: 13 }}
            iconSize={12}
          />
          <Line
            type="monotone"
            dataKey="score"
            legendType={seriesLook(0).shape}
            stroke={seriesLook(0).colour}
            strokeOpacity={0.5}
            strokeWidth={1.5}
            dot={seriesDot(0, 36)}
            isAnimationActive={false}
          />
          <Line
            type="monotone"
            dataKey="rollingMean"
            legendType="plainline"
            stroke={seriesLook(1).colour}
            strokeDasharray={seriesLook(1).dash}
            strokeWidth={3}
            dot={false}
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
