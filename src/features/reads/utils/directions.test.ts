import { expect, test } from "vitest";
import { solveRead } from "#physics";
import { NAMED_DIRECTIONS, angleFromPoint, describeFallLine, directionHeading, fallLineValueText, normaliseDeg } from "./directions";

// What each named direction means is checked against the engine itself: "downhill" names must give a putt that
// plays shorter than it is (and "uphill" ones longer), "right" names must break left to right (aim left).
test("every named direction breaks and plays the way its name says", () => {
  for (const named of NAMED_DIRECTIONS) {
    const r = solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: named.deg, stimpFt: 10 });
    if (!r.ok) throw new Error(`cannot stop at ${named.deg}`);
    const name = named.label.toLowerCase();
    if (name.includes("right")) {
      expect(r.read.breaks, named.label).toBe("left-to-right");
      expect(r.read.aimOffsetM, named.label).toBeLessThan(0);
    } else if (name.includes("left")) {
      expect(r.read.breaks, named.label).toBe("right-to-left");
      expect(r.read.aimOffsetM, named.label).toBeGreaterThan(0);
    } else {
      expect(r.read.breaks, named.label).toBe("none");
    }
    if (name.includes("downhill")) expect(r.read.flatPuttLengthM, named.label).toBeLessThan(3);
    if (name.includes("uphill")) expect(r.read.flatPuttLengthM, named.label).toBeGreaterThan(3);
  }
});

test("45° is downhill falling right and 135° uphill falling right, in this frame", () => {
  expect(NAMED_DIRECTIONS.find((d) => d.deg === 45)?.label).toBe("Downhill, falls right");
  expect(NAMED_DIRECTIONS.find((d) => d.deg === 135)?.label).toBe("Uphill, falls right");
  expect(NAMED_DIRECTIONS.find((d) => d.deg === 315)?.label).toBe("Downhill, falls left");
});

test("the dial's spoken value names the direction and the degrees", () => {
  expect(fallLineValueText(90)).toBe("falls to the right, 90°");
  expect(fallLineValueText(0)).toBe("straight downhill, 0°");
  expect(fallLineValueText(180)).toBe("straight uphill, 180°");
  expect(fallLineValueText(200)).toBe("uphill, falls left, 200°");
  expect(describeFallLine(275)).toBe("falls to the left");
  expect(describeFallLine(-90)).toBe("falls to the left");
});

test("a point on screen gives the fall line clockwise from 'up' (away from the golfer)", () => {
  expect(angleFromPoint(0, -10)).toBe(0);
  expect(angleFromPoint(10, 0)).toBe(90);
  expect(angleFromPoint(0, 10)).toBe(180);
  expect(angleFromPoint(-10, 0)).toBe(270);
  expect(angleFromPoint(10, -10)).toBeCloseTo(45, 9);
});

test("angles wrap into [0, 360)", () => {
  expect(normaliseDeg(360)).toBe(0);
  expect(normaliseDeg(-45)).toBe(315);
  expect(normaliseDeg(725)).toBe(5);
});

test("chart headings put the stronger lean first", () => {
  expect(directionHeading(0)).toEqual({ main: "Downhill", minor: undefined });
  expect(directionHeading(30)).toEqual({ main: "Downhill", minor: "a little right" });
  expect(directionHeading(60)).toEqual({ main: "Falls right", minor: "a little downhill" });
  expect(directionHeading(90)).toEqual({ main: "Falls right", minor: undefined });
  expect(directionHeading(240)).toEqual({ main: "Falls left", minor: "a little uphill" });
});
