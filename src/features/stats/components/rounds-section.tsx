import { Alert, TableScroller } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useRounds } from "../api/get-rounds";
import type { PlayerRange } from "../api/types";
import { weekLabel } from "../utils/chart-data";

const sg = (v: number) => `${v > 0.005 ? "+" : v < -0.005 ? "−" : ""}${Math.abs(v).toFixed(2)}`;

/** Strokes gained on the greens per round: putts taken against the tour's expected putts from each first putt. */
export function RoundsSection({ params }: { params: PlayerRange }) {
  const rounds = useRounds(params);
  if (rounds.isError)
    return (
      <Alert tone="error" title="Could not load the rounds">
        {errorMessage(rounds.error)}
      </Alert>
    );
  if (!rounds.data) return <div className="h-32 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the rounds" />;
  const items = rounds.data.items.filter((r) => r.totals.holes > 0);
  if (items.length === 0) return <p className="text-ink-500">No rounds logged in this period.</p>;
  return (
    <TableScroller label="Table of strokes gained per round">
      <table className="w-full border-collapse bg-white text-left text-sm">
        <caption className="sr-only">Strokes gained per round</caption>
        <thead className="bg-ink-50 text-ink-700">
          <tr>
            <th scope="col" className="py-2 pr-2 pl-4 font-semibold">
              Round
            </th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">
              Holes
            </th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">
              Putts
            </th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">
              Tour
            </th>
            <th scope="col" className="py-2 pr-4 pl-2 text-right font-semibold">
              Gained
            </th>
          </tr>
        </thead>
        <tbody>
          {items.map((r) => (
            <tr key={r.id} className="border-t border-ink-900/5">
              <th scope="row" className="py-2 pr-2 pl-4 font-medium">
                {weekLabel(r.date)}
                {r.course ? <span className="block text-xs font-normal text-ink-500">{r.course}</span> : null}
              </th>
              <td className="px-2 py-2 text-right tabular-nums">{r.totals.holes}</td>
              <td className="px-2 py-2 text-right tabular-nums">{r.totals.putts}</td>
              <td className="px-2 py-2 text-right tabular-nums">{r.totals.expectedPutts.toFixed(1)}</td>
              <td className="py-2 pr-4 pl-2 text-right font-semibold tabular-nums">{sg(r.totals.strokesGained)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroller>
  );
}
