import { formatDate } from "#shared/format";
import type { ReactNode } from "react";
import type { Assignment } from "#shared/schemas/assignments";
import { formatLength, type UnitSystem } from "#shared/units";
import { Card, CardTitle, EmptyState, PageHeader, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useCoachedPlayer } from "../api/get-coached-player";
import { useUnits } from "../../auth/hooks/use-units";
import { STATUS_WORDS, statusKey } from "../utils/rule-words";
import { NotesCard } from "./notes-card";
import { QueryState } from "./query-state";
import { Badge, type BadgeTone } from "./status-badge";

const TONE: Record<ReturnType<typeof statusKey>, BadgeTone> = {
  "not-started": "neutral",
  "in-progress": "warn",
  completed: "ok",
  overdue: "bad",
};

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
        Given {formatDate(a.createdAt)}
        {a.dueDate ? ` · due ${formatDate(a.dueDate)}` : ""}
        {a.completedAt
          ? ` · completed ${formatDate(a.completedAt)}`
          : a.lastActivityAt
            ? ` · last putt ${formatDate(a.lastActivityAt)}`
            : ""}
      </p>
      {a.progress.history.length > 0 ? (
        <details className="text-sm">
          <summary className="cursor-pointer py-1 font-medium text-ink-700">Rung by rung</summary>
          <ol className="mt-1 flex flex-col gap-0.5 pl-1 text-ink-600">
            {a.progress.history.map((h, i) => (
              <li key={i}>
                Rung {h.rungIndex + 1} ({formatLength(a.ladder.rungs[h.rungIndex]!.distanceM, units)}):{" "}
                {h.result === "passed" ? "passed" : "missed"}, {h.holed} holed of {h.ballsTaken}
              </li>
            ))}
          </ol>
        </details>
      ) : null}
    </li>
  );
}

/**
 * One player of the coach's squads, read-only: their practice figures (the `stats` slot, composed by the
 * route from the stats feature), the coach's notes and the history of the ladders given.
 */
export function PlayerPage({ playerId, stats }: { playerId: string; stats?: (player: { id: string; name: string }) => ReactNode }) {
  const { units } = useUnits();
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
            <PageHeader
              eyebrow={<TextLink to={paths.coach.href()}>Coach dashboard</TextLink>}
              title={d.player.name}
              description={`${d.player.email} · ${d.squads.map((s) => s.name).join(", ")}`}
            />
            <div className="grid gap-6 lg:grid-cols-2">
              <NotesCard playerId={playerId} playerName={d.player.name} canWrite />
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
            {stats ? (
              <section aria-labelledby="player-practice" className="mt-8 flex flex-col gap-4">
                <h2 id="player-practice" className="text-2xl font-semibold tracking-tight">
                  {d.player.name}’s practice
                </h2>
                {stats(d.player)}
              </section>
            ) : null}
          </>
        );
      }}
    </QueryState>
  );
}
