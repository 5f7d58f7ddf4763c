// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { METRES_PER_FOOT } from "../../../shared/units";
import { PuttDiagram, diagramScale, scaleStep } from "./putt-diagram";

afterEach(cleanup);

test("across and along the putt share one scale, so a curve is drawn as it is", () => {
  const paths = [
    {
      points: [
        [0, 0],
        [-0.2, 1.5],
        [0, 3],
        [0.1, 3.4],
      ] as [number, number][],
    },
  ];
  const { k, toX, toY } = diagramScale(paths, 3, [{ xM: -0.27 }]);
  expect(toX(1) - toX(0)).toBeCloseTo(k, 9);
  expect(toY(0) - toY(1)).toBeCloseTo(k, 9);
  // The hole is above the ball, and right is to the right.
  expect(toY(3)).toBeLessThan(toY(0));
  expect(toX(0.1)).toBeGreaterThan(toX(0));
});

test("the scale bar is a round length in the user's units", () => {
  expect(scaleStep(0.7, "imperial")).toEqual({ m: 2 * METRES_PER_FOOT, label: "2 ft" });
  expect(scaleStep(0.7, "metric")).toEqual({ m: 0.5, label: "50 cm" });
  expect(scaleStep(0.01, "metric").label).toBe("5 cm");
});

test("it draws each line and aim spot, names itself, and labels lines in a legend", () => {
  const { container } = render(
    <PuttDiagram
      paths={[
        {
          points: [
            [0, 0],
            [-0.3, 1.5],
            [0, 3],
          ],
          style: "dying",
          label: "dying pace",
        },
        {
          points: [
            [0, 0],
            [-0.1, 1.5],
            [0, 3.5],
          ],
          style: "firm",
          label: "firm pace",
        },
      ]}
      holeDistanceM={3}
      aimSpots={[
        { xM: -0.4, style: "dying" },
        { xM: -0.15, style: "firm" },
      ]}
      fallLineDeg={90}
      units="metric"
      title="Two paces"
      description="The dying putt needs more borrow."
    />,
  );
  expect(screen.getByRole("img", { name: "Two paces" })).toHaveAccessibleDescription("The dying putt needs more borrow.");
  expect(container.querySelectorAll("polyline")).toHaveLength(2);
  expect(screen.getByText("dying pace")).toBeInTheDocument();
  expect(screen.getByText("firm pace")).toBeInTheDocument();
  // The "falls" cue turns with the fall line (clockwise from the hole direction).
  expect(container.querySelector('line[transform="rotate(90)"]')).not.toBeNull();
});
