import { useEffect, useRef, useState } from "react";
import clsx from "clsx";
import { step } from "#shared/ladder-engine";
import type { AssignmentDetail } from "#shared/schemas/assignments";
import { formatLength, type UnitSystem } from "#shared/units";
import { Alert, Button, ButtonLink, EmptyState, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useMe } from "../../auth/api/get-me";
import { useLadderRun, type LadderRun } from "../hooks/use-ladder-run";
import { useUnits } from "../../auth/hooks/use-units";
import { BREAK_TYPE_WORDS, FAIL_RULE_WORDS, momentWords, passRuleWords, type Moment } from "../utils/rule-words";
import { MissDetails } from "./miss-details";
import { QueryState } from "./query-state";

function RungTrack({ total, current, completed }: { total: number; current: number; completed: boolean }) {
  return (
    <ol aria-label="Rungs" className="flex gap-1.5">
      {Array.from({ length: total }, (_, i) => {
        const state = completed || i < current ? "passed" : i === current ? "current" : "ahead";
        return (
          <li
            key={i}
            aria-label={`Rung ${i + 1}: ${state === "passed" ? "passed" : state === "current" ? "playing now" : "ahead"}`}
            className={clsx(
              "h-2.5 flex-1 rounded-full",
              state === "passed" ? "bg-ok-600" : state === "current" ? "bg-coral-500" : "bg-ink-900/10",
            )}
          />
        );
      })}
    </ol>
  );
}

function SyncStatus({ run }: { run: LadderRun }) {
  if (run.waiting) {
    return (
      <p className="text-sm text-warn-800">
        No connection. {run.pendingCount} putt{run.pendingCount === 1 ? " is" : "s are"} kept on this phone and sent when you are back
        online.
      </p>
    );
  }
  const sending = run.pendingCount - (run.openMiss ? 1 : 0);
  return (
    <p className="text-sm text-ink-500">
      {sending > 0 ? "Saving…" : run.openMiss ? "The miss is saved after its details" : "Every putt saved"}
    </p>
  );
}

function Stat({ label, value }: { label: string; value: number }) {
  return (
    <div className="flex flex-col items-center rounded-xl bg-sand-50/10 px-2 py-3">
      <dt className="text-xs font-medium tracking-wide text-sand-300 uppercase">{label}</dt>
      <dd className="text-3xl font-semibold tabular-nums">{value}</dd>
    </div>
  );
}

type CompletedProps = { assignment: AssignmentDetail; run: LadderRun; onUndo: () => void; undoing: boolean; readOnly: boolean };

function Completed({ assignment, run, onUndo, undoing, readOnly }: CompletedProps) {
  const p = run.progress!;
  const failed = p.history.filter((h) => h.result === "failed").length;
  // The last putt's Holed button is gone with the rung: the focus goes to this heading, not to <body> (keyboard use).
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  return (
    <div className="flex flex-col gap-5">
      <section aria-live="polite" className="rounded-(--radius-card) bg-ok-600 p-6 text-center text-white">
        <p className="text-sm font-semibold tracking-wide uppercase">{assignment.ladder.name}</p>
        <h1 ref={heading} tabIndex={-1} className="mt-2 text-4xl font-semibold tracking-tight focus:outline-none">
          Ladder completed
        </h1>
        <p className="mt-2 text-lg">
          All {assignment.ladder.rungs.length} rungs passed in {p.puttsTaken} putts
          {failed > 0 ? `, with ${failed} missed rung${failed === 1 ? "" : "s"} on the way` : ", without missing a rung"}.
        </p>
      </section>
      <SyncStatus run={run} />
      <div className="flex flex-wrap gap-3">
        <ButtonLink to={paths.myLadders.href()} size="lg">
          Back to my ladders
        </ButtonLink>
        {readOnly ? null : (
          <Button variant="ghost" size="lg" onClick={onUndo} pending={undoing}>
            Undo last putt (reopens the ladder)
          </Button>
        )}
      </div>
    </div>
  );
}

