// The chart palette against WCAG 2.1 (W3C, Web Content Accessibility Guidelines 2.1, 2018; docs/sources.md,
// "Readable charts"): text at least 4.5:1 on every background it is drawn on (SC 1.4.3), lines, points and bars at
// least 3:1 (SC 1.4.11), and no two series told apart by colour alone. Contrast is computed by culori, a
// general-purpose colour library, not by our code.
import { wcagContrast } from "culori";
import { expect, test } from "vitest";
import { CHART_BACKGROUNDS, GRAPHIC_PAIRS, SERIES, TEXT_PAIRS } from "./chart-palette";

test("every chart text colour is at least 4.5:1 on every background it is drawn on", () => {
  expect(TEXT_PAIRS.length).toBeGreaterThanOrEqual(4);
  for (const p of TEXT_PAIRS) expect(wcagContrast(p.text, p.background), p.what).toBeGreaterThanOrEqual(4.5);
});

test("every line, point and bar colour is at least 3:1 on every chart background", () => {
  for (const p of GRAPHIC_PAIRS) expect(wcagContrast(p.colour, p.background), `${p.colour} on ${p.background}`).toBeGreaterThanOrEqual(3);
});

test("no two series share a shape or a bar pattern, so none is told apart by colour alone", () => {
  expect(new Set(SERIES.map((s) => s.shape)).size).toBe(SERIES.length);
  expect(new Set(SERIES.map((s) => s.pattern)).size).toBe(SERIES.length);
  expect(new Set(SERIES.map((s) => s.colour)).size).toBe(SERIES.length);
});

test("the check itself: culori gives the textbook extremes (black on white 21:1, a colour on itself 1:1)", () => {
  expect(wcagContrast("#000000", CHART_BACKGROUNDS.white)).toBeCloseTo(21, 5);
  expect(wcagContrast(CHART_BACKGROUNDS.paper, CHART_BACKGROUNDS.paper)).toBeCloseTo(1, 5);
});
