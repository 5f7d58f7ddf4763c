import { expect, test } from "vitest";
import type { MissBand } from "#shared/schemas/stats";
import { missLean, strokesSummary } from "./strokes-summary";

const band = (fromM: number, toM: number | null, over: Partial<MissBand>): MissBand => ({
  fromM,
  toM,
  attempts: 20,
  made: 10,
  missed: 10,
  left: 0,
  right: 0,
  short: 0,
  long: 0,
  strokesGained: 0,
  leavesAssumed: 0,
  ...over,
});

test("names the band that loses the most strokes in total, how much, and which way its misses lean", () => {
  const lines = strokesSummary(
    [
      band(0, 1, { attempts: 40, made: 38, strokesGained: -0.4 }),
      band(1, 2, { attempts: 30, made: 12, missed: 18, strokesGained: -3.6, left: 3, right: 11, short: 12, long: 4 }),
      band(2, 3, { attempts: 25, made: 5, strokesGained: -1.5 }),
    ],
    "metric",
    "Ivo",
  )!;
  expect(lines[0]).toBe(
    "Ivo loses the most strokes from 1–2 m: 3.6 over 30 putts (0.12 a putt) against a tour player from the same spots, holing 40 %.",
  );
  expect(lines[1]).toBe("From there, most misses finish right (11 of 14 with a side logged) and short (12 of 16 with a leave logged).");
  expect(lines[2]).toBe("The best band is 0–1 m, where they lose only 0.01 a putt.");
});

test("thin bands are not singled out, and no putts at all gives no summary", () => {
  expect(strokesSummary([band(0, 1, { attempts: 9, strokesGained: -5 })], "metric")).toBeNull();
  const lines = strokesSummary(
    [band(0, 1, { attempts: 9, strokesGained: -5 }), band(1, 2, { attempts: 12, strokesGained: -1 })],
    "metric",
  )!;
  expect(lines[0]).toMatch(/^You lose the most strokes from 1–2 m/);
});

test("misses split evenly lean nowhere; a player ahead of the tour everywhere is told so", () => {
  expect(missLean(band(0, 1, { left: 5, right: 5, short: 3, long: 3 }))).toBeNull();
  const lines = strokesSummary([band(0, 1, { strokesGained: 0.5 }), band(1, 2, { strokesGained: 0.2 })], "metric")!;
  expect(lines[0]).toBe("You hold your own against the tour baseline in every band with 10 or more putts.");
});
