// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { breakChart } from "#physics";
import type { UnitSystem } from "#shared/units";
import { ringFallLineDegs, ringLengthsM } from "../utils/aim-ring";
import type { BreakChartAnswer } from "../utils/chart-data";
import { AimRingPicture } from "./aim-ring-picture";

afterEach(cleanup);

function modelAnswer(units: UnitSystem, slopePct = 2, stimpFt = 10): BreakChartAnswer {
  const c = breakChart({ slopePct, stimpFt, distancesM: ringLengthsM(units), fallLineDegs: ringFallLineDegs(), pace: { rollPastM: 0.45 } });
  return { distances: [...c.distancesM], fallLineDegs: [...c.fallLineDegs], canStop: c.canStop, cells: c.cells };
}

function draw(units: UnitSystem = "imperial") {
  render(<AimRingPicture answer={modelAnswer(units)} units={units} settingsWords="Slope 2 %, Stimp 10, finishing 18 in past" />);
  const svg = screen.getByRole("img", { name: /Aim spots all round the hole/ });
  const hole = svg.querySelector('[data-testid="hole"]')!;
  const holeX = Number(hole.getAttribute("cx"));
  const holeY = Number(hole.getAttribute("cy"));
  const spot = (ring: string, bearing: number) => {
    const c = svg.querySelector(`g[data-ring="${ring}"] circle[data-bearing="${bearing}"]`);
    if (!c) throw new Error(`no spot ${ring} ${bearing}`);
    return { x: Number(c.getAttribute("cx")), y: Number(c.getAttribute("cy")) };
  };
  return { svg, holeX, holeY, spot };
}

test("physics on the picture: a straight uphill putt's spot is on the line through the hole; across the slope it is uphill (higher on the plan)", () => {
  // docs/sources.md, Break: no break straight up or down the fall line; the aim spot is on the high side (derived).
  const { holeX, holeY, spot } = draw();
  for (const ring of ["3 ft", "10 ft", "20 ft"]) {
    const uphill = spot(ring, 180);
    expect(Math.abs(uphill.x - holeX)).toBeLessThan(1);
    expect(Math.abs(uphill.y - holeY)).toBeLessThan(1);
    for (const across of [90, 270]) {
      const s = spot(ring, across);
      // SVG y grows downward: uphill of the hole is a smaller y.
      expect(s.y).toBeLessThan(holeY - 3);
      expect(Math.abs(s.x - holeX)).toBeLessThan(1);
    }
  }
  // A 20 ft putt across the slope needs its spot further uphill than a 3 ft one.
  expect(spot("20 ft", 90).y).toBeLessThan(spot("3 ft", 90).y);
});

test("the picture is described for screen readers and its words are 12 px or larger, in dark ink", () => {
  const { svg } = draw("metric");
  expect(svg.querySelector("title")?.textContent).toBe("Aim spots all round the hole");
  expect(svg.querySelector("desc")?.textContent).toMatch(/uphill at the top.*Slope 2 %/);
  const texts = [...svg.querySelectorAll("text")];
  expect(texts.length).toBeGreaterThan(5);
  for (const t of texts) {
    expect(t.getAttribute("fill")).toBe("#131b2e");
  }
  // The viewBox is 360 wide; a 390 px phone leaves the card about 320 px, so 14 in the viewBox is 12.4 px or more
  // (the browser test measures the drawn type on a phone).
  for (const t of texts) expect(Number(t.getAttribute("font-size"))).toBeGreaterThanOrEqual(14);
  expect(svg.getAttribute("viewBox")).toBe("0 0 360 340");
  // Every length is named in the picture, in the user's units.
  for (const len of ["1 m", "2 m", "3 m", "5 m", "7 m"]) expect(texts.some((t) => t.textContent === len)).toBe(true);
});

test("picking the side a ball comes from shows that side's aims in words", async () => {
  draw();
  expect(screen.getByText(/Ball right \(across\) of the hole/)).toBeInTheDocument();
  await userEvent.click(screen.getByLabelText("Below (uphill putt)"));
  expect(screen.getByText(/Ball below \(uphill putt\) of the hole/)).toBeInTheDocument();
  // Straight uphill: no break (docs/sources.md, Break), so every length aims at the hole.
  expect(screen.getAllByText(/aim at the hole/)).toHaveLength(5);
  await userEvent.click(screen.getByLabelText("Left (across)"));
  // A ball left of the hole looks right across the slope; downhill is on its right, so it aims left (uphill).
  expect(screen.getAllByText(/left of the hole/).length).toBe(5);
});
