import { expect, test } from "vitest";
import { makeProbability } from "#physics";
import { seededUniform } from "#shared/seeded-random";
import { simulateLiveOdds } from "./live-odds";

const read = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } };
const dispersion = { angleDeg: 1.2, pace: 0.12 };

test("the worker's estimate is physics' makeProbability on the shared seeded generator, the same for the same seed", () => {
  const a = simulateLiveOdds({ id: 1, read, dispersion, seed: 7 });
  const b = simulateLiveOdds({ id: 2, read, dispersion, seed: 7 });
  const direct = makeProbability({ ...read, dispersion, samples: 2000, random: seededUniform(7), secondPuttM: 1 });
  if (!a.ok || !b.ok || !direct.ok) throw new Error("a side-hill 3 m putt on 2 % at Stimp 10 has a read");
  expect(a.makeProbability).toBe(direct.result.makeProbability);
  expect(b.makeProbability).toBe(a.makeProbability);
  expect(a.finishes).toHaveLength(100);
  expect(a.finishHoled).toHaveLength(100);
  expect(a.id).toBe(1);
});

test("a ball that cannot stop is an answer with a message, not a throw", () => {
  const r = simulateLiveOdds({ id: 3, read: { ...read, slopePct: 8 }, dispersion, seed: 1 });
  expect(r.ok).toBe(false);
});
