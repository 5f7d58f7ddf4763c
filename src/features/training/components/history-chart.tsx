// The history chart (recharts; loaded lazily, so recharts stays out of the page's own chunk).
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { HistoryRow } from "../utils/history-chart-data";

export default function HistoryChart({ rows, window }: { rows: HistoryRow[]; window: number }) {
  return (
    <div
      className="h-64 w-full"
      role="img"
      aria-label={`Score of each read, and the mean of the last ${window}, over ${rows.length} reads`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={rows} margin={{ top: 8, right: 12, bottom: 4, left: -12 }}>
          <CartesianGrid stroke="#d9dfeb" strokeDasharray="3 4" />
          <XAxis
            dataKey="attempt"
            tick={{ fontSize: 12, fill: "#4a5572" }}
            label={{ value: "read", position: "insideBottomRight", offset: -2, fontSize: 12, fill: "#4a5572" }}
          />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={{ fontSize: 12, fill: "#4a5572" }} />
          <Tooltip
            formatter={(v, name) => [String(v), name === "score" ? "Score" : `Mean of last ${window}`]}
            labelFormatter={(l) => `Read ${l}`}
          />
          <Legend
            formatter={(name) => (name === "score" ? "Score of each read" : `Mean of the last ${window}`)}
            wrapperStyle={{ fontSize: 13 }}
          />
          <Line type="monotone" dataKey="score" stroke="#8894b0" strokeWidth={1.5} dot={{ r: 3 }} isAnimationActive={false} />
          <Line type="monotone" dataKey="rollingMean" stroke="#e05a36" strokeWidth={3} dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
