import { expect, test } from "vitest";
import { breakChart, breakVsPace } from "./index";

test("breakVsPace: the aim offset shrinks monotonically from dying to firm (slower balls break more)", () => {
  const r = breakVsPace({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 });
  if (!r.ok) throw new Error("must stop");
  const offsets = r.rows.map((row) => Math.abs(row.aimOffsetM!));
  for (let i = 1; i < offsets.length; i++) expect(offsets[i]!).toBeLessThan(offsets[i - 1]!);
  expect(r.rows[0]!.rollPastM).toBe(0);
});

test("breakChart: a 72-cell grid mirrors left and right and has no break up and down the fall line", () => {
  const fallLineDegs = [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330];
  const chart = breakChart({ slopePct: 2, stimpFt: 10, distancesM: [1, 2, 3, 5, 8, 12], fallLineDegs });
  expect(chart.cells.length * chart.cells[0]!.length).toBe(72);
  for (const row of chart.cells) {
    for (let j = 0; j < fallLineDegs.length; j++) {
      const cell = row[j]!;
      const mirror = row[(fallLineDegs.length - j) % fallLineDegs.length]!;
      if (!cell.ok || !mirror.ok) throw new Error("2 % at Stimp 10 must stop");
      expect(cell.aimOffsetM!).toBeCloseTo(-mirror.aimOffsetM!, 9);
      if (cell.fallLineDeg % 180 === 0) expect(cell.aimOffsetM!).toBe(0);
    }
  }
  expect(chart.diagnostics.integrations).toBeGreaterThan(72);
});

test("breakChart marks every cell cannot-stop on a green where the ball cannot stop (8 % at Stimp 10)", () => {
  const chart = breakChart({ slopePct: 8, stimpFt: 10, distancesM: [1, 3], fallLineDegs: [0, 90] });
  expect(chart.canStop).toBe(false);
  expect(chart.cells.flat().every((c) => !c.ok && c.reason === "cannot-stop")).toBe(true);
});
