import clsx from "clsx";
import { TableScroller } from "../../../components/ui";
import type { UnitSystem } from "#shared/units";
import { toChartTable, type BreakChartAnswer } from "../utils/chart-data";

export type BreakChartTableProps = { answer: BreakChartAnswer; units: UnitSystem; caption: string };

/** Rows = distances, columns = which way the green falls; each cell the aim offset ("11 in L"). */
export function BreakChartTable({ answer, units, caption }: BreakChartTableProps) {
  const { columns, rows } = toChartTable(answer, units);
  return (
    <figure className="flex flex-col gap-3">
      <figcaption className="text-sm text-ink-600 print:text-[9pt]">{caption}</figcaption>
      <TableScroller
        label="The aims in numbers"
        framed={false}
        className="-mx-5 px-5 sm:mx-0 sm:px-0 print:mx-0 print:overflow-visible print:px-0"
      >
        <table
          aria-label="Aim offset by distance and by which way the green falls"
          className="w-full min-w-[46rem] border-collapse text-sm tabular-nums print:min-w-0 print:text-[7.5pt]"
        >
          <thead>
            <tr>
              <td className="p-0" />
              <th
                scope="colgroup"
                colSpan={columns.length}
                className="pb-1 text-left text-xs font-semibold tracking-wide text-ink-500 uppercase"
              >
                The green falls…
              </th>
            </tr>
            <tr className="border-b-2 border-ink-900/20">
              <th
                scope="col"
                className="sticky left-0 bg-sand-50 py-2 pr-3 text-left align-bottom font-semibold print:static print:bg-transparent"
              >
                Distance
              </th>
              {columns.map((c) => (
                <th key={c.key} scope="col" className="px-1.5 py-2 text-left align-bottom leading-tight font-semibold print:px-1">
                  <span className="block">{c.main}</span>
                  {c.minor ? <span className="block text-xs font-normal text-ink-500 print:text-[7pt]">{c.minor}</span> : null}
                  <span className="block text-xs font-normal text-ink-400 print:text-[7pt]">{c.deg}°</span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.key} className="border-b border-ink-900/10 even:bg-ink-900/[0.025]">
                <th
                  scope="row"
                  className="sticky left-0 bg-sand-50 py-2 pr-3 text-left font-semibold whitespace-nowrap print:static print:bg-transparent"
                >
                  {r.heading}
                </th>
                {r.cells.map((c) => (
                  <td
                    key={c.key}
                    data-ok={c.ok}
                    className={clsx(
                      "px-1.5 py-2 whitespace-nowrap print:px-1 print:py-1",
                      !c.ok &&
                        "bg-[repeating-linear-gradient(135deg,transparent_0_4px,rgb(19_27_46/0.07)_4px_8px)] text-xs text-ink-500 italic",
                      c.side === "centre" && "text-ink-500",
                    )}
                  >
                    {c.text}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroller>
    </figure>
  );
}
