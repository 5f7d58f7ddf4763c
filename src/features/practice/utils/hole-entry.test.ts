import { expect, test } from "vitest";
import { formatStrokesGained, holeBody, nextHole } from "./hole-entry";

test("a hole's body follows the API's rules for no putt, one putt and more", () => {
  expect(holeBody({ firstPuttM: 5, putts: 0, leftAfterFirstM: 1 })).toEqual({ putts: 0 });
  expect(holeBody({ firstPuttM: 5, putts: 1, leftAfterFirstM: 1 })).toEqual({ firstPuttM: 5, putts: 1, leftAfterFirstM: null });
  expect(holeBody({ firstPuttM: 9, putts: 3, leftAfterFirstM: 1.5 })).toEqual({ firstPuttM: 9, putts: 3, leftAfterFirstM: 1.5 });
  expect(holeBody({ firstPuttM: 9, putts: 2, leftAfterFirstM: 0 })).toEqual({ firstPuttM: 9, putts: 2, leftAfterFirstM: null });
});

test("the next hole follows the last one entered, then fills gaps", () => {
  expect(nextHole([])).toBe(1);
  expect(nextHole([{ holeNumber: 1 }, { holeNumber: 2 }])).toBe(3);
  expect(nextHole([{ holeNumber: 1 }, { holeNumber: 18 }])).toBe(2);
  expect(nextHole(Array.from({ length: 18 }, (_, i) => ({ holeNumber: i + 1 })))).toBe(18);
});

test("strokes gained carries its sign and rounds a near-zero to 0.00", () => {
  expect(formatStrokesGained(0.4234)).toBe("+0.42");
  expect(formatStrokesGained(-1.3)).toBe("−1.30");
  expect(formatStrokesGained(-0.001)).toBe("0.00");
});
