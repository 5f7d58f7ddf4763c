import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { initialProgress, replay, rungVerdict, step, type EngineLadder, type EngineRung, type LadderProgress } from "./ladder-engine";
import { FAIL_RULES, type FailRule, type PassRule } from "./schemas/ladders";

const rung = (balls: number, passRule: PassRule, distanceM = 1): EngineRung => ({ distanceM, balls, passRule });
const make = (made: number): PassRule => ({ kind: "make", made });
const inARow = (count: number): PassRule => ({ kind: "in-a-row", count });
const H = true;
const M = false;

// Generators: a valid rung (the rule never needs more balls than the rung has) and a ladder of them.
const rungArb = fc
  .integer({ min: 1, max: 8 })
  .chain((balls) =>
    fc
      .record({ kind: fc.constantFrom("make" as const, "in-a-row" as const), need: fc.integer({ min: 1, max: balls }) })
      .map(({ kind, need }) => rung(balls, kind === "make" ? make(need) : inARow(need))),
  );
const ladderArb = (failRule?: FailRule) =>
  fc.record({
    failRule: failRule ? fc.constant(failRule) : fc.constantFrom(...FAIL_RULES),
    rungs: fc.array(rungArb, { minLength: 1, maxLength: 6 }),
  }) as fc.Arbitrary<EngineLadder>;
const outcomesArb = fc.array(fc.boolean(), { maxLength: 120 });

/** The rule read straight off a full set of balls, without the engine's early decisions. */
function ruleSays(rule: PassRule, outcomes: boolean[]): boolean {
  if (rule.kind === "make") return outcomes.filter(Boolean).length >= rule.made;
  let run = 0;
  let best = 0;
  for (const o of outcomes) {
    run = o ? run + 1 : 0;
    best = Math.max(best, run);
  }
  return best >= rule.count;
}

/** Every way the remaining balls could go. */
function completions(prefix: boolean[], balls: number): boolean[][] {
  if (prefix.length === balls) return [prefix];
  return [...completions([...prefix, true], balls), ...completions([...prefix, false], balls)];
}

function states(ladder: EngineLadder, outcomes: boolean[]): LadderProgress[] {
  const all = [initialProgress(ladder)];
  for (const o of outcomes) all.push(step(ladder, all.at(-1)!, o));
  return all;
}

