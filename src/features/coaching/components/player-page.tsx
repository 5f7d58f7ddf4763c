import { lazy, Suspense } from "react";
import type { Assignment } from "../../../../shared/schemas/assignments";
import { formatLength, type UnitSystem } from "../../../../shared/units";
import { Alert, Card, CardTitle, EmptyState, ErrorBoundary, PageHeader, Spinner, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useCoachedPlayer } from "../api/get-coached-player";
import { useMakeRates } from "../api/get-make-rates";
import { useUnits } from "../hooks/use-units";
import { STATUS_WORDS, statusKey } from "../utils/rule-words";
import { playerChartData } from "../utils/squad-chart-data";
import { QueryState } from "./query-state";
import { Badge, type BadgeTone } from "./status-badge";

const PlayerRateChart = lazy(() => import("./player-rate-chart"));
const dateFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric" });
const dueFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const TONE: Record<ReturnType<typeof statusKey>, BadgeTone> = { "not-started": "neutral", "in-progress": "warn", completed: "ok", overdue: "bad" };

function MakeRatesCard({ playerId, units }: { playerId: string; units: UnitSystem }) {
  const rates = useMakeRates(playerId);
  const rows = rates.data ? playerChartData(rates.data.bands, units) : [];
  const total = rows.reduce((n, r) => n + r.attempts, 0);
  return (
    <Card>
      <CardTitle>Make rate by distance</CardTitle>
      <p className="mt-1 text-ink-500">Every logged putt, practice and ladders. The whiskers are 95 % intervals: wide ones mean few putts.</p>
      <div className="mt-4">
        {rates.isPending ? (
          <Spinner label="Loading make rates" />
        ) : rates.isError ? (
          <Alert tone="error">{rates.error.message}</Alert>
        ) : total === 0 ? (
          <p className="text-ink-500">No putts logged yet.</p>
        ) : (
          <>
            <ErrorBoundary fallback={() => <p className="text-sm text-ink-500">The chart could not be drawn here; the table below has the numbers.</p>}>
              <Suspense fallback={<Spinner label="Loading the chart" />}>
                <PlayerRateChart rows={rows} />
              </Suspense>
            </ErrorBoundary>
            <table className="mt-4 w-full text-sm">
              <caption className="sr-only">Make rate by distance band</caption>
              <thead>
                <tr className="border-b border-ink-900/10 text-left text-ink-500">
                  <th scope="col" className="py-1.5 font-medium">Distance</th>
                  <th scope="col" className="py-1.5 text-right font-medium">Holed</th>
                  <th scope="col" className="py-1.5 text-right font-medium">Rate</th>
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={r.band} className="border-b border-ink-900/5">
                    <th scope="row" className="py-1.5 text-left font-normal">{r.band}</th>
                    <td className="py-1.5 text-right tabular-nums">{r.attempts ? `${r.made} of ${r.attempts}` : "—"}</td>
                    <td className="py-1.5 text-right tabular-nums">{r.rate === null ? "—" : `${r.rate} %`}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </>
        )}
      </div>
    </Card>
  );
}

function HistoryItem({ a, units }: { a: Assignment; units: UnitSystem }) {
  const key = statusKey(a.status, a.overdue);
  const failed = a.progress.history.filter((h) => h.result === "failed");
  return (
    <li className="flex flex-col gap-1.5 py-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-semibold text-ink-900">{a.ladder.name}</p>
        <Badge tone={TONE[key]}>{STATUS_WORDS[key]}</Badge>
      </div>
      <p className="text-sm text-ink-600">
        {a.progress.completed
          ? `All ${a.ladder.rungs.length} rungs passed`
          : `Reached rung ${a.progress.bestRungIndex + 1} of ${a.ladder.rungs.length} (${formatLength(a.ladder.rungs[a.progress.bestRungIndex]!.distanceM, units)})`}{" "}
        · {a.progress.puttsTaken} putts · {a.progress.attempts} rung attempts
        {failed.length > 0 ? ` · ${failed.length} missed rung${failed.length === 1 ? "" : "s"}` : ""}
      </p>
      <p className="text-sm text-ink-500">
        Given {dateFormat.format(new Date(a.createdAt))}
        {a.dueDate ? ` · due ${dueFormat.format(new Date(`${a.dueDate}T00:00:00Z`))}` : ""}
        {a.completedAt ? ` · completed ${dateFormat.format(new Date(a.completedAt))}` : a.lastActivityAt ? ` · last putt ${dateFormat.format(new Date(a.lastActivityAt))}` : ""}
      </p>
      {a.progress.history.length > 0 ? (
        <details className="text-sm">
          <summary className="cursor-pointer py-1 font-medium text-ink-700">Rung by rung</summary>
          <ol className="mt-1 flex flex-col gap-0.5 pl-1 text-ink-600">
            {a.progress.history.map((h, i) => (
              <li key={i}>
                Rung {h.rungIndex + 1} ({formatLength(a.ladder.rungs[h.rungIndex]!.distanceM, units)}): {h.result === "passed" ? "passed" : "missed"}, {h.holed} holed of {h.ballsTaken}
              </li>
            ))}
          </ol>
        </details>
      ) : null}
    </li>
  );
}

/** One player of the coach's squads: make rates by distance and the history of the ladders given. */
export function PlayerPage({ playerId }: { playerId: string }) {
  const units = useUnits();
  const detail = useCoachedPlayer(playerId);
  if (detail.isError && isApiError(detail.error) && (detail.error.status === 404 || detail.error.status === 400)) {
    return (
      <EmptyState title="Player not found">
        They are not in one of your squads. <TextLink to={paths.coach.href()}>Back to the dashboard</TextLink>
      </EmptyState>
    );
  }
  return (
    <QueryState query={detail} label="Loading the player">
      {() => {
        const d = detail.data!;
        return (
          <>
            <title>{`${d.player.name} · Borrowline`}</title>
            <PageHeader eyebrow={<TextLink to={paths.coach.href()}>Coach dashboard</TextLink>} title={d.player.name} description={`${d.player.email} · ${d.squads.map((s) => s.name).join(", ")}`} />
            <div className="grid gap-6 lg:grid-cols-[1.2fr_1fr]">
              <MakeRatesCard playerId={playerId} units={units} />
              <Card>
                <CardTitle>Ladders</CardTitle>
                {d.assignments.length === 0 ? (
                  <p className="mt-2 text-ink-500">You have not given {d.player.name} a ladder yet.</p>
                ) : (
                  <ul className="divide-y divide-ink-900/10">
                    {d.assignments.map((a) => (
                      <HistoryItem key={a.id} a={a} units={units} />
                    ))}
                  </ul>
                )}
              </Card>
            </div>
          </>
        );
      }}
    </QueryState>
  );
}
