import { formatDate } from "#shared/format";
import clsx from "clsx";
import type { UnitSystem } from "#shared/units";
import { Alert, InputField, TableScroller } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useCompare } from "../api/get-compare";
import type { CompareParams } from "../api/types";
import { compareRows, verdict } from "../utils/chart-data";
import { CompareChart } from "./lazy-charts";

const d = (iso: string) => formatDate(iso, "day");

export type CompareSectionProps = {
  params: CompareParams;
  units: UnitSystem;
  onChange: (next: Pick<CompareParams, "aFrom" | "aTo" | "bFrom" | "bTo">) => void;
};

const fmt = (v: number | null) => (v === null ? "–" : `${v.toFixed(0)} %`);
const diff = (v: number | null) => (v === null ? "–" : `${v > 0 ? "+" : v < 0 ? "−" : ""}${Math.abs(v).toFixed(0)} points`);

/** Two periods side by side per band, with the difference and a two-proportion test read out in words. */
export function CompareSection({ params, units, onChange }: CompareSectionProps) {
  const compare = useCompare(params);
  const aLabel = `A: ${d(params.aFrom)} – ${d(params.aTo)}`;
  const bLabel = `B: ${d(params.bFrom)} – ${d(params.bTo)}`;
  const set = (k: keyof Pick<CompareParams, "aFrom" | "aTo" | "bFrom" | "bTo">, v: string) =>
    v && onChange({ aFrom: params.aFrom, aTo: params.aTo, bFrom: params.bFrom, bTo: params.bTo, [k]: v });

  return (
    <div className="flex flex-col gap-4">
      <div className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        <InputField label="A from" type="date" value={params.aFrom} max={params.aTo} onChange={(e) => set("aFrom", e.target.value)} />
        <InputField label="A to" type="date" value={params.aTo} min={params.aFrom} onChange={(e) => set("aTo", e.target.value)} />
        <InputField label="B from" type="date" value={params.bFrom} max={params.bTo} onChange={(e) => set("bFrom", e.target.value)} />
        <InputField label="B to" type="date" value={params.bTo} min={params.bFrom} onChange={(e) => set("bTo", e.target.value)} />
      </div>
      {compare.isError ? (
        <Alert tone="error" title="Could not compare the periods">
          {errorMessage(compare.error)}
        </Alert>
      ) : null}
      {compare.data ? (
        (() => {
          const rows = compareRows(compare.data, units);
          const overall = verdict(compare.data.overall);
          const aN = compare.data.overall.a.attempts;
          const bN = compare.data.overall.b.attempts;
          return (
            <>
              {compare.data.overlap ? (
                <Alert tone="warning">The two periods overlap: putts in both count twice, and the test then overstates the evidence.</Alert>
              ) : null}
              <p className={clsx("rounded-xl px-4 py-3", overall.tone === "real" ? "bg-ok-50 text-ok-800" : "bg-ink-50 text-ink-800")}>
                <span className="font-semibold">All distances: </span>
                {fmt(compare.data.overall.a.rate === null ? null : compare.data.overall.a.rate * 100)} in A ({aN} putts),{" "}
                {fmt(compare.data.overall.b.rate === null ? null : compare.data.overall.b.rate * 100)} in B ({bN} putts) — {overall.words}.
                {aN > 0 && bN > 0 ? " The mix of distances can differ between the periods; the bands below compare like with like." : ""}
              </p>
              {aN + bN > 0 ? <CompareChart rows={rows} aLabel={aLabel} bLabel={bLabel} /> : null}
              <TableScroller label="Make rate per band in period A and period B">
                <table className="w-full border-collapse bg-white text-left text-sm">
                  <caption className="sr-only">Make rate per band in period A and period B</caption>
                  <thead className="bg-ink-50 text-ink-700">
                    <tr>
                      <th scope="col" className="py-2 pr-2 pl-4 font-semibold">
                        Distance
                      </th>
                      <th scope="col" className="px-2 py-2 text-right font-semibold">
                        A
                      </th>
                      <th scope="col" className="px-2 py-2 text-right font-semibold">
                        B
                      </th>
                      <th scope="col" className="py-2 pr-4 pl-2 text-right font-semibold">
                        B − A
                      </th>
                    </tr>
                  </thead>
                  {rows.map((r) => (
                    <tbody key={r.key} className="border-t border-ink-900/10">
                      <tr className="align-top">
                        <th scope="row" rowSpan={2} className="py-2 pr-2 pl-4 font-medium whitespace-nowrap">
                          {r.label}
                        </th>
                        <td className="px-2 pt-2 text-right tabular-nums">
                          {fmt(r.a)}
                          <span className="block text-xs whitespace-nowrap text-ink-500">{r.aAttempts} putts</span>
                          {r.aAttempts > 0 ? <span className="block text-xs whitespace-nowrap text-ink-500">{r.aRange}</span> : null}
                        </td>
                        <td className="px-2 pt-2 text-right tabular-nums">
                          {fmt(r.b)}
                          <span className="block text-xs whitespace-nowrap text-ink-500">{r.bAttempts} putts</span>
                          {r.bAttempts > 0 ? <span className="block text-xs whitespace-nowrap text-ink-500">{r.bRange}</span> : null}
                        </td>
                        <td className="pt-2 pr-4 pl-2 text-right whitespace-nowrap tabular-nums">{diff(r.difference)}</td>
                      </tr>
                      <tr>
                        <td colSpan={3} className="pt-1 pr-4 pb-2 pl-2 text-right text-sm">
                          <span
                            className={clsx(
                              r.verdict.tone === "real" && "font-medium text-ok-800",
                              r.verdict.tone === "none" && "text-ink-400",
                            )}
                          >
                            {r.verdict.words}
                          </span>
                          {r.caution ? <span className="block text-xs text-warn-800">{r.caution}</span> : null}
                        </td>
                      </tr>
                    </tbody>
                  ))}
                </table>
              </TableScroller>
              <p className="text-xs text-ink-500">
                “Likely a real change”: a pooled two-proportion z-test gives p below 0.05 — a difference this large would turn up by chance
                less than one time in twenty. Otherwise it “could be chance”. With few putts the test is rough; the intervals say more.
              </p>
            </>
          );
        })()
      ) : compare.isPending ? (
        <div className="h-72 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the comparison" />
      ) : null}
    </div>
  );
}
