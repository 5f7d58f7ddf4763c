import type { UnitSystem } from "#shared/units";
import { Alert, TableScroller } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useMisses } from "../api/get-misses";
import { bandLabel } from "../utils/bands";
import { strokesSummary } from "../utils/strokes-summary";

const sg = (v: number) => `${v > 0.005 ? "+" : v < -0.005 ? "−" : ""}${Math.abs(v).toFixed(1)}`;
const pct = (n: number, of: number) => (of === 0 ? "–" : `${Math.round((n / of) * 100)} %`);

/** Where the strokes go: a short summary in words, then misses left/right and short/long per band with the strokes gained. */
export function MissesSection({
  params,
  units,
  name,
}: {
  params: { from?: string; to?: string; bands?: string; playerId?: string };
  units: UnitSystem;
  name?: string;
}) {
  const misses = useMisses(params);
  if (misses.isError)
    return (
      <Alert tone="error" title="Could not load the misses">
        {errorMessage(misses.error)}
      </Alert>
    );
  if (!misses.data) return <div className="h-40 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the misses" />;
  const bands = misses.data.bands;
  if (bands.every((b) => b.attempts === 0)) return <p className="text-ink-500">No practice putts in this period.</p>;
  const summary = strokesSummary(bands, units, name);
  return (
    <div className="flex flex-col gap-4">
      <div className="rounded-xl bg-sand-100 p-4 ring-1 ring-ink-900/5" data-testid="strokes-summary">
        <p className="text-sm font-semibold text-ink-700">In short</p>
        {summary ? (
          summary.map((line) => (
            <p key={line} className="mt-1 text-ink-800">
              {line}
            </p>
          ))
        ) : (
          <p className="mt-1 text-ink-600">Too few putts in any one band to say where the strokes go; ten or more in a band will do.</p>
        )}
      </div>
      <TableScroller label="Misses and strokes gained per distance band">
        <table className="w-full border-collapse bg-white text-left text-sm">
          <caption className="sr-only">Misses by side and length, and strokes gained, per distance band</caption>
          <thead className="bg-ink-50 align-bottom text-ink-700">
            <tr>
              <th scope="col" className="py-2 pr-2 pl-4 font-semibold">
                Distance
              </th>
              <th scope="col" className="px-2 py-2 text-right font-semibold">
                Missed
              </th>
              <th scope="col" className="px-2 py-2 text-right font-semibold">
                Left / right
              </th>
              <th scope="col" className="px-2 py-2 text-right font-semibold">
                Short / long
              </th>
              <th scope="col" className="py-2 pr-4 pl-2 text-right font-semibold">
                Strokes<span className="block text-xs font-normal text-ink-500">vs tour</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {bands.map((b) => (
              <tr key={b.fromM} className="border-t border-ink-900/5">
                <th scope="row" className="py-2 pr-2 pl-4 font-medium whitespace-nowrap">
                  {bandLabel(b.fromM, b.toM, units)}
                </th>
                <td className="px-2 py-2 text-right tabular-nums">{b.attempts === 0 ? "–" : `${b.missed} of ${b.attempts}`}</td>
                <td className="px-2 py-2 text-right whitespace-nowrap tabular-nums">
                  {b.left + b.right === 0 ? "–" : `${pct(b.left, b.left + b.right)} / ${pct(b.right, b.left + b.right)}`}
                </td>
                <td className="px-2 py-2 text-right whitespace-nowrap tabular-nums">
                  {b.short + b.long === 0 ? "–" : `${pct(b.short, b.short + b.long)} / ${pct(b.long, b.short + b.long)}`}
                </td>
                <td
                  className={`py-2 pr-4 pl-2 text-right font-semibold tabular-nums ${b.strokesGained < -0.05 ? "text-bad-600" : "text-ink-800"}`}
                >
                  {b.attempts === 0 ? "–" : sg(b.strokesGained)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroller>
      <p className="text-xs text-ink-500">
        Shares count only the misses whose side or leave was logged. Strokes: the tour’s expected putts from each putt’s distance minus the
        putts it took (holed 1, missed 1 + the tour’s expected putts from the leave).
      </p>
    </div>
  );
}
