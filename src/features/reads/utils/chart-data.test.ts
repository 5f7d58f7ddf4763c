import { expect, test } from "vitest";
import { feetToMetres } from "#shared/units";
import {
  CHART_DIRECTIONS_DEG,
  cannotStopCount,
  cellText,
  chartDistancesM,
  seriesKey,
  toChartSeries,
  toChartTable,
  type BreakChartAnswer,
} from "./chart-data";

const answer: BreakChartAnswer = {
  distances: [feetToMetres(3), feetToMetres(6)],
  fallLineDegs: [0, 90, 270],
  canStop: true,
  cells: [
    [
      {
        ok: true,
        aimGiven: "offset",
        distanceM: feetToMetres(3),
        fallLineDeg: 0,
        aimOffsetM: 0.001,
        startLineDeg: 0,
        launchSpeedMps: 1,
        entrySpeedMps: 0.6,
      },
      {
        ok: true,
        aimGiven: "offset",
        distanceM: feetToMetres(3),
        fallLineDeg: 90,
        aimOffsetM: -0.0762,
        startLineDeg: -4,
        launchSpeedMps: 1.2,
        entrySpeedMps: 0.6,
      },
      {
        ok: true,
        aimGiven: "offset",
        distanceM: feetToMetres(3),
        fallLineDeg: 270,
        aimOffsetM: 0.0762,
        startLineDeg: 4,
        launchSpeedMps: 1.2,
        entrySpeedMps: 0.6,
      },
    ],
    [
      {
        ok: true,
        aimGiven: "offset",
        distanceM: feetToMetres(6),
        fallLineDeg: 0,
        aimOffsetM: 0,
        startLineDeg: 0,
        launchSpeedMps: 1.4,
        entrySpeedMps: 0.6,
      },
      {
        ok: true,
        aimGiven: "offset",
        distanceM: feetToMetres(6),
        fallLineDeg: 90,
        aimOffsetM: -0.2794,
        startLineDeg: -6,
        launchSpeedMps: 1.6,
        entrySpeedMps: 0.6,
      },
      { ok: false, distanceM: feetToMetres(6), fallLineDeg: 270, reason: "cannot-stop" },
    ],
  ],
};

test("the chart asks for 3–30 ft every 3 ft in feet, 1–10 m in metres, every 30°", () => {
  const ft = chartDistancesM("imperial");
  expect(ft).toHaveLength(10);
  expect(ft[0]).toBeCloseTo(0.9144, 12);
  expect(ft[9]).toBeCloseTo(9.144, 12);
  expect(chartDistancesM("metric")).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  expect(CHART_DIRECTIONS_DEG).toHaveLength(12);
  expect(CHART_DIRECTIONS_DEG.every((d, i) => d === i * 30)).toBe(true);
  expect(ft.length * CHART_DIRECTIONS_DEG.length).toBeLessThanOrEqual(400);
});

test("cells read as offset, unit and side, with 'centre' for a straight putt and 'won't stop' marked", () => {
  expect(cellText(answer.cells[0]![1]!, "imperial")).toBe("3 in left");
  expect(cellText(answer.cells[0]![2]!, "imperial")).toBe("3 in right");
  expect(cellText(answer.cells[1]![1]!, "imperial")).toBe("11 in left");
  expect(cellText(answer.cells[1]![1]!, "metric")).toBe("28 cm left");
  expect(cellText(answer.cells[0]![0]!, "metric")).toBe("centre");
  expect(cellText(answer.cells[1]![2]!, "metric")).toBe("won't stop");
  expect(cellText({ ...answer.cells[0]![1]!, ok: true, aimOffsetM: -0.0635 } as never, "imperial")).toBe("2.5 in left");
});

test("the table has a row per distance and a column per direction, headed in plain words", () => {
  const t = toChartTable(answer, "imperial");
  expect(t.rows.map((r) => r.heading)).toEqual(["3 ft", "6 ft"]);
  expect(t.columns.map((c) => c.main)).toEqual(["Downhill", "Falls right", "Falls left"]);
  expect(t.rows[1]!.cells.map((c) => c.side)).toEqual(["centre", "left", "none"]);
  expect(t.rows[1]!.cells[2]!.ok).toBe(false);
  expect(t.rows.every((r) => r.cells.length === 3)).toBe(true);
});

test("series give signed offsets in the user's short unit against distance in the long unit, null where it won't stop", () => {
  const s = toChartSeries(answer, "imperial", [90, 270]);
  expect(s).toEqual([
    { distance: 3, [seriesKey(90)]: -3, [seriesKey(270)]: 3 },
    { distance: 6, [seriesKey(90)]: -11, [seriesKey(270)]: null },
  ]);
  const m = toChartSeries(answer, "metric", [90]);
  expect(m[1]!.distance).toBeCloseTo(1.83, 2);
  expect(m[1]![seriesKey(90)]).toBeCloseTo(-27.94, 2);
});

test("a direction the answer lacks gives nulls rather than someone else's numbers", () => {
  expect(toChartSeries(answer, "imperial", [180]).map((p) => p[seriesKey(180)])).toEqual([null, null]);
});

test("cannot-stop cells are counted", () => {
  expect(cannotStopCount(answer)).toBe(1);
});

test("a cell whose start line is wider than 60° shows the start line, never a huge offset (issue 13: was 1576 cm R)", () => {
  const wide = {
    ok: true as const,
    distanceM: 3,
    fallLineDeg: 30,
    aimOffsetM: null,
    aimGiven: "start-line" as const,
    startLineDeg: -100.8,
    launchSpeedMps: 1,
    entrySpeedMps: 0,
  };
  expect(cellText(wide, "metric")).toBe("start 101° left");
  expect(cellText({ ...wide, startLineDeg: 91 }, "imperial")).toBe("start 91° right");
});
