import { useState } from "react";
import clsx from "clsx";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { longUnitLabel, shortUnitLabel, type UnitSystem } from "#shared/units";
import { seriesKey, toChartSeries, type BreakChartAnswer } from "../utils/chart-data";
import { directionHeading } from "../utils/directions";

/** Falling right (and straight) by default: the left-hand lines mirror them. */
export const DEFAULT_GRAPH_DIRECTIONS: ReadonlyArray<number> = [0, 30, 60, 90, 120, 150, 180];

/** Twelve colours that stay apart on the sand background; the left-falling lines are also dashed. */
const COLOURS: Record<number, string> = {
  0: "#0f766e",
  30: "#1d4ed8",
  60: "#7c3aed",
  90: "#c4462a",
  120: "#b45309",
  150: "#4d7c0f",
  180: "#131b2e",
  210: "#0e7490",
  240: "#a21caf",
  270: "#be123c",
  300: "#65a30d",
  330: "#6b7280",
};
function colourFor(deg: number): string {
  return COLOURS[deg] ?? "#37425e";
}

function label(deg: number): string {
  const h = directionHeading(deg);
  return h.minor ? `${h.main}, ${h.minor}` : h.main;
}

export type BreakChartGraphProps = { answer: BreakChartAnswer; units: UnitSystem };

/** Aim offset against distance, one line per chosen direction (left of the hole below zero). */
export function BreakChartGraph({ answer, units }: BreakChartGraphProps) {
  const [chosen, setChosen] = useState<number[]>(() => DEFAULT_GRAPH_DIRECTIONS.filter((d) => answer.fallLineDegs.includes(d)));
  const data = toChartSeries(answer, units, chosen);
  const short = shortUnitLabel(units);
  const toggle = (deg: number) =>
    setChosen((list) => (list.includes(deg) ? list.filter((d) => d !== deg) : [...list, deg].sort((a, b) => a - b)));

  return (
    <div className="flex flex-col gap-4">
      <fieldset className="print:hidden">
        <legend className="mb-2 text-sm font-medium text-ink-800">Lines to show (which way the green falls)</legend>
        <div className="flex flex-wrap gap-2">
          {answer.fallLineDegs.map((deg) => {
            const on = chosen.includes(deg);
            return (
              <label
                key={deg}
                className={clsx(
                  "flex min-h-10 cursor-pointer items-center gap-2 rounded-full border-2 px-3 text-sm has-focus-visible:outline-3 has-focus-visible:outline-coral-500",
                  on ? "border-ink-900 bg-white" : "border-ink-900/15 text-ink-500",
                )}
              >
                <input type="checkbox" className="sr-only" checked={on} onChange={() => toggle(deg)} />
                <span
                  aria-hidden="true"
                  className="size-3 rounded-full"
                  style={{ background: on ? colourFor(deg) : "transparent", border: `2px solid ${colourFor(deg)}` }}
                />
                {label(deg)}
              </label>
            );
          })}
        </div>
      </fieldset>
      <div
        className="w-full"
        role="img"
        aria-label={`Aim offset in ${short} against distance in ${longUnitLabel(units)}, one line per direction; below zero is left of the hole.`}
      >
        {/* A height in pixels, not "100%": while the card is hidden (print, a suspended page) the box measures 0 × 0
            for a moment, and recharts warns about a chart of no size; with a fixed height it never has none. */}
        <ResponsiveContainer width="100%" height={352}>
          <LineChart data={data} margin={{ top: 8, right: 12, bottom: 24, left: 4 }}>
            <CartesianGrid stroke="rgb(19 27 46 / 0.08)" />
            <XAxis
              dataKey="distance"
              type="number"
              domain={["dataMin", "dataMax"]}
              tickCount={10}
              label={{ value: `Distance (${longUnitLabel(units)})`, position: "insideBottom", offset: -14 }}
            />
            <YAxis
              width={56}
              label={{
                value: `Aim (${short}), − is left`,
                angle: -90,
                position: "insideLeft",
                offset: 10,
                style: { textAnchor: "middle" },
              }}
            />
            <ReferenceLine y={0} stroke="rgb(19 27 46 / 0.5)" />
            <Tooltip
              formatter={(v) => (typeof v === "number" ? `${Math.abs(v).toFixed(1)} ${short} ${v < 0 ? "left" : "right"}` : String(v))}
              labelFormatter={(d) => `${d} ${longUnitLabel(units)}`}
            />
            {chosen.map((deg) => (
              <Line
                key={deg}
                type="monotone"
                dataKey={seriesKey(deg)}
                name={label(deg)}
                stroke={colourFor(deg)}
                strokeWidth={2.5}
                strokeDasharray={deg > 180 ? "6 4" : undefined}
                dot={{ r: 2.5 }}
                connectNulls={false}
                isAnimationActive={false}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </div>
  );
}
