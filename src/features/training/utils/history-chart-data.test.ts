import { expect, test } from "vitest";
import { historyChartData } from "./history-chart-data";

const at = (minute: number) => new Date(Date.UTC(2025, 4, 1, 10, minute)).toISOString();

test("rows run oldest first, numbered from 1, whatever order the server sent", () => {
  const rows = historyChartData([
    { id: "c", score: 70, createdAt: at(3) },
    { id: "a", score: 40, createdAt: at(1) },
    { id: "b", score: 55, createdAt: at(2) },
  ]);
  expect(rows.map((r) => [r.attempt, r.id, r.score])).toEqual([
    [1, "a", 40],
    [2, "b", 55],
    [3, "c", 70],
  ]);
});

test("the rolling mean covers the last few attempts, and fewer at the start", () => {
  const items = [10, 20, 30, 40, 50, 60].map((score, i) => ({ id: String(i), score, createdAt: at(i) }));
  const rows = historyChartData(items, 3);
  expect(rows.map((r) => r.rollingMean)).toEqual([10, 15, 20, 30, 40, 50]);
});

test("the rolling mean is rounded to one decimal", () => {
  const items = [100, 0, 0].map((score, i) => ({ id: String(i), score, createdAt: at(i) }));
  expect(historyChartData(items, 3).map((r) => r.rollingMean)).toEqual([100, 50, 33.3]);
});

test("no attempts give no rows", () => {
  expect(historyChartData([])).toEqual([]);
});
