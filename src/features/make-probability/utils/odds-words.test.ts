import { expect, test } from "vitest";
import {
  basisWords,
  comparedPercents,
  makeHeadline,
  paceSpreadWords,
  percentWords,
  rangeWords,
  angleWords,
  samePace,
  sampleErrorWords,
} from "./odds-words";

test("a probability reads as a whole percentage, never a false 0 % or 100 %", () => {
  expect(percentWords(0.3412)).toBe("34 %");
  expect(percentWords(0.002)).toBe("under 1 %");
  expect(percentWords(0)).toBe("0 %");
  expect(percentWords(0.998)).toBe("over 99 %");
  expect(percentWords(1)).toBe("100 %");
});

test("the headline says how often you hole it", () => {
  expect(makeHeadline(0.34)).toBe("You hole this about 34 % of the time");
  expect(makeHeadline(0.001)).toBe("You hole this under 1 % of the time");
});

test("spreads and their ranges in degrees and in percent of the roll", () => {
  expect(angleWords(1.234)).toBe("1.2°");
  expect(paceSpreadWords(0.12)).toBe("12 %");
  expect(paceSpreadWords(0.045)).toBe("4.5 %");
  expect(rangeWords(0.5, 3.04, angleWords)).toBe("0.5–3.0°");
  expect(rangeWords(0.05, 0.3, paceSpreadWords)).toBe("5.0–30 %");
});

test("where the spread comes from: your putts, or the club-golfer values while few are logged", () => {
  expect(basisWords(212, false)).toBe("Based on 212 of your putts.");
  expect(basisWords(0, true)).toBe("No putts logged yet — using typical club-golfer values.");
  expect(basisWords(12, true)).toMatch(/^Few putts logged yet — using typical club-golfer values/);
  expect(basisWords(null, null)).toMatch(/request/);
});

test("the sampling error and the same-pace test", () => {
  expect(sampleErrorWords(0.0047, 10000)).toBe("10,000 simulated putts, give or take 0.5 %");
  expect(samePace(0.45, 0.455)).toBe(true);
  expect(samePace(0.45, 0.35)).toBe(false);
});

test("two close probabilities get a decimal so the better one shows", () => {
  expect(comparedPercents(0.3412, 0.3811)).toEqual(["34 %", "38 %"]);
  expect(comparedPercents(0.4012, 0.4038)).toEqual(["40.1 %", "40.4 %"]);
  expect(comparedPercents(0.4, 0.4)).toEqual(["40 %", "40 %"]);
});
