import { expect, test } from "vitest";
import { initialProgress, step } from "#shared/ladder-engine";
import { feetToMetres } from "#shared/units";
import { ladderSpan, momentWords, passRuleWords, rungInWords, statusKey } from "./rule-words";

const ft = feetToMetres;

test("a make-k-of-n rung reads as the brief's example", () => {
  expect(rungInWords({ distanceM: ft(6), balls: 5, passRule: { kind: "make", made: 3 } }, "imperial")).toBe("Hole 3 of 5 from 6 ft");
});

test("an in-a-row rung names the run and the balls it may take", () => {
  expect(rungInWords({ distanceM: 0.9, balls: 4, passRule: { kind: "in-a-row", count: 4 } }, "metric")).toBe(
    "Hole 4 in a row from 0.90 m (4 balls)",
  );
  expect(passRuleWords({ kind: "in-a-row", count: 1 }, 1)).toBe("Hole 1 in a row (1 ball)");
});

test("distances that are not whole feet keep their inches", () => {
  expect(rungInWords({ distanceM: ft(7.5), balls: 8, passRule: { kind: "make", made: 1 } }, "imperial")).toBe("Hole 1 of 8 from 7 ft 6 in");
});

test("a ladder's span gives the number of rungs and the shortest and longest", () => {
  expect(ladderSpan([{ distanceM: ft(3) }, { distanceM: ft(9) }, { distanceM: ft(6) }], "imperial")).toBe("3 rungs, 3 ft to 9 ft");
  expect(ladderSpan([{ distanceM: 2 }], "metric")).toBe("1 rung, 2.00 m");
});

const ladder = (failRule: "repeat" | "drop-one" | "restart") => ({
  failRule,
  rungs: [
    { distanceM: ft(3), balls: 2, passRule: { kind: "make" as const, made: 2 } },
    { distanceM: ft(5), balls: 2, passRule: { kind: "make" as const, made: 2 } },
    { distanceM: ft(7), balls: 2, passRule: { kind: "make" as const, made: 2 } },
  ],
});

function after(l: ReturnType<typeof ladder>, outcomes: boolean[]) {
  let s = initialProgress(l);
  let before = s;
  for (const o of outcomes) {
    before = s;
    s = step(l, s, o);
  }
  return { before, s };
}

test("passing a rung says where the player goes next", () => {
  const l = ladder("drop-one");
  const { before, s } = after(l, [true, true]);
  expect(momentWords(l, before, s, "imperial")).toEqual({ tone: "passed", text: "Rung passed — on to 5 ft" });
});

test("failing a rung applies the ladder's rule in the words", () => {
  const drop = ladder("drop-one");
  const r1 = after(drop, [true, true, false]);
  expect(momentWords(drop, r1.before, r1.s, "imperial")).toEqual({ tone: "failed", text: "Missed the rung — back to 3 ft" });

  const repeat = ladder("repeat");
  const r2 = after(repeat, [true, true, false]);
  expect(momentWords(repeat, r2.before, r2.s, "imperial")?.text).toBe("Missed the rung — go again from 5 ft");

  const restart = ladder("restart");
  const r3 = after(restart, [true, true, true, true, true, false]);
  expect(momentWords(restart, r3.before, r3.s, "imperial")?.text).toBe("Missed the rung — start again from 3 ft");
});

test("a putt that decides nothing has no moment; the top rung passed completes the ladder", () => {
  const l = ladder("repeat");
  const open = after(l, [true]);
  expect(momentWords(l, open.before, open.s, "imperial")).toBeNull();
  const done = after(l, [true, true, true, true, true, true]);
  expect(momentWords(l, done.before, done.s, "imperial")?.tone).toBe("completed");
});

test("overdue outranks not started and in progress, never completed", () => {
  expect(statusKey("assigned", true)).toBe("overdue");
  expect(statusKey("in-progress", false)).toBe("in-progress");
  expect(statusKey("completed", true)).toBe("completed");
  expect(statusKey("assigned", false)).toBe("not-started");
});
