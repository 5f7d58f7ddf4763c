// One player's make rate by distance band with its 95 % interval (recharts; loaded lazily).
import { Bar, BarChart, CartesianGrid, ErrorBar, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { PlayerChartRow } from "../utils/squad-chart-data";

export default function PlayerRateChart({ rows }: { rows: PlayerChartRow[] }) {
  const data = rows.map((r) => ({ ...r, error: r.rate !== null && r.low !== null && r.high !== null ? [r.rate - r.low, r.high - r.rate] : [0, 0] }));
  return (
    <div className="h-64 w-full" role="img" aria-label="Make rate by distance band, with 95 % intervals">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 8, right: 8, bottom: 4, left: -16 }}>
          <CartesianGrid stroke="#d9dfeb" strokeDasharray="3 4" vertical={false} />
          <XAxis dataKey="band" tick={{ fontSize: 12, fill: "#4a5572" }} />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit="%" tick={{ fontSize: 12, fill: "#4a5572" }} />
          <Tooltip
            formatter={(_v, _n, item) => {
              const r = item.payload as PlayerChartRow;
              return [r.rate === null ? "no putts" : `${r.rate} % (${r.made} of ${r.attempts}; 95 % interval ${r.low}–${r.high} %)`, "Holed"];
            }}
          />
          <Bar dataKey="rate" fill="#131b2e" radius={[3, 3, 0, 0]} isAnimationActive={false}>
            <ErrorBar dataKey="error" direction="y" width={6} stroke="#e05a36" strokeWidth={2} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
