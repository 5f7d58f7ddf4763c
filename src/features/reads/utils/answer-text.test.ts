import { expect, test } from "vitest";
import { HOLE_DIAMETER_M, inchesToMetres } from "#shared/units";
import { aOrAn, aimWords, formatAim, captureWords, cannotStopWords, paceWords } from "./answer-text";

test("an aim outside the hole is given from the edge, and from the centre in hole widths", () => {
  const aim = aimWords(-2.5 * HOLE_DIAMETER_M, -5.2, "imperial");
  // 2.5 widths = 10.625 in from centre; the edge is 2.125 in from centre: 8.5 in, said as 9.
  expect(aim.headline).toBe("Start it 9 in outside the left edge");
  expect(aim.detail).toBe("2.5 hole widths (11 in) left of centre");
  expect(aim.startLine).toBe("Start line 5.2° left of the straight line to the hole");
});

test("aims are rounded the way a golfer says them", () => {
  expect(formatAim(inchesToMetres(1.3), "imperial")).toBe("1.5 in");
  expect(formatAim(inchesToMetres(2.6), "imperial")).toBe("3 in");
  expect(formatAim(0.032, "metric")).toBe("3.2 cm");
  expect(formatAim(-0.274, "metric")).toBe("27 cm");
});

test("a big aim (a yard or a metre and more) is said in feet and inches or in metres, not as 129 in", () => {
  expect(formatAim(inchesToMetres(129), "imperial")).toBe("10 ft 9 in");
  expect(formatAim(inchesToMetres(35.4), "imperial")).toBe("35 in");
  // 35.6 in is said as 36 in, which is a yard.
  expect(formatAim(inchesToMetres(35.6), "imperial")).toBe("3 ft");
  expect(formatAim(-3.284, "metric")).toBe("3.28 m");
  expect(formatAim(0.994, "metric")).toBe("99 cm");
  expect(formatAim(0.996, "metric")).toBe("1.00 m");
  expect(aimWords(-inchesToMetres(131.125), -20, "imperial").headline).toBe("Start it 10 ft 9 in outside the left edge");
});

test("a small aim stays inside the hole, a tiny one is the centre", () => {
  expect(aimWords(inchesToMetres(1.5), 0.7, "metric").headline).toBe("Aim inside the right edge");
  expect(aimWords(0.002, 0.05, "metric").headline).toBe("Aim at the centre of the hole");
});

test("a very wide start line is given as an angle, not as a spot beside the hole", () => {
  expect(aimWords(-3, -65, "metric").headline).toBe("Start it 65° left of the hole");
});

test("a start line past 60° (89°, 91°, 120°) is given as the start line and a plain statement, never an offset", () => {
  for (const deg of [89, 91, 120]) {
    const w = aimWords(null, -deg, "metric");
    expect(w.headline).toBe(`Start it ${deg}° left of the hole`);
    expect(w.detail).toMatch(/start direction/);
    expect(w.headline + w.detail).not.toMatch(/cm|edge|centre/);
  }
  expect(aimWords(-1.7, -60, "metric").headline).toMatch(/outside the left edge/);
});

test("pace reads as the distance past and the flat putt needing the same stroke", () => {
  const p = paceWords(inchesToMetres(17), 3.3528, "imperial");
  expect(p.headline).toBe("Firm enough to finish 17 in past if it misses");
  expect(p.flatPutt).toBe("Hit it as hard as a flat 11 ft putt");
  expect(p.flatPutt).not.toMatch(/plays like/i);
  expect(paceWords(0, 3, "metric").headline).toMatch(/dying pace/);
});

test("capture says whether the hole holds the ball, in ft/s in feet-and-inches mode and m/s in metric", () => {
  const holds = { holed: true, outcome: "holed" as const, maxCaptureSpeedMps: 1.637, marginMps: 0.967 };
  // 0.67 m/s = 2.198 ft/s; 1.637 m/s = 5.371 ft/s (0.3048 m a foot).
  expect(captureWords(0.67, holds, "imperial")).toEqual({
    entry: "Still rolling at the hole (2.2 ft/s)",
    verdict: "The hole holds it, with room to roll it firmer (up to 5.4 ft/s drops)",
    tone: "ok",
  });
  expect(captureWords(0.67, holds, "metric").entry).toBe("Still rolling at the hole (0.67 m/s)");
  expect(captureWords(1.5, { ...holds, marginMps: 0.137 }, "imperial").verdict).toMatch(/^It drops, but only just/);
  const fast = captureWords(1.9, { holed: false, outcome: "lip-out", maxCaptureSpeedMps: 1.637, marginMps: -0.263 }, "imperial");
  expect(fast.tone).toBe("warn");
  expect(fast.verdict).toMatch(/^Too fast to drop/);
  expect(`${fast.entry} ${fast.verdict}`).not.toMatch(/m\/s/);
});

test("a ball stopped at the hole is said in words, never 0.00 m/s or speed to spare", () => {
  const dying = captureWords(0, { holed: true, outcome: "holed", maxCaptureSpeedMps: 1.637, marginMps: 1.637 }, "imperial");
  expect(dying.entry).toBe("Just reaches the hole and topples in");
  expect(`${dying.entry} ${dying.verdict}`).not.toMatch(/\d|spare/);
});

test("the cannot-stop answer names the slope, the Stimp and the steepest stoppable slope", () => {
  expect(cannotStopWords(8, 10, 7.86)).toBe("On an 8 % slope at Stimp 10 the ball would not stop — the steepest it stops on is 7.9 %.");
  expect(cannotStopWords(6.5, 13, undefined)).toBe("On a 6.5 % slope at Stimp 13 the ball would not stop.");
});

test("articles follow how numbers are said", () => {
  expect(aOrAn("8 ft")).toBe("an");
  expect(aOrAn("11 ft 3 in")).toBe("an");
  expect(aOrAn("18 ft")).toBe("an");
  expect(aOrAn("10 ft")).toBe("a");
  expect(aOrAn("110 ft")).toBe("a");
  expect(aOrAn("1.83 m")).toBe("a");
});
