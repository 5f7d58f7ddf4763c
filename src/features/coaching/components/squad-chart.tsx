// Grouped bars of make rate by distance band, one bar per player (recharts; loaded lazily).
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { SquadChartData } from "../utils/squad-chart-data";

// Distinguishable on sand paper and in greyscale print; the legend and tooltip carry the names.
const COLOURS = ["#131b2e", "#e05a36", "#2c7463", "#a88a59", "#64708d", "#9f3822", "#c9ab78", "#37425e"];

export default function SquadChart({ data }: { data: SquadChartData }) {
  return (
    <div className="h-72 w-full" role="img" aria-label={`Make rate by distance band for ${data.series.map((s) => s.name).join(", ")}`}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data.rows} margin={{ top: 8, right: 8, bottom: 4, left: -16 }} barCategoryGap="18%">
          <CartesianGrid stroke="#d9dfeb" strokeDasharray="3 4" vertical={false} />
          <XAxis dataKey="band" tick={{ fontSize: 12, fill: "#4a5572" }} />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit="%" tick={{ fontSize: 12, fill: "#4a5572" }} />
          <Tooltip
            formatter={(value, name, item) => {
              const key = String(item.dataKey);
              const n = (item.payload as Record<string, number | null>)[`${key}n`] ?? 0;
              return [value === null || value === undefined ? "no putts" : `${String(value)} % of ${n}`, String(name)];
            }}
          />
          <Legend wrapperStyle={{ fontSize: 13 }} />
          {data.series.map((s, i) => (
            <Bar key={s.dataKey} dataKey={s.dataKey} name={s.name} fill={COLOURS[i % COLOURS.length]} radius={[3, 3, 0, 0]} isAnimationActive={false} />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
