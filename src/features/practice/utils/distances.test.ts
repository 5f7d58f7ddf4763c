import { expect, test } from "vitest";
import { METRES_PER_FOOT, METRES_PER_INCH } from "#shared/units";
import { distanceLabel, missLabel, samePick, stepDistanceM, stepMissM } from "./distances";

test("the stepper moves a whole foot, or a quarter metre, and stays on its grid", () => {
  expect(stepDistanceM(8 * METRES_PER_FOOT, 1, "imperial") / METRES_PER_FOOT).toBeCloseTo(9, 12);
  expect(stepDistanceM(8 * METRES_PER_FOOT, -1, "imperial") / METRES_PER_FOOT).toBeCloseTo(7, 12);
  let m = 1;
  for (let i = 0; i < 7; i++) m = stepDistanceM(m, 1, "metric");
  expect(m).toBe(2.75);
  expect(distanceLabel(m, "metric")).toBe("2.75 m");
});

test("the stepper stops at the shortest and longest putt the log accepts", () => {
  expect(stepDistanceM(1 * METRES_PER_FOOT, -1, "imperial") / METRES_PER_FOOT).toBeCloseTo(1, 12);
  expect(stepDistanceM(0.25, -1, "metric")).toBe(0.25);
  expect(stepDistanceM(60, 1, "metric")).toBe(60);
  expect(stepDistanceM(196 * METRES_PER_FOOT, 1, "imperial")).toBeLessThanOrEqual(60);
});

test("a miss steps by 2 in or 5 cm and never reaches zero", () => {
  expect(stepMissM(12 * METRES_PER_INCH, 1, "imperial") / METRES_PER_INCH).toBeCloseTo(14, 9);
  expect(stepMissM(0.05, -1, "metric")).toBeCloseTo(0.05, 12);
  expect(missLabel(0.3, "metric")).toBe("30 cm");
  expect(missLabel(24 * METRES_PER_INCH, "imperial")).toBe("24 in");
});

test("a pick matches the stored distance in the user's unit", () => {
  expect(samePick(10 * METRES_PER_FOOT, 3.048, "imperial")).toBe(true);
  expect(samePick(1.5, 1.25, "metric")).toBe(false);
});