function Runner({
  assignment,
  run,
  units,
  readOnly,
}: {
  assignment: AssignmentDetail;
  run: LadderRun;
  units: UnitSystem;
  readOnly: boolean;
}) {
  const [moment, setMoment] = useState<(Moment & { n: number }) | null>(null);
  const [undoing, setUndoing] = useState(false);
  // Undo on the completed screen reopens the ladder: its own Undo button takes the focus the reopened one had.
  const focusUndo = useRef(false);
  const undoButton = useRef<HTMLButtonElement>(null);
  const p = run.progress!;
  const ladder = assignment.ladder;
  const rung = ladder.rungs[p.rungIndex]!;
  const total = ladder.rungs.length;

  const play = (holed: boolean) => {
    const after = step(ladder, p, holed);
    const m = momentWords(ladder, p, after, units);
    setMoment(m ? { ...m, n: (moment?.n ?? 0) + 1 } : null);
    run.play(holed);
  };

  const undo = async () => {
    setMoment(null);
    setUndoing(true);
    try {
      await run.undo();
    } finally {
      setUndoing(false);
    }
  };

  useEffect(() => {
    if (p.completed || !focusUndo.current) return;
    focusUndo.current = false;
    undoButton.current?.focus();
  }, [p.completed]);

  if (p.completed) {
    const reopen = () => {
      focusUndo.current = true;
      void undo();
    };
    return <Completed assignment={assignment} run={run} onUndo={reopen} undoing={undoing} readOnly={readOnly} />;
  }

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-lg font-semibold tracking-tight">{ladder.name}</h1>
        <p className="text-sm text-ink-500">If a rung is missed: {FAIL_RULE_WORDS[ladder.failRule].label.toLowerCase()}</p>
      </div>
      <RungTrack total={total} current={p.rungIndex} completed={false} />

      <div role="status" aria-live="polite" aria-atomic="true" className="min-h-0">
        {moment ? (
          <p
            key={moment.n}
            className={clsx(
              "rounded-xl px-4 py-3 text-center text-lg font-semibold",
              moment.tone === "failed" ? "bg-coral-100 text-coral-800" : "bg-ok-50 text-ok-800",
            )}
          >
            {moment.text}
          </p>
        ) : null}
      </div>

      <section aria-label="Current rung" className="rounded-(--radius-card) bg-ink-900 p-5 text-center text-sand-50 sm:p-7">
        <p className="text-sm font-semibold tracking-wide text-coral-300 uppercase">
          Rung {p.rungIndex + 1} of {total}
        </p>
        <p className="mt-1 text-6xl font-semibold tracking-tight tabular-nums sm:text-7xl">{formatLength(rung.distanceM, units)}</p>
        <p className="mt-2 text-xl font-medium">{passRuleWords(rung.passRule, rung.balls)}</p>
        {rung.breakType || rung.note ? (
          <p className="mt-1 text-sand-300">
            {[rung.breakType ? BREAK_TYPE_WORDS[rung.breakType] : null, rung.note].filter(Boolean).join(" · ")}
          </p>
        ) : null}
        <dl className={clsx("mt-5 grid gap-2", rung.passRule.kind === "in-a-row" ? "grid-cols-3" : "grid-cols-2")}>
          <Stat label="Balls left" value={p.ballsLeft} />
          <Stat label="Holed" value={p.holed} />
          {rung.passRule.kind === "in-a-row" ? <Stat label="In a row" value={p.streak} /> : null}
        </dl>
      </section>

      {readOnly ? (
        <Alert tone="info">This is {assignment.player.name}&rsquo;s ladder. Only they can log its putts.</Alert>
      ) : (
        <div className="grid grid-cols-2 gap-3">
          <button
            type="button"
            onClick={() => play(true)}
            className="min-h-20 rounded-(--radius-card) bg-ok-600 text-2xl font-semibold text-white shadow-(--shadow-card) active:bg-ok-800"
          >
            Holed
          </button>
          <button
            type="button"
            onClick={() => play(false)}
            className="min-h-20 rounded-(--radius-card) bg-white text-2xl font-semibold text-ink-900 shadow-(--shadow-card) ring-2 ring-ink-900/15 active:bg-sand-200"
          >
            Missed
          </button>
        </div>
      )}

      {run.openMiss && !readOnly ? (
        <MissDetails
          key={run.openMiss}
          units={units}
          onSave={(d) => run.addMissDetails(run.openMiss!, d)}
          onSkip={() => run.skipMissDetails(run.openMiss!)}
        />
      ) : null}

      {run.error ? <Alert tone="error">{run.error}</Alert> : null}

      <div className="flex flex-wrap items-center justify-between gap-3 border-t border-ink-900/10 pt-3">
        {readOnly ? (
          <span />
        ) : (
          <Button
            ref={undoButton}
            variant="ghost"
            onClick={() => void undo()}
            aria-disabled={p.puttsTaken === 0 || undefined}
            pending={undoing}
          >
            Undo last putt
          </Button>
        )}
        <SyncStatus run={run} />
      </div>
      <p className="text-sm text-ink-500">
        {p.puttsTaken} putt{p.puttsTaken === 1 ? "" : "s"} so far. <TextLink to={paths.myLadders.href()}>My ladders</TextLink>
      </p>
    </div>
  );
}

/** Runs one assigned ladder on the green: the rung in large type, one tap per putt. */
export function RunPage({ assignmentId }: { assignmentId: string }) {
  const run = useLadderRun(assignmentId);
  const { units } = useUnits();
  const me = useMe();
  if (
    !run.assignment &&
    run.query.isError &&
    isApiError(run.query.error) &&
    (run.query.error.status === 404 || run.query.error.status === 400)
  ) {
    return (
      <EmptyState title="Ladder not found" action={<ButtonLink to={paths.myLadders.href()}>My ladders</ButtonLink>}>
        This ladder is not one of yours, or it no longer exists.
      </EmptyState>
    );
  }
  return (
    <div className="mx-auto w-full max-w-xl">
      <title>{run.assignment ? `${run.assignment.ladder.name} · Borrowline` : "Ladder · Borrowline"}</title>
      {run.assignment && run.progress ? (
        <Runner
          assignment={run.assignment}
          run={run}
          units={units}
          readOnly={Boolean(me.data && me.data.user.id !== run.assignment.player.id)}
        />
      ) : (
        <QueryState query={run.query} label="Loading the ladder">
          {() => null}
        </QueryState>
      )}
    </div>
  );
}
