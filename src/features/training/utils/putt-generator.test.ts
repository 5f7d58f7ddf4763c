import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { TRAINING_LEVELS, TRAINING_LEVEL_IDS } from "#shared/training";
import { seededUniform } from "#shared/seeded-random";
import { generatePutt, roundPutt } from "./putt-generator";

test("the same seed gives the same putt (a fresh generator each time)", () => {
  expect(generatePutt("club", seededUniform(42))).toEqual(generatePutt("club", seededUniform(42)));
  expect(roundPutt("testing", 12345, 3)).toEqual(roundPutt("testing", 12345, 3));
});

test("different seeds and different putts of a round differ", () => {
  const seeds = new Set(Array.from({ length: 20 }, (_, i) => JSON.stringify(roundPutt("club", i, 0))));
  expect(seeds.size).toBeGreaterThan(15);
  const round = new Set(Array.from({ length: 10 }, (_, i) => JSON.stringify(roundPutt("club", 7, i))));
  expect(round.size).toBeGreaterThan(8);
});

test("the generator is a proper [0, 1) source", () => {
  const rng = seededUniform(1);
  let sum = 0;
  for (let i = 0; i < 10_000; i++) {
    const v = rng();
    expect(v).toBeGreaterThanOrEqual(0);
    expect(v).toBeLessThan(1);
    sum += v;
  }
  expect(sum / 10_000).toBeGreaterThan(0.48);
  expect(sum / 10_000).toBeLessThan(0.52);
});

describe("putts stay inside their level's ranges", () => {
  for (const level of TRAINING_LEVEL_IDS) {
    test(level, () => {
      const l = TRAINING_LEVELS[level];
      fc.assert(
        fc.property(fc.integer({ min: 0, max: 2 ** 31 }), fc.integer({ min: 0, max: 500 }), (seed, n) => {
          const p = roundPutt(level, seed, n);
          return (
            p.distanceM >= l.distanceM[0] &&
            p.distanceM <= l.distanceM[1] &&
            p.slopePct >= l.slopePct[0] &&
            p.slopePct <= l.slopePct[1] &&
            p.stimpFt >= l.stimpFt[0] &&
            p.stimpFt <= l.stimpFt[1] &&
            p.fallLineDeg >= 0 &&
            p.fallLineDeg < 360 &&
            p.fallLineDeg % 5 === 0
          );
        }),
      );
    });
  }
});

test("over many putts a level's whole range is used, ends included", () => {
  const rng = seededUniform(99);
  const ds = Array.from({ length: 3000 }, () => generatePutt("gentle", rng).distanceM);
  expect(Math.min(...ds)).toBe(1);
  expect(Math.max(...ds)).toBe(4);
});
