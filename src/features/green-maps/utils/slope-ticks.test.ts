import { expect, test } from "vitest";
import { surfaceFromGrid } from "#physics";
import { SLOPE_BANDS, slopeBand, slopeTicks } from "./slope-ticks";

const bounds = { minX: 0, maxX: 8, minY: 0, maxY: 8 };

/** A 9 × 9 grid 1 m apart; heights from a function of (x, y), rows by y. */
function grid(h: (x: number, y: number) => number) {
  return surfaceFromGrid({
    spacingM: 1,
    originM: [0, 0],
    heightsM: Array.from({ length: 9 }, (_, r) => Array.from({ length: 9 }, (_, c) => h(c, r))),
  });
}

const length = (t: { from: [number, number]; to: [number, number] }) => Math.hypot(t.to[0] - t.from[0], t.to[1] - t.from[1]);

test("on a plane falling to the east at 2 %, every tick points east, from high to low, in the 2–3 % band", () => {
  const ticks = slopeTicks(
    grid((x) => -0.02 * x),
    bounds,
  );
  expect(ticks.length).toBeGreaterThan(20);
  for (const t of ticks) {
    expect(t.to[0]).toBeGreaterThan(t.from[0]);
    expect(t.to[1]).toBeCloseTo(t.from[1], 9);
    expect(t.slopePct).toBeCloseTo(2, 6);
    expect(SLOPE_BANDS[t.band]!.label).toBe("2–3 %");
  }
});

test("ticks are all one length whatever the steepness: steepness is in the colour, not the length", () => {
  // Ground that steepens to the north: 0.5 % at the south edge up to about 4 % at the north.
  const ticks = slopeTicks(
    grid((x, y) => -0.005 * x - 0.0022 * y * y),
    bounds,
  );
  const lengths = ticks.map(length);
  expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThan(1e-9);
  const bands = new Set(ticks.map((t) => t.band));
  expect(bands.size).toBeGreaterThanOrEqual(3);
});

test("a flat green gets no ticks; slope bands split at 1, 2 and 3 %", () => {
  expect(
    slopeTicks(
      grid(() => 0.3),
      bounds,
    ),
  ).toEqual([]);
  expect([0.4, 0.99, 1, 1.99, 2, 2.99, 3, 7].map(slopeBand)).toEqual([0, 0, 1, 1, 2, 2, 3, 3]);
});
