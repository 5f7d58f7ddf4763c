import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { METRES_PER_FOOT } from "../units";
import { bandIndex, bandsFromEdges, DEFAULT_BAND_EDGES_M } from "./bands";

test("edges are inner boundaries: the first band starts at 0 and the last is open-ended", () => {
  expect(bandsFromEdges([1, 2, 3])).toEqual([
    { fromM: 0, toM: 1 },
    { fromM: 1, toM: 2 },
    { fromM: 2, toM: 3 },
    { fromM: 3, toM: null },
  ]);
  expect(bandsFromEdges([0, 1])).toEqual(bandsFromEdges([1]));
});

test("a band includes its lower edge and excludes its upper edge", () => {
  const edges = [0.6, 1.2, 1.8];
  expect(bandIndex(0.6, edges)).toBe(1);
  expect(bandIndex(0.5999999, edges)).toBe(0);
  expect(bandIndex(1.8, edges)).toBe(3);
  expect(bandIndex(59, edges)).toBe(3);
});

test("the default bands are 0-3 … 30+ ft and 0-1 … 10+ m", () => {
  const ft = bandsFromEdges(DEFAULT_BAND_EDGES_M.imperial).map((b) => [
    b.fromM / METRES_PER_FOOT,
    b.toM === null ? null : b.toM / METRES_PER_FOOT,
  ]);
  expect(ft.map(([a, b]) => [Math.round(a!), b === null || b === undefined ? null : Math.round(b)])).toEqual([
    [0, 3],
    [3, 6],
    [6, 10],
    [10, 15],
    [15, 20],
    [20, 30],
    [30, null],
  ]);
  expect(bandsFromEdges(DEFAULT_BAND_EDGES_M.metric).map((b) => [b.fromM, b.toM])).toEqual([
    [0, 1],
    [1, 2],
    [2, 3],
    [3, 5],
    [5, 7],
    [7, 10],
    [10, null],
  ]);
  // A 10 ft putt stored as 10 × 0.3048 m lands in 10-15 ft, not 6-10 ft.
  expect(bandIndex(10 * METRES_PER_FOOT, DEFAULT_BAND_EDGES_M.imperial)).toBe(3);
});

test("edges that are not strictly increasing or not positive are refused", () => {
  expect(() => bandsFromEdges([1, 1])).toThrow(RangeError);
  expect(() => bandsFromEdges([2, 1])).toThrow(RangeError);
  expect(() => bandsFromEdges([-1, 1])).toThrow(RangeError);
});

describe("band assignment properties", () => {
  const edgesArb = fc
    .uniqueArray(fc.double({ min: 0.05, max: 60, noNaN: true }), { minLength: 1, maxLength: 12 })
    .map((a) => [...a].sort((x, y) => x - y));

  test("every distance falls in exactly one band, the one whose bounds contain it", () => {
    fc.assert(
      fc.property(edgesArb, fc.double({ min: 0, max: 80, noNaN: true }), (edges, d) => {
        const bands = bandsFromEdges(edges);
        const containing = bands.filter((b) => d >= b.fromM && (b.toM === null || d < b.toM));
        return containing.length === 1 && bands.indexOf(containing[0]!) === bandIndex(d, edges);
      }),
    );
  });
});
