import { expect, test } from "vitest";
import { aimSpot, mapLayout, screenToGreen } from "./map-view";

// The saddle fixture's extent: 12 m × 12 m from the origin; and a map offset from the origin, wider than deep.
const square = { minX: 0, maxX: 12, minY: 0, maxY: 12 };
const offset = { minX: 5, maxX: 25, minY: -4, maxY: 6 };

test("the map keeps one scale both ways and puts north at the top", () => {
  const l = mapLayout(offset, 640, 20);
  expect(l.k).toBeCloseTo(30, 9);
  expect(l.height).toBe(340);
  expect([l.toX(5), l.toY(6)]).toEqual([20, 20]); // north-west corner, top left
  expect([l.toX(25), l.toY(-4)]).toEqual([620, 320]); // south-east corner, bottom right
});

test("a tap maps from screen pixels to metres on the green, whatever size the map is drawn at", () => {
  const l = mapLayout(square, 640, 28); // 584 units for 12 m
  // Drawn at 320 px wide (a phone), 100 px down the page and 30 px in.
  const rect = { left: 30, top: 100, width: 320, height: 320 };
  const px = (u: number) => (u * 320) / 640;
  // The centre of the drawn map is the centre of the green.
  expect(screenToGreen(30 + px(320), 100 + px(320), rect, l)).toEqual([6, 6]);
  // The inner top-left corner (inside the padding) is the north-west corner (0, 12).
  expect(screenToGreen(30 + px(28), 100 + px(28), rect, l)).toEqual([0, 12]);
  // A point 3 m east and 2 m north of the origin.
  const x = 30 + px(28 + 3 * l.k);
  const y = 100 + px(28 + (12 - 2) * l.k);
  expect(screenToGreen(x, y, rect, l)).toEqual([3, 2]);
});

test("a tap just outside the edge snaps onto it; one well off the map is nothing", () => {
  const l = mapLayout(square, 640, 28);
  const rect = { left: 0, top: 0, width: 640, height: l.height };
  expect(screenToGreen(22, 300, rect, l)?.[0]).toBe(0);
  expect(screenToGreen(1, 1, rect, l)).toBeNull();
  expect(screenToGreen(10, 10, { left: 0, top: 0, width: 0, height: 0 }, l)).toBeNull();
});

test("the aim spot lies the aim offset to the golfer's right of the hole", () => {
  // Putting north: the golfer's right is east.
  expect(aimSpot([2, 1], [2, 5], 0.3)).toEqual([2.3, 5]);
  // Putting east: the golfer's right is south; a negative offset is left, north.
  const p = aimSpot([0, 0], [4, 0], -0.25);
  expect(p[0]).toBeCloseTo(4, 9);
  expect(p[1]).toBeCloseTo(0.25, 9);
});
