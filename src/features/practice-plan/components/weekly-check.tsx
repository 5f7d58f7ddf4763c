// The weekly check of a running practice plan (plan-view.tsx): each target band's week against the weeks before.
import { formatDate } from "#shared/format";
import type { ActivePlan } from "#shared/schemas/practice-plan";
import { type UnitSystem } from "#shared/units";
import { ButtonLink, Card, TableScroller } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { bandLabel, MOVE_TEXT, planLadderName, rateWithRange } from "../utils/plan-words";
import { H, type Level, type Mode, td, th } from "./plan-view-parts";

export function WeeklyCheck({ active, units, mode, level }: { active: ActivePlan; units: UnitSystem; mode: Mode; level: Level }) {
  const started =
    active.startedBy.role === "player"
      ? `Started ${formatDate(active.startedOn)}`
      : `Adopted by ${active.startedBy.name} on ${formatDate(active.startedOn)}`;
  return (
    <Card>
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <H level={level}>The plan under way</H>
          <p className="mt-1 text-sm text-ink-600">
            {planLadderName(active.plan, units)} · {started}
          </p>
        </div>
        {mode === "player" && active.assignmentId ? (
          <ButtonLink to={paths.runLadder.href(active.assignmentId)} size="sm">
            Run the plan’s ladder
          </ButtonLink>
        ) : mode === "player" && active.ladderId ? (
          <ButtonLink to={paths.myLadders.href()} size="sm" variant="secondary">
            My ladders
          </ButtonLink>
        ) : null}
      </div>
      <p className="mt-3 text-sm text-ink-700">
        Each week the lengths in the plan against the eight weeks before it started: “better” or “worse” only when the change is clear of
        chance (two-proportion test, 95 %).
      </p>
      <TableScroller label="Weekly check of the plan" className="mt-3">
        <table className="w-full min-w-[34rem] text-sm">
          <caption className="sr-only">Weekly check of the plan</caption>
          <thead className="bg-ink-900/5 text-ink-700">
            <tr>
              <th scope="col" className={th}>
                Week
              </th>
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
                Moved?
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-ink-900/10">
            {active.before.map((b) => (
              <tr key={`before-${b.fromM}`} className="text-ink-600">
                <th scope="row" className={`${td} text-left font-normal whitespace-nowrap`}>
                  Before
                </th>
                <td className={td}>{bandLabel(b, units)}</td>
                <td className={td}>{b.attempts}</td>
                <td className={`${td} whitespace-nowrap`}>{rateWithRange(b.rate, b.ci95)}</td>
                <td className={td}>—</td>
              </tr>
            ))}
            {active.weeks.flatMap((w) =>
              w.bands.map((b) => (
                <tr key={`${w.week}-${b.fromM}`}>
                  <th scope="row" className={`${td} text-left whitespace-nowrap`}>
                    Week {w.week} <span className="block text-xs font-normal text-ink-500">{formatDate(w.from)}</span>
                  </th>
                  <td className={td}>{bandLabel(b, units)}</td>
                  <td className={td}>{b.attempts}</td>
                  <td className={`${td} whitespace-nowrap`}>{rateWithRange(b.rate, b.ci95)}</td>
                  <td
                    className={`${td} ${b.move === "better" ? "font-semibold text-ok-800" : b.move === "worse" ? "font-semibold text-bad-800" : ""}`}
                  >
                    {MOVE_TEXT[b.move]}
                  </td>
                </tr>
              )),
            )}
          </tbody>
        </table>
      </TableScroller>
    </Card>
  );
}
