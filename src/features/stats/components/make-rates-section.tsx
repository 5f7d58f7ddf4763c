import type { ReactNode } from "react";
import type { UnitSystem } from "#shared/units";
import { Alert, TableScroller } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useBaseline } from "../api/get-baseline";
import { useMakeRates } from "../api/get-make-rates";
import type { StatsParams } from "../api/types";
import { makeRateRows, SMALL_SAMPLE, toBaselineSeries, totalAttempts, type MakeRateRow } from "../utils/chart-data";
import { MakeRateChart } from "./lazy-charts";

/** How the chart names its baseline (the exact words the brief asks for). */
export const TOUR_SOURCE_LINE = "Tour one-putt rates: M. Broadie, Every Shot Counts (2014), as quoted";

const fmt = (v: number | null) => (v === null ? "–" : `${v.toFixed(0)} %`);

export function MakeRateTable({ rows, caption }: { rows: MakeRateRow[]; caption: string }) {
  return (
    <TableScroller label={caption}>
      <table className="w-full border-collapse bg-white text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-50 text-ink-700">
          <tr>
            <th scope="col" className="py-2 pr-2 pl-4 font-semibold">
              Distance
            </th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">
              Holed
            </th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">
              Make rate <span className="block text-xs font-normal text-ink-500">95 % interval</span>
            </th>
            <th scope="col" className="py-2 pr-4 pl-2 text-right font-semibold">
              Tour
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.key} className="border-t border-ink-900/5 align-top">
              <th scope="row" className="py-2 pr-2 pl-4 font-medium whitespace-nowrap">
                {r.label}
              </th>
              <td className="px-2 py-2 text-right whitespace-nowrap tabular-nums">
                {r.made} / {r.attempts}
              </td>
              <td className="px-2 py-2 text-right tabular-nums">
                <span className="font-semibold">{fmt(r.rate)}</span>
                <span className="block text-xs whitespace-nowrap text-ink-500">
                  {r.lo === null ? "no putts" : `${r.lo.toFixed(0)}–${r.hi!.toFixed(0)} %`}
                </span>
                {r.caution ? <span className="block text-xs text-warn-800">{r.caution}</span> : null}
              </td>
              <td className="py-2 pr-4 pl-2 text-right whitespace-nowrap text-ink-600 tabular-nums">{fmt(r.tour)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroller>
  );
}

/** Make rate by distance band with its interval and the tour overlay: chart and table with the same numbers. */
export function MakeRatesSection({
  params,
  units,
  empty,
  rateLabel,
}: {
  params: StatsParams;
  units: UnitSystem;
  empty: ReactNode;
  rateLabel?: string;
}) {
  const rates = useMakeRates(params);
  const baseline = useBaseline();
  const tour = baseline.data ? toBaselineSeries(baseline.data.onePuttRate) : null;
  if (rates.isError)
    return (
      <Alert tone="error" title="Could not work out your make rates">
        {errorMessage(rates.error)}
      </Alert>
    );
  if (!rates.data) return <div className="h-72 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading make rates" />;
  const rows = makeRateRows(rates.data.bands, units, tour);
  const n = totalAttempts(rates.data.bands);
  if (n === 0) return <>{empty}</>;
  const thin = rows.filter((r) => r.caution).length;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-ink-600">
        {n} {n === 1 ? "putt" : "putts"} in {rows.filter((r) => r.attempts > 0).length} of {rows.length} bands. The shaded band is the range
        the true rate likely lies in (95 % Wilson interval); the dashed line is the tour’s one-putt rate, averaged across each band.
      </p>
      <MakeRateChart rows={rows} tourSource={tour ? `${TOUR_SOURCE_LINE}.` : null} {...(rateLabel ? { rateLabel } : {})} />
      {thin > 0 ? (
        <Alert tone="warning">
          {thin === 1 ? "One band has" : `${thin} bands have`} fewer than {SMALL_SAMPLE} putts: the rate there can swing a long way from one
          session to the next, so read the interval, not the single number.
        </Alert>
      ) : null}
      <MakeRateTable rows={rows} caption="Make rate by distance band" />
      <p className="text-xs text-ink-500">
        Tour column: {baseline.data?.onePuttRate.source ?? "loading the source…"}. A tour one-putt rate is measured on tournament greens in
        play, not on a practice green: treat it as a yardstick, not a target.
      </p>
    </div>
  );
}
