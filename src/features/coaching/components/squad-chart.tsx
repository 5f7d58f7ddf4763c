// Grouped bars of make rate by distance band, one bar per player (recharts; loaded lazily).
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_GRID, patternId } from "../../../lib/chart-palette";
import { ChartPatterns, legendProps, tickStyle, figureChart } from "../../../components/charts/chart-parts";
import type { SquadChartData } from "../utils/squad-chart-data";

// Each player's bars have their own colour and their own fill pattern (stripes, dots, checks), so players are told
// apart in greyscale print and by readers who do not see the colours; the legend and tooltip carry the names.

export default function SquadChart({ data }: { data: SquadChartData }) {
  return (
    <div className="h-72 w-full" role="img" aria-label={`Make rate by distance band for ${data.series.map((s) => s.name).join(", ")}`}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart {...figureChart} data={data.rows} margin={{ top: 8, right: 8, bottom: 4, left: -16 }} barCategoryGap="18%">
          <CartesianGrid stroke={CHART_GRID} strokeDasharray="3 4" vertical={false} />
          <ChartPatterns />
          <XAxis dataKey="band" tick={tickStyle} />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit="%" tick={tickStyle} />
          <Tooltip
            formatter={(value, name, item) => {
              const key = String(item.dataKey);
              const n = (item.payload as Record<string, number | null>)[`${key}n`] ?? 0;
              return [value === null || value === undefined ? "no putts" : `${String(value)} % of ${n}`, String(name)];
            }}
          />
          <Legend {...legendProps} iconType="square" />
          {data.series.map((s, i) => (
            <Bar
              key={s.dataKey}
              dataKey={s.dataKey}
              name={s.name}
              fill={`url(#${patternId(i)})`}
              stroke="#131b2e"
              strokeWidth={0.5}
              radius={[3, 3, 0, 0]}
              isAnimationActive={false}
            />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
