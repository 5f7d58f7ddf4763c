import type { UnitSystem } from "#shared/units";
import { Alert, ChipGroup } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useTrend } from "../api/get-trend";
import type { TrendParams } from "../api/types";
import { bandLabel } from "../utils/bands";
import { defaultTrendBands, trendRows } from "../utils/chart-data";
import { TrendChart } from "./lazy-charts";

export type TrendSectionProps = {
  params: TrendParams;
  units: UnitSystem;
  chosen: number[] | null;
  onChoose: (bands: number[]) => void;
  onWindow: (window: "week" | "rolling", weeks?: number) => void;
};

/** Make rate over time per band: week by week, or a rolling window of weeks that smooths thin weeks. */
export function TrendSection({ params, units, chosen, onChoose, onWindow }: TrendSectionProps) {
  const trend = useTrend(params);
  if (trend.isError)
    return (
      <Alert tone="error" title="Could not load the trend">
        {errorMessage(trend.error)}
      </Alert>
    );
  if (!trend.data) return <div className="h-72 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the trend" />;
  const t = trend.data;
  const bands = chosen ?? defaultTrendBands(t);
  const { rows, series } = trendRows(t, bands, units);
  const toggle = (i: number) => onChoose(bands.includes(i) ? bands.filter((b) => b !== i) : [...bands, i].sort((a, b) => a - b));
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-[auto_1fr] sm:items-end">
        <ChipGroup
          legend="Each point is"
          columns={2}
          options={[
            { value: "week", label: "One week" },
            { value: "rolling", label: `${params.windowWeeks ?? 4} weeks rolling` },
          ]}
          value={params.window}
          onChange={(v) => v && onWindow(v as "week" | "rolling", params.windowWeeks)}
        />
        {params.window === "rolling" ? (
          <label className="flex flex-col gap-1.5 text-sm font-medium text-ink-800 sm:max-w-48">
            Weeks in the window
            <select
              className="min-h-12 rounded-xl border-2 border-ink-900/15 bg-white px-3"
              value={params.windowWeeks ?? 4}
              onChange={(e) => onWindow("rolling", Number(e.target.value))}
            >
              {[2, 3, 4, 6, 8, 12].map((w) => (
                <option key={w} value={w}>
                  {w} weeks
                </option>
              ))}
            </select>
          </label>
        ) : null}
      </div>
      <fieldset>
        <legend className="mb-2 text-sm font-medium text-ink-800">Bands to show</legend>
        <div className="flex flex-wrap gap-2">
          {t.bands.map((b, i) => {
            const on = bands.includes(i);
            return (
              <button
                key={i}
                type="button"
                aria-pressed={on}
                onClick={() => toggle(i)}
                className={
                  on
                    ? "min-h-11 rounded-full border-2 border-ink-900 bg-ink-900 px-4 text-sm font-medium text-sand-50"
                    : "min-h-11 rounded-full border-2 border-ink-900/15 bg-white px-4 text-sm font-medium text-ink-700"
                }
              >
                {bandLabel(b.fromM, b.toM, units)}
              </button>
            );
          })}
        </div>
      </fieldset>
      {t.weeks.length === 0 ? (
        <p className="text-ink-500">No weeks with putts in this period yet.</p>
      ) : series.length === 0 ? (
        <p className="text-ink-500">Choose one or more bands to draw.</p>
      ) : (
        <>
          <TrendChart rows={rows} series={series} rolling={t.window === "rolling"} />
          {t.weeks.length < 3 ? (
            <Alert tone="info">
              Only {t.weeks.length} {t.weeks.length === 1 ? "week" : "weeks"} with putts so far: a trend needs a few more.
            </Alert>
          ) : null}
          <p className="text-xs text-ink-500">
            {t.window === "rolling"
              ? `Each point pools the week it is drawn at and the ${t.windowWeeks - 1} weeks before it.`
              : "Each point is one week (Monday to Sunday); a week with only a handful of putts in a band jumps about — try the rolling window."}
          </p>
        </>
      )}
    </div>
  );
}
