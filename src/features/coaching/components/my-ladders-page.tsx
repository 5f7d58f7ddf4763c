import { formatDate } from "#shared/format";
import clsx from "clsx";
import type { Assignment } from "#shared/schemas/assignments";
import { formatLength } from "#shared/units";
import { ButtonLink, EmptyState, PageHeader } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useMyAssignments } from "../api/get-my-assignments";
import { useUnits } from "../../auth/hooks/use-units";
import { passRuleWords, STATUS_WORDS, statusKey } from "../utils/rule-words";
import { useMe } from "../../auth/api/get-me";
import { MySquads } from "./my-squads";
import { NotesCard } from "./notes-card";
import { QueryState } from "./query-state";
import { Badge, type BadgeTone } from "./status-badge";

const STATUS_TONE: Record<ReturnType<typeof statusKey>, BadgeTone> = {
  "not-started": "neutral",
  "in-progress": "warn",
  completed: "ok",
  overdue: "bad",
};

function AssignmentCard({ a }: { a: Assignment }) {
  const { units } = useUnits();
  const key = statusKey(a.status, a.overdue);
  const total = a.ladder.rungs.length;
  const rung = a.currentRung;
  return (
    <li
      className={clsx(
        "flex flex-col gap-3 rounded-(--radius-card) p-5 shadow-(--shadow-card) ring-1 ring-ink-900/5",
        key === "completed" ? "bg-sand-50/60" : "bg-sand-50",
      )}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 className="text-lg font-semibold tracking-tight">{a.ladder.name}</h3>
          <p className="text-sm text-ink-500">From {a.assignedBy.name}</p>
        </div>
        <Badge tone={STATUS_TONE[key]}>{STATUS_WORDS[key]}</Badge>
      </div>
      {rung ? (
        <p className="text-ink-700">
          Rung {a.progress.rungIndex + 1} of {total}: <strong>{formatLength(rung.distanceM, units)}</strong>,{" "}
          {passRuleWords(rung.passRule, rung.balls).toLowerCase()}
        </p>
      ) : (
        <p className="text-ink-700">
          All {total} rungs passed{a.completedAt ? ` on ${formatDate(a.completedAt)}` : ""}.
        </p>
      )}
      <div className="mt-auto flex flex-wrap items-center justify-between gap-2">
        <span className={clsx("text-sm", key === "overdue" ? "font-semibold text-bad-600" : "text-ink-500")}>
          {a.dueDate ? `Due ${formatDate(a.dueDate, "weekday")}` : "No due date"}
        </span>
        <ButtonLink
          to={paths.runLadder.href(a.id)}
          size="sm"
          variant={key === "completed" ? "secondary" : "primary"}
          aria-label={`${key === "completed" ? "View" : a.status === "assigned" ? "Start" : "Continue"} ${a.ladder.name}`}
        >
          {key === "completed" ? "View" : a.status === "assigned" ? "Start" : "Continue"}
        </ButtonLink>
      </div>
    </li>
  );
}

/** The player's ladders (open ones first) and their squads. */
export function MyLaddersPage() {
  const assignments = useMyAssignments();
  const me = useMe();
  return (
    <>
      <PageHeader
        eyebrow="Practice"
        title="My ladders"
        description="The ladders your coach gave you. Take your phone to the practice green and log each putt as you go."
      />
      <div className="flex flex-col gap-10">
        <QueryState query={assignments} label="Loading your ladders">
          {() => {
            const all = assignments.data!.assignments;
            const open = all
              .filter((a) => a.status !== "completed")
              .sort((x, y) => Number(y.overdue) - Number(x.overdue) || (x.dueDate ?? "9999").localeCompare(y.dueDate ?? "9999"));
            const done = all.filter((a) => a.status === "completed");
            if (all.length === 0)
              return (
                <EmptyState title="No ladders yet">
                  When your coach gives you a ladder it appears here, and you get an e-mail with a link to it.
                </EmptyState>
              );
            return (
              <>
                <section aria-labelledby="open-ladders">
                  <h2 id="open-ladders" className="mb-3 text-xl font-semibold tracking-tight">
                    To do
                  </h2>
                  {open.length === 0 ? (
                    <p className="text-ink-500">Nothing open: every ladder you were given is completed.</p>
                  ) : (
                    <ul className="grid gap-4 md:grid-cols-2">
                      {open.map((a) => (
                        <AssignmentCard key={a.id} a={a} />
                      ))}
                    </ul>
                  )}
                </section>
                {done.length > 0 ? (
                  <section aria-labelledby="done-ladders">
                    <h2 id="done-ladders" className="mb-3 text-xl font-semibold tracking-tight">
                      Completed
                    </h2>
                    <ul className="grid gap-4 md:grid-cols-2">
                      {done.map((a) => (
                        <AssignmentCard key={a.id} a={a} />
                      ))}
                    </ul>
                  </section>
                ) : null}
              </>
            );
          }}
        </QueryState>
        {me.data ? <NotesCard playerId={me.data.user.id} playerName={me.data.user.name} canWrite={false} /> : null}
        <MySquads />
      </div>
    </>
  );
}
