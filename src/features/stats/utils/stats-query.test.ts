import { expect, test } from "vitest";
import { addDays, statsView } from "./stats-query";

const q = (s: string) => new URLSearchParams(s);

test("without a query: practice putts, default bands, weekly trend, the last four weeks against the four before", () => {
  const v = statsView(q(""), "2024-06-30");
  expect(v.stats).toEqual({ source: "practice" });
  expect(v.edgesM).toBeNull();
  expect(v.trend).toEqual({ source: "practice", window: "week" });
  expect(v.compare).toEqual({ aFrom: "2024-05-06", aTo: "2024-06-02", bFrom: "2024-06-03", bTo: "2024-06-30", source: "practice" });
  // The periods do not overlap and are 28 days each.
  expect(addDays(v.compare.aTo, 1)).toBe(v.compare.bFrom);
  expect(addDays(v.compare.aFrom, 27)).toBe(v.compare.aTo);
});

test("the query chooses period, source, bands, a rolling window and the trend's bands", () => {
  const v = statsView(q("from=2024-05-01&to=2024-05-31&src=all&bands=1,2,3&win=rolling&ww=6&tb=0,2"), "2024-06-30");
  expect(v.stats).toEqual({ from: "2024-05-01", to: "2024-05-31", bands: "1,2,3", source: "all" });
  expect(v.trend).toMatchObject({ window: "rolling", windowWeeks: 6 });
  expect(v.trendBands).toEqual([0, 2]);
  expect(v.compare.bands).toBe("1,2,3");
});

test("a reversed range is put the right way round and nonsense falls back to defaults", () => {
  const v = statsView(q("from=2024-05-31&to=2024-05-01&src=dreams&bands=3,1&ww=40&win=rolling"), "2024-06-30");
  expect(v.stats).toEqual({ from: "2024-05-01", to: "2024-05-31", source: "practice" });
  expect(v.trend).toMatchObject({ windowWeeks: 4 });
});