describe("step and replay (examples)", () => {
  const threeRungs: EngineLadder = { failRule: "drop-one", rungs: [rung(3, make(2), 1), rung(4, inARow(2), 2), rung(2, make(1), 3)] };

  test("a make rule passes as soon as enough are holed and moves up a rung", () => {
    const s = replay(threeRungs, [H, M, H]);
    expect(s).toMatchObject({ rungIndex: 1, ballsTaken: 0, holed: 0, lastResult: "passed", attempts: 1, puttsTaken: 3 });
    expect(s.history).toEqual([{ rungIndex: 0, ballsTaken: 3, holed: 2, result: "passed", nextRungIndex: 1 }]);
    expect(replay(threeRungs, [H, H]).rungIndex).toBe(1);
  });

  test("a make rule fails as soon as it can no longer be met, before the last ball", () => {
    // Two of three needed: after two misses one ball cannot make two.
    const s = replay(threeRungs, [M, M]);
    expect(s).toMatchObject({ rungIndex: 0, lastResult: "failed", ballsTaken: 0, ballsLeft: 3 });
    expect(s.history[0]).toMatchObject({ ballsTaken: 2, holed: 0, result: "failed" });
  });

  test("an in-a-row rule needs an unbroken run and fails when too few balls are left for one", () => {
    const onRung2 = [H, H];
    expect(replay(threeRungs, [...onRung2, H, M, H, H]).rungIndex).toBe(2);
    const failed = replay(threeRungs, [...onRung2, H, M, H, M]);
    expect(failed.history.at(-1)).toMatchObject({ rungIndex: 1, result: "failed", ballsTaken: 4, nextRungIndex: 0 });
    // After H, M, M on two-in-a-row from four, one ball cannot make a run of two.
    expect(replay(threeRungs, [...onRung2, H, M, M]).history.at(-1)).toMatchObject({ result: "failed", ballsTaken: 3 });
  });

  test("drop-one goes down one rung but never below the first", () => {
    expect(replay(threeRungs, [M, M]).rungIndex).toBe(0);
    expect(replay(threeRungs, [H, H, M, M, M]).rungIndex).toBe(0);
  });

  test("repeat stays on the rung; restart goes back to the first", () => {
    const rungs = [rung(1, make(1)), rung(1, make(1)), rung(1, make(1))];
    expect(replay({ failRule: "repeat", rungs }, [H, H, M]).rungIndex).toBe(2);
    expect(replay({ failRule: "restart", rungs }, [H, H, M]).rungIndex).toBe(0);
    expect(replay({ failRule: "drop-one", rungs }, [H, H, M]).rungIndex).toBe(1);
  });

  test("passing the top rung completes the ladder, and a completed ladder takes no more putts", () => {
    const s = replay(threeRungs, [H, H, H, H, H]);
    expect(s).toMatchObject({ completed: true, rungIndex: 2, ballsLeft: 0, attempts: 3, bestRungIndex: 2 });
    expect(step(threeRungs, s, M)).toBe(s);
  });

  test("bestRungIndex remembers the highest rung reached after dropping back", () => {
    const s = replay(threeRungs, [H, H, H, H, M, M]);
    expect(s.rungIndex).toBe(1);
    expect(s.bestRungIndex).toBe(2);
  });

  test("the verdict is open while the rule can still go either way", () => {
    expect(rungVerdict(make(3), 5, 2, 1, 1)).toBeNull();
    expect(rungVerdict(inARow(3), 5, 2, 0, 0)).toBeNull();
    expect(rungVerdict(inARow(3), 5, 3, 1, 0)).toBe("failed");
  });

  test("a ladder without rungs is refused", () => {
    expect(() => initialProgress({ failRule: "repeat", rungs: [] })).toThrow(RangeError);
  });
});

