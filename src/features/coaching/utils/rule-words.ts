// Pass rules, fail rules and rung outcomes in plain words, as coaches and players read them.
import type { LadderProgress } from "#shared/ladder-engine";
import type { AssignmentStatus } from "#shared/schemas/assignments";
import { unknownRule, type FailRule, type PassRule } from "#shared/schemas/ladders";
import type { BreakType } from "#shared/schemas/putts";
import { formatLength, type UnitSystem } from "#shared/units";

type RungLike = { distanceM: number; balls: number; passRule: PassRule };

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** "Hole 3 of 5" or "Hole 3 in a row (5 balls)": the rule without the distance. */
export function passRuleWords(rule: PassRule, balls: number): string {
  switch (rule.kind) {
    case "make":
      return `Hole ${rule.made} of ${balls}`;
    case "in-a-row":
      return `Hole ${rule.count} in a row (${plural(balls, "ball")})`;
    default:
      return unknownRule(rule);
  }
}

/** The whole rung in words: "Hole 3 of 5 from 6 ft", "Hole 4 in a row from 3 ft (4 balls)". */
export function rungInWords(rung: RungLike, units: UnitSystem): string {
  const from = `from ${formatLength(rung.distanceM, units)}`;
  const rule = rung.passRule;
  switch (rule.kind) {
    case "make":
      return `Hole ${rule.made} of ${rung.balls} ${from}`;
    case "in-a-row":
      return `Hole ${rule.count} in a row ${from} (${plural(rung.balls, "ball")})`;
    default:
      return unknownRule(rule);
  }
}

export const FAIL_RULE_WORDS: Record<FailRule, { label: string; description: string }> = {
  repeat: { label: "Repeat the rung", description: "A failed rung is played again from the same distance." },
  "drop-one": { label: "Drop one rung", description: "A failed rung sends the player down to the rung before it." },
  restart: { label: "Start again", description: "A failed rung sends the player back to the first rung." },
};

export const BREAK_TYPE_WORDS: Record<BreakType, string> = {
  uphill: "Uphill",
  downhill: "Downhill",
  "left-to-right": "Breaks left to right",
  "right-to-left": "Breaks right to left",
  straight: "Straight",
};

/** "3 rungs, 3 ft to 9 ft" */
export function ladderSpan(rungs: readonly { distanceM: number }[], units: UnitSystem): string {
  if (rungs.length === 0) return "No rungs yet";
  const ds = rungs.map((r) => r.distanceM);
  const lo = Math.min(...ds);
  const hi = Math.max(...ds);
  const span = lo === hi ? formatLength(lo, units) : `${formatLength(lo, units)} to ${formatLength(hi, units)}`;
  return `${plural(rungs.length, "rung")}, ${span}`;
}

export type Moment = { tone: "passed" | "failed" | "completed"; text: string };

/**
 * What the putt just played decided, for the big message on the run screen: "Rung passed — on to 7 ft",
 * "Missed the rung — back to 5 ft", or null when the rung is still open.
 */
export function momentWords(
  ladder: { failRule: FailRule; rungs: readonly { distanceM: number }[] },
  before: Pick<LadderProgress, "rungIndex" | "completed">,
  after: Pick<LadderProgress, "rungIndex" | "completed" | "lastResult">,
  units: UnitSystem,
): Moment | null {
  if (after.completed && !before.completed) return { tone: "completed", text: "Ladder completed — every rung passed" };
  const next = ladder.rungs[after.rungIndex];
  if (!next || after.lastResult === null) return null;
  const at = formatLength(next.distanceM, units);
  if (after.lastResult === "passed") return { tone: "passed", text: `Rung passed — on to ${at}` };
  if (after.rungIndex < before.rungIndex) {
    return {
      tone: "failed",
      text:
        after.rungIndex === 0 && ladder.failRule === "restart"
          ? `Missed the rung — start again from ${at}`
          : `Missed the rung — back to ${at}`,
    };
  }
  return { tone: "failed", text: `Missed the rung — go again from ${at}` };
}

export type StatusKey = "not-started" | "in-progress" | "completed" | "overdue";

export const STATUS_WORDS: Record<StatusKey, string> = {
  "not-started": "Not started",
  "in-progress": "In progress",
  completed: "Completed",
  overdue: "Overdue",
};

/** One status for a person to read: overdue outranks "not started" and "in progress". */
export function statusKey(status: AssignmentStatus, overdue: boolean): StatusKey {
  if (status === "completed") return "completed";
  if (overdue) return "overdue";
  return status === "assigned" ? "not-started" : "in-progress";
}
