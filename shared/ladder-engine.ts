// The pass-rule engine: where a player stands on a ladder, as a pure fold over putt outcomes.
// No clock, no I/O; the server replays the stored putts of an assignment through `replay`.
import { unknownRule, type FailRule, type PassRule } from "./schemas/ladders";

export type EngineRung = { distanceM: number; balls: number; passRule: PassRule };
export type EngineLadder = { failRule: FailRule; rungs: readonly EngineRung[] };

export type RungVerdict = "passed" | "failed";

/** One finished attempt at a rung: what happened and where the player went next. */
export type RungAttempt = {
  rungIndex: number;
  ballsTaken: number;
  holed: number;
  result: RungVerdict;
  /** The rung the player stands on after this attempt (the same rung when the top rung is passed). */
  nextRungIndex: number;
};

export type LadderProgress = {
  /** The rung being played (0-based); after completion, the top rung. Always within the ladder. */
  rungIndex: number;
  /** Balls played, holed, and the current run of holed balls on the current attempt at this rung. */
  ballsTaken: number;
  holed: number;
  streak: number;
  /** Balls still to play on this attempt (0 once the ladder is completed). */
  ballsLeft: number;
  /** The verdict the latest putt decided, or null when it decided nothing (or no putt yet). */
  lastResult: RungVerdict | null;
  /** True once the top rung has been passed. */
  completed: boolean;
  /** Finished rung attempts (passed or failed). */
  attempts: number;
  puttsTaken: number;
  /** The highest rung the player has stood on. */
  bestRungIndex: number;
  history: RungAttempt[];
};

/** What a rung attempt has come to: decided as soon as no later ball can change it, else null. */
export function rungVerdict(rule: PassRule, balls: number, ballsTaken: number, holed: number, streak: number): RungVerdict | null {
  const left = balls - ballsTaken;
  switch (rule.kind) {
    case "make":
      if (holed >= rule.made) return "passed";
      if (holed + left < rule.made) return "failed";
      return null;
    case "in-a-row":
      if (streak >= rule.count) return "passed";
      // The longest run still possible continues the current one through every ball left.
      if (streak + left < rule.count) return "failed";
      return null;
    default:
      return unknownRule(rule);
  }
}

/** Where a failed attempt at `rungIndex` sends the player. */
export function rungAfterFail(failRule: FailRule, rungIndex: number): number {
  if (failRule === "repeat") return rungIndex;
  if (failRule === "drop-one") return Math.max(0, rungIndex - 1);
  return 0;
}

export function initialProgress(ladder: EngineLadder): LadderProgress {
  const first = ladder.rungs[0];
  if (!first) throw new RangeError("A ladder needs at least one rung");
  return {
    rungIndex: 0,
    ballsTaken: 0,
    holed: 0,
    streak: 0,
    ballsLeft: first.balls,
    lastResult: null,
    completed: false,
    attempts: 0,
    puttsTaken: 0,
    bestRungIndex: 0,
    history: [],
  };
}

/**
 * One putt: the progress after `holed`. A completed ladder takes no more putts: the state comes back
 * unchanged (the server answers 409 before it gets here).
 */
export function step(ladder: EngineLadder, state: LadderProgress, holed: boolean): LadderProgress {
  if (state.completed) return state;
  const rung = ladder.rungs[state.rungIndex];
  if (!rung) throw new RangeError(`Rung ${state.rungIndex} is outside a ladder of ${ladder.rungs.length} rungs`);
  const ballsTaken = state.ballsTaken + 1;
  const holedNow = state.holed + (holed ? 1 : 0);
  const streak = holed ? state.streak + 1 : 0;
  const puttsTaken = state.puttsTaken + 1;
  const verdict = rungVerdict(rung.passRule, rung.balls, ballsTaken, holedNow, streak);

  if (verdict === null) {
    return { ...state, ballsTaken, holed: holedNow, streak, ballsLeft: rung.balls - ballsTaken, lastResult: null, puttsTaken };
  }
  const top = state.rungIndex === ladder.rungs.length - 1;
  const completed = verdict === "passed" && top;
  const next = verdict === "passed" ? (top ? state.rungIndex : state.rungIndex + 1) : rungAfterFail(ladder.failRule, state.rungIndex);
  const attempt: RungAttempt = { rungIndex: state.rungIndex, ballsTaken, holed: holedNow, result: verdict, nextRungIndex: next };
  return {
    rungIndex: next,
    ballsTaken: 0,
    holed: 0,
    streak: 0,
    ballsLeft: completed ? 0 : ladder.rungs[next]!.balls,
    lastResult: verdict,
    completed,
    attempts: state.attempts + 1,
    puttsTaken,
    bestRungIndex: Math.max(state.bestRungIndex, next),
    history: [...state.history, attempt],
  };
}

/** The progress after every outcome in order: the fold of `step` from the start. */
export function replay(ladder: EngineLadder, outcomes: Iterable<boolean>): LadderProgress {
  let state = initialProgress(ladder);
  for (const holed of outcomes) state = step(ladder, state, holed);
  return state;
}
