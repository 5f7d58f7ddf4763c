import { formatLength, type UnitSystem } from "#shared/units";
import { Alert, TableScroller } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useSessionStats } from "../api/get-session-stats";
import { lagSummary, sessionRows, weekLabel } from "../utils/chart-data";
import { SessionsChart } from "./lazy-charts";

const sg = (v: number) => `${v > 0.005 ? "+" : v < -0.005 ? "−" : ""}${Math.abs(v).toFixed(2)}`;

/** Expected putts and strokes gained per session against the tour baseline, and how often long lags finish outside 1 m. */
/** A lag's limits (6 m and 1 m, see lagSummary) in the reader's units. */
const lagLength = (m: number, units: UnitSystem) => (units === "metric" ? `${m} m` : formatLength(m, units));

export function SessionsSection({ from, to, playerId, units }: { from?: string; to?: string; playerId?: string; units: UnitSystem }) {
  const stats = useSessionStats({ ...(from ? { from } : {}), ...(to ? { to } : {}), ...(playerId ? { playerId } : {}), pageSize: 50 });
  if (stats.isError)
    return (
      <Alert tone="error" title="Could not load the session figures">
        {errorMessage(stats.error)}
      </Alert>
    );
  if (!stats.data) return <div className="h-56 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the session figures" />;
  const items = stats.data.items.filter((s) => s.putts > 0);
  if (items.length === 0) return <p className="text-ink-500">No sessions with putts in this period.</p>;
  const rows = sessionRows(items);
  const lags = lagSummary(items);
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2">
        <div className="rounded-xl bg-white p-4 ring-1 ring-ink-900/5">
          <p className="text-sm text-ink-500">
            Long putts ({lagLength(6, units)} or more) that finished outside {lagLength(1, units)}
          </p>
          <p className="text-3xl font-semibold tabular-nums">{lags.share === null ? "–" : `${Math.round(lags.share * 100)} %`}</p>
          <p className="text-sm text-ink-500">
            {lags.known > 0
              ? `${lags.outside} of ${lags.known} lags whose finish was logged`
              : lags.lags > 0
                ? `${lags.lags} lags, none with the miss length logged`
                : "No long putts logged"}
            {lags.known > 0 && lags.known < 30 ? " — few lags, read it as a rough guide" : ""}
          </p>
        </div>
        <div className="rounded-xl bg-white p-4 ring-1 ring-ink-900/5">
          <p className="text-sm text-ink-500">Strokes gained over these sessions</p>
          <p className="text-3xl font-semibold tabular-nums">{sg(items.reduce((s, x) => s + x.strokesGained, 0))}</p>
          <p className="text-sm text-ink-500">
            {sg(
              items.reduce((s, x) => s + x.strokesGained, 0) /
                Math.max(
                  1,
                  items.reduce((s, x) => s + x.putts, 0),
                ),
            )}{" "}
            a putt over {items.reduce((s, x) => s + x.putts, 0)} putts; above 0 is better than the tour average from the same distances
          </p>
        </div>
      </div>
      <SessionsChart rows={rows} />
      <TableScroller label="Expected putts and strokes gained per session">
        <table className="w-full border-collapse bg-white text-left text-sm">
          <caption className="sr-only">Expected putts and strokes gained per session</caption>
          <thead className="bg-ink-50 align-bottom text-ink-700">
            <tr>
              <th scope="col" className="py-2 pr-2 pl-4 font-semibold">
                Session
              </th>
              <th scope="col" className="px-2 py-2 text-right font-semibold">
                Putts
              </th>
              <th scope="col" className="px-2 py-2 text-right font-semibold">
                Tour / you<span className="block text-xs font-normal text-ink-500">strokes to hole out</span>
              </th>
              <th scope="col" className="px-2 py-2 text-right font-semibold">
                Gained
              </th>
              <th scope="col" className="py-2 pr-4 pl-2 text-right font-semibold">
                Lags<span className="block text-xs font-normal text-ink-500">outside 1 m</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {items.map((s) => (
              <tr key={s.sessionId} className="border-t border-ink-900/5 align-top">
                <th scope="row" className="py-2 pr-2 pl-4 font-medium whitespace-nowrap">
                  {weekLabel(s.date)}
                  {s.greenName ? <span className="block text-xs font-normal text-ink-500">{s.greenName}</span> : null}
                </th>
                <td className="px-2 py-2 text-right tabular-nums">{s.putts}</td>
                <td className="px-2 py-2 text-right whitespace-nowrap tabular-nums">
                  {s.expectedPutts.toFixed(1)} / {s.puttsTaken.toFixed(1)}
                  {s.leavesAssumed > 0 ? <span className="block text-xs text-ink-500">{s.leavesAssumed} leaves assumed</span> : null}
                </td>
                <td className="px-2 py-2 text-right font-semibold tabular-nums">{sg(s.strokesGained)}</td>
                <td className="py-2 pr-4 pl-2 text-right whitespace-nowrap tabular-nums">
                  {s.longPuttsKnown > 0 ? `${s.longLagsOutside1m} of ${s.longPuttsKnown}` : "–"}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroller>
      <p className="text-xs text-ink-500">
        Each putt is worth the tour’s average putts to hole out from its distance; a holed putt took 1, a miss took 1 plus the average from
        where it finished. A miss logged without its length is assumed to finish 45 cm or a tenth of its length away (whichever is more),
        and is counted as “leaves assumed”. Baseline: tour averages attributed to M. Broadie, Every Shot Counts (2014), partly from memory.
      </p>
    </div>
  );
}
