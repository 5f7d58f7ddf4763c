// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { FinishesPicture, finishesFrame } from "./finishes-picture";
import { fakeFinishes } from "./test-data";

afterEach(cleanup);

test("one dot for each of the 100 finishes, the holed ones marked apart from the misses", () => {
  const { finishes, finishHoled } = fakeFinishes(34);
  const { container } = render(<FinishesPicture finishes={finishes} finishHoled={finishHoled} distanceM={3} units="metric" />);
  expect(container.querySelectorAll("[data-finish]")).toHaveLength(100);
  expect(container.querySelectorAll('[data-finish="holed"]')).toHaveLength(34);
  // Every fifth miss was put 1.3 m out: beyond the 1 m circle, drawn as a ring.
  expect(container.querySelectorAll('[data-finish="far"]')).toHaveLength(14);
  expect(container.querySelectorAll('[data-finish="near"]')).toHaveLength(52);
  expect(screen.getByText("In the hole: 34", { exact: false })).toBeInTheDocument();
  expect(screen.getByRole("img", { name: "Where 100 simulated putts finish" })).toHaveAccessibleDescription(
    "100 simulated putts: 34 holed, 52 finish within 1 m of the hole, 14 leave more than 1 m.",
  );
});

test("every putt holed still draws 100 dots, all in the tray", () => {
  const { finishes, finishHoled } = fakeFinishes(100);
  const { container } = render(<FinishesPicture finishes={finishes} finishHoled={finishHoled} distanceM={3} units="imperial" />);
  expect(container.querySelectorAll('[data-finish="holed"]')).toHaveLength(100);
  expect(container.querySelectorAll('[data-finish="near"], [data-finish="far"]')).toHaveLength(0);
});

test("the picture keeps one scale both ways and every miss inside it", () => {
  const finishes: [number, number][] = [
    [2.5, 3],
    [-0.2, 0.8],
  ];
  const { k, toX, toY } = finishesFrame(finishes, [false, false], 3);
  // x grows to the golfer's right, y toward the hole is up the picture.
  expect(toX(1) - toX(0)).toBeCloseTo(k, 9);
  expect(toY(3) - toY(4)).toBeCloseTo(k, 9);
  for (const [x, y] of finishes) {
    expect(toX(x)).toBeGreaterThanOrEqual(0);
    expect(toX(x)).toBeLessThanOrEqual(320);
    expect(toY(y)).toBeGreaterThanOrEqual(0);
    expect(toY(y)).toBeLessThanOrEqual(250);
  }
});