describe("ladder engine properties", () => {
  test("a rung is passed exactly when its rule, read off all its balls, says so", () => {
    fc.assert(
      fc.property(rungArb, fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }), (r, balls) => {
        const outcomes = balls.slice(0, r.balls);
        const s = replay({ failRule: "repeat", rungs: [r] }, outcomes);
        expect(s.history[0]?.result).toBe(ruleSays(r.passRule, outcomes) ? "passed" : "failed");
      }),
    );
  });

  test("a rung is decided at the first ball after which every way the rest could go gives the same verdict", () => {
    fc.assert(
      fc.property(rungArb, fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }), (r, balls) => {
        const outcomes = balls.slice(0, r.balls);
        const certainAfter = outcomes.findIndex((_, i) => {
          const verdicts = new Set(completions(outcomes.slice(0, i + 1), r.balls).map((c) => ruleSays(r.passRule, c)));
          return verdicts.size === 1;
        });
        const s = replay({ failRule: "repeat", rungs: [r] }, outcomes);
        expect(s.history[0]?.ballsTaken).toBe(certainAfter + 1);
      }),
    );
  });

  test("every decided attempt agrees with its rule on the balls it used", () => {
    fc.assert(
      fc.property(ladderArb(), outcomesArb, (ladder, outcomes) => {
        const s = replay(ladder, outcomes);
        let at = 0;
        for (const attempt of s.history) {
          const used = outcomes.slice(at, at + attempt.ballsTaken);
          at += attempt.ballsTaken;
          expect(used.filter(Boolean).length).toBe(attempt.holed);
          expect(ruleSays(ladder.rungs[attempt.rungIndex]!.passRule, used)).toBe(attempt.result === "passed");
        }
        expect(at + s.ballsTaken).toBe(s.puttsTaken);
      }),
    );
  });

  test("a restart ladder never skips a rung: the index only goes up by one or back to the first", () => {
    fc.assert(
      fc.property(ladderArb("restart"), outcomesArb, (ladder, outcomes) => {
        const all = states(ladder, outcomes);
        for (let i = 1; i < all.length; i++) {
          const from = all[i - 1]!.rungIndex;
          const to = all[i]!.rungIndex;
          expect(to === from || to === from + 1 || to === 0).toBe(true);
          if (to === from + 1) expect(all[i]!.lastResult).toBe("passed");
        }
      }),
    );
  });

  test("moves between rungs follow the fail rule: pass +1, repeat 0, drop-one -1 (not below the first), restart to the first", () => {
    fc.assert(
      fc.property(ladderArb(), outcomesArb, (ladder, outcomes) => {
        for (const a of replay(ladder, outcomes).history) {
          const top = a.rungIndex === ladder.rungs.length - 1;
          const expected =
            a.result === "passed"
              ? top
                ? a.rungIndex
                : a.rungIndex + 1
              : { repeat: a.rungIndex, "drop-one": Math.max(0, a.rungIndex - 1), restart: 0 }[ladder.failRule];
          expect(a.nextRungIndex).toBe(expected);
        }
      }),
    );
  });

  test("progress is the same whether putts arrive one by one or are replayed, in any split", () => {
    fc.assert(
      fc.property(ladderArb(), outcomesArb, fc.nat(), (ladder, outcomes, cut) => {
        const oneByOne = outcomes.reduce((s, o) => step(ladder, s, o), initialProgress(ladder));
        expect(replay(ladder, outcomes)).toEqual(oneByOne);
        const k = outcomes.length === 0 ? 0 : cut % (outcomes.length + 1);
        const resumed = outcomes.slice(k).reduce((s, o) => step(ladder, s, o), replay(ladder, outcomes.slice(0, k)));
        expect(resumed).toEqual(oneByOne);
      }),
    );
  });

  test("the rung index and the ball counts always stay within the ladder", () => {
    fc.assert(
      fc.property(ladderArb(), outcomesArb, (ladder, outcomes) => {
        for (const s of states(ladder, outcomes)) {
          expect(s.rungIndex).toBeGreaterThanOrEqual(0);
          expect(s.rungIndex).toBeLessThan(ladder.rungs.length);
          expect(s.bestRungIndex).toBeLessThan(ladder.rungs.length);
          const balls = ladder.rungs[s.rungIndex]!.balls;
          expect(s.ballsTaken).toBeLessThan(balls);
          expect(s.ballsTaken + s.ballsLeft).toBe(s.completed ? 0 : balls);
          expect(s.holed).toBeLessThanOrEqual(s.ballsTaken);
          expect(s.streak).toBeLessThanOrEqual(s.holed);
        }
      }),
    );
  });

  test("completed only after the last rung is passed, and then it stays completed", () => {
    fc.assert(
      fc.property(ladderArb(), outcomesArb, (ladder, outcomes) => {
        const all = states(ladder, outcomes);
        const last = ladder.rungs.length - 1;
        for (let i = 1; i < all.length; i++) {
          const s = all[i]!;
          if (!s.completed) continue;
          const finish = s.history.findIndex((a) => a.rungIndex === last && a.result === "passed");
          expect(finish).toBe(s.history.length - 1);
          expect(all.slice(i).every((t) => t.completed)).toBe(true);
        }
        const s = all.at(-1)!;
        expect(s.completed).toBe(s.history.some((a) => a.rungIndex === last && a.result === "passed"));
      }),
    );
  });

  test("holing every ball climbs a rung per attempt and completes in exactly the sum of what each rung needs", () => {
    fc.assert(
      fc.property(ladderArb(), (ladder) => {
        const need = ladder.rungs.reduce((n, r) => n + (r.passRule.kind === "make" ? r.passRule.made : r.passRule.count), 0);
        const before = replay(ladder, Array<boolean>(need - 1).fill(true));
        const after = replay(ladder, Array<boolean>(need).fill(true));
        expect(before.completed).toBe(false);
        expect(after.completed).toBe(true);
        expect(after.attempts).toBe(ladder.rungs.length);
      }),
    );
  });
});
