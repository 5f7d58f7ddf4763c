import { expect, test } from "vitest";
import { fromSorting, historyTab, pageCount, puttParams, sessionParams, switchTab, toSorting, withChanges } from "./table-query";

const q = (s: string) => new URLSearchParams(s);

test("the sessions table reads sort, page, dates and green from the URL, with safe defaults", () => {
  expect(sessionParams(q(""))).toEqual({ page: 1, pageSize: 20, sort: "-date" });
  const green = "6f1c2b8e-3d4a-4b5c-9d6e-7f8a9b0c1d2e";
  expect(sessionParams(q(`sort=makeRate&page=3&from=2024-05-01&to=2024-05-31&green=${green}`))).toEqual({
    page: 3,
    pageSize: 20,
    sort: "makeRate",
    from: "2024-05-01",
    to: "2024-05-31",
    greenId: green,
  });
  // Nonsense is dropped rather than sent to the server as a 400.
  expect(sessionParams(q("sort=colour&page=-2&from=yesterday&green=7"))).toEqual({ page: 1, pageSize: 20, sort: "-date" });
  expect(sessionParams(q("from=2024-06-01&to=2024-05-01"))).toMatchObject({ from: "2024-06-01" });
  expect(sessionParams(q("from=2024-06-01&to=2024-05-01"))).not.toHaveProperty("to");
});

test("the putts table reads holed, break type and a distance range in metres", () => {
  expect(puttParams(q("tab=putts&holed=false&break=uphill&minM=1&maxM=3&sort=distance"))).toEqual({
    page: 1,
    pageSize: 25,
    sort: "distance",
    holed: "false",
    breakType: "uphill",
    minM: 1,
    maxM: 3,
  });
  expect(puttParams(q("minM=4&maxM=2"))).toMatchObject({ minM: 2, maxM: 4 });
  expect(puttParams(q("holed=maybe&break=sideways&minM=x"))).toEqual({ page: 1, pageSize: 25, sort: "-date" });
  expect(historyTab(q("tab=putts"))).toBe("putts");
  expect(historyTab(q("tab=other"))).toBe("sessions");
});

test("changing a filter or the sort goes back to page 1; changing the page does not", () => {
  const start = q("tab=putts&page=4&holed=true");
  expect(withChanges(start, { page: 5 }).toString()).toBe("tab=putts&page=5&holed=true");
  expect(withChanges(start, { holed: undefined }).toString()).toBe("tab=putts");
  expect(withChanges(start, { sort: "-distance" }).get("page")).toBeNull();
  expect(switchTab(q("tab=putts&from=2024-05-01&holed=true&page=2"), "sessions").toString()).toBe("from=2024-05-01");
});

test("sort strings and TanStack sorting state convert both ways", () => {
  expect(toSorting("-makeRate")).toEqual([{ id: "makeRate", desc: true }]);
  expect(fromSorting([{ id: "distance", desc: false }], "-date")).toBe("distance");
  expect(fromSorting([], "-date")).toBe("-date");
  expect(pageCount(0, 20)).toBe(1);
  expect(pageCount(41, 20)).toBe(3);
});
