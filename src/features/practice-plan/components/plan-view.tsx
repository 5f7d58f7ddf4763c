import { useNavigate } from "react-router";
import { formatDate } from "#shared/format";
import type { PlanBand, PlanReady, PracticePlanResponse } from "#shared/schemas/practice-plan";
import { TRAINING_LEVELS } from "#shared/training";
import { formatLength, type UnitSystem } from "#shared/units";
import { Alert, Button, ButtonLink, Card, EmptyState, PageSpinner, TableScroller, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useUnits } from "../../auth/hooks/use-units";
import { useAdoptPlan, usePracticePlan, useStartPlan } from "../api/practice-plan";
import {
  bandLabel,
  bandVerdict,
  planLadderName,
  FAIL_RULE_TEXT,
  passRuleText,
  pct,
  rateWithRange,
  strokesWords,
} from "../utils/plan-words";
import { H, td, th, type Level, type Mode } from "./plan-view-parts";
import { WeeklyCheck } from "./weekly-check";

function BandsTable({ bands, units, caption }: { bands: PlanBand[]; units: UnitSystem; caption: string }) {
  return (
    <TableScroller label={caption}>
      <table className="w-full min-w-[40rem] text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-900/5 text-ink-700">
          <tr>
            <th scope="col" className={th}>
              Length
            </th>
            <th scope="col" className={th}>
              Putts
            </th>
            <th scope="col" className={th}>
              You hole (95 % range)
            </th>
            <th scope="col" className={th}>
              Tour
            </th>
            <th scope="col" className={th}>
              Faced a round
            </th>
            <th scope="col" className={th}>
              Strokes a round
            </th>
            <th scope="col" className={th}>
              Verdict
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-900/10">
          {bands.map((b) => (
            <tr key={b.fromM} className={b.target ? "bg-warn-50 font-semibold" : undefined}>
              <th scope="row" className={`${td} text-left whitespace-nowrap`}>
                {bandLabel(b, units)}
              </th>
              <td className={td}>{b.attempts}</td>
              <td className={`${td} whitespace-nowrap`}>{rateWithRange(b.rate, b.ci95)}</td>
              <td className={td}>{pct(b.baselineRate)}</td>
              <td className={td}>{b.facedPerRound.toFixed(1)}</td>
              <td className={`${td} whitespace-nowrap`}>{strokesWords(b.strokesPerRound)}</td>
              <td className={td}>{bandVerdict(b)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroller>
  );
}

function ProposedPlan({ plan, units, level, playerName }: { plan: PlanReady; units: UnitSystem; level: Level; playerName?: string }) {
  const targets = plan.targets.map((i) => plan.bands[i]!);
  const trainingLevel = TRAINING_LEVELS[plan.trainingLevel];
  return (
    <div className="flex flex-col gap-4">
      <Card>
        <H level={level}>Where your strokes go</H>
        <p className="mt-2 text-ink-700">
          {`Work on ${plan.targets.map((i) => bandLabel(plan.bands[i]!, units)).join(" and ")}: that is where ${playerName ?? "you"} ${playerName ? "loses" : "lose"} the most strokes a round against the tour, and the loss is clear of its interval.`}
        </p>
        <ul className="mt-3 flex flex-col gap-2">
          {targets.map((b) => (
            <li key={b.fromM} className="rounded-lg bg-warn-50 px-3 py-2 text-ink-800">
              <strong>{bandLabel(b, units)}</strong>: you hole {rateWithRange(b.rate, b.ci95)} of {b.attempts}; the tour holes{" "}
              {pct(b.baselineRate)}. That costs about <strong>{b.strokesPerRound!.toFixed(2)} strokes a round</strong> (
              {b.facedPerRound.toFixed(1)} putts of this length a round).
            </li>
          ))}
        </ul>
      </Card>
      <div className="grid gap-4 lg:grid-cols-2">
        <Card>
          <H level={level}>The ladder</H>
          <p className="mt-1 text-sm text-ink-600">{planLadderName(plan, units)}</p>
          <ol className="mt-3 flex flex-col gap-1.5" aria-label="Rungs of the plan's ladder">
            {plan.ladder.rungs.map((r, i) => (
              <li key={i} className="flex flex-wrap items-baseline justify-between gap-2 rounded-lg bg-ink-900/5 px-3 py-2">
                <span>
                  Rung {i + 1}: <strong>{formatLength(r.distanceM, units)}</strong>
                </span>
                <span className="text-ink-700">{passRuleText(r.passRule, r.balls)}</span>
              </li>
            ))}
          </ol>
          <p className="mt-2 text-sm text-ink-600">{FAIL_RULE_TEXT[plan.ladder.failRule]}</p>
        </Card>
        <Card>
          <H level={level}>Each week</H>
          <ul className="mt-2 flex flex-col gap-2 text-ink-700">
            <li>
              <strong>{plan.weekly.sessions} sessions</strong> of about {plan.weekly.puttsPerSession} putts: {plan.weekly.puttsPerWeek}{" "}
              putts a week, about {plan.weekly.puttsPerTargetBand} at each length in the plan — enough to see a change within a few weeks.
            </li>
            <li>
              Read training at the <TextLink to={paths.train.href(`level=${plan.trainingLevel}`)}>{trainingLevel.label} level</TextLink>{" "}
              once a week: its putts are the lengths the plan works on.
            </li>
          </ul>
          <p className="mt-3 text-sm text-ink-500">
            Practice-green putts are not course putts: a plan points the way, your own feel on the course decides.
          </p>
        </Card>
      </div>
    </div>
  );
}

function Actions({ data, mode }: { data: PracticePlanResponse; mode: Mode }) {
  const navigate = useNavigate();
  const start = useStartPlan();
  const adopt = useAdoptPlan();
  const pending = start.isPending || adopt.isPending;
  const error = start.error ?? adopt.error;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap gap-3">
        {mode === "player" ? (
          <Button
            disabled={pending}
            onClick={() =>
              start.mutate(undefined, {
                onSuccess: (r) => void navigate(paths.runLadder.href(r.assignmentId)),
              })
            }
          >
            {start.isPending ? "Starting…" : data.active ? "Start a fresh plan now" : "Start this plan now"}
          </Button>
        ) : (
          <Button
            disabled={pending}
            onClick={() =>
              adopt.mutate(data.playerId, {
                onSuccess: (r) => void navigate(paths.ladder.href(r.ladderId)),
              })
            }
          >
            {adopt.isPending ? "Adopting…" : `Adopt this plan for ${data.playerName}`}
          </Button>
        )}
      </div>
      <p className="text-sm text-ink-500">
        {mode === "player"
          ? "Starting turns the ladder into one you can run on the green straight away; your putts count in your log as usual."
          : "Adopting copies the ladder into your library, where you can edit its rungs and assign it with a due date."}
      </p>
      {error ? (
        <Alert tone="error" title={mode === "player" ? "Could not start the plan" : "Could not adopt the plan"}>
          {isApiError(error) ? error.message : "The connection failed. Try again."}
        </Alert>
      ) : null}
    </div>
  );
}

/**
 * The practice plan of one player: the proposal from their log (or "log more first"), the plan under way with its
 * weekly check, and the action for the viewer — the player starts it, a coach adopts it. `playerId` for a coach.
 */
export function PracticePlanView({ playerId, mode }: { playerId?: string; mode: Mode }) {
  const { units } = useUnits();
  const q = usePracticePlan(playerId);
  if (q.isPending) return <PageSpinner label="Working out the plan" />;
  if (q.isError) {
    return (
      <Alert
        tone="error"
        title="Could not load the practice plan"
        action={
          <Button size="sm" variant="secondary" onClick={() => void q.refetch()}>
            Try again
          </Button>
        }
      >
        {q.error.message}
      </Alert>
    );
  }
  const data = q.data;
  const p = data.proposal;
  const who = mode === "player" ? "you" : data.playerName;
  // Under the page's h1 for the player; under the coach page's "…'s practice" h2 for a coach (whose view has a
  // "Practice plan" h3 of its own).
  const top: Level = mode === "player" ? 2 : 4;
  return (
    <div className="flex flex-col gap-6">
      {mode === "coach" ? (
        <H level={3} className="text-2xl font-semibold tracking-tight">
          Practice plan
        </H>
      ) : null}
      {data.active ? <WeeklyCheck active={data.active} units={units} mode={mode} level={top} /> : null}
      <section aria-labelledby="plan-proposal" className="flex flex-col gap-4">
        <div>
          <H level={top} id="plan-proposal" className="text-xl font-semibold tracking-tight">
            {data.active ? "What the log proposes now" : "The proposed plan"}
          </H>
          <p className="mt-1 text-sm text-ink-600">
            From {p.puttsLogged} putts logged {formatDate(data.window.from)} – {formatDate(data.window.to)}. {p.frequency.note}
          </p>
        </div>
        {p.status === "log-more" ? (
          <EmptyState
            title="Log more first"
            action={
              mode === "player" ? (
                <ButtonLink to={paths.practice.href()} variant="secondary">
                  Go to the practice log
                </ButtonLink>
              ) : undefined
            }
          >
            {mode === "player" ? p.message : `${data.playerName} has logged ${p.puttsLogged} putts in eight weeks: too few for a plan yet.`}
          </EmptyState>
        ) : p.status === "no-clear-loss" ? (
          <EmptyState title="No length stands out">{p.message}</EmptyState>
        ) : (
          <>
            <ProposedPlan plan={p} units={units} level={(top + 1) as Level} playerName={mode === "coach" ? data.playerName : undefined} />
            <Actions data={data} mode={mode} />
          </>
        )}
        {p.puttsLogged > 0 ? (
          <details className="rounded-xl bg-ink-900/5 p-3">
            <summary className="cursor-pointer py-1 font-medium text-ink-800">Every length, against the tour</summary>
            <p className="mt-2 mb-3 text-sm text-ink-600">
              A length counts only with its whole 95 % range below the tour’s rate: a loss that could be chance is left out. The tour rates
              are the published one-putt rates (Broadie, 2014); “faced a round” is how often {who === "you" ? "you face" : `${who} faces`}{" "}
              that length on the course.
            </p>
            <BandsTable bands={p.bands} units={units} caption="Make rate by length against the tour" />
          </details>
        ) : null}
      </section>
    </div>
  );
}
