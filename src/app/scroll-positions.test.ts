// @vitest-environment jsdom
import { afterEach, expect, test, vi } from "vitest";
import { SCROLL_POSITIONS_KEY, forgetPlaceOnNewVisit, scrollKey } from "./scroll-positions";

afterEach(() => {
  vi.restoreAllMocks();
  sessionStorage.clear();
});

/** This document as loaded by a new visit, a reload or Back/Forward (PerformanceNavigationTiming.type). */
function loadedBy(type: NavigationTimingType) {
  vi.spyOn(performance, "getEntriesByType").mockReturnValue([{ type } as PerformanceNavigationTiming]);
}

test('a history entry\'s place is kept under its key; a page loaded fresh (key "default") under its path', () => {
  expect(scrollKey({ key: "k3x9", pathname: "/read" })).toBe("k3x9");
  expect(scrollKey({ key: "default", pathname: "/read" })).toBe("/read");
});

test("a new visit forgets the place kept for its path, and only that one", () => {
  sessionStorage.setItem(SCROLL_POSITIONS_KEY, JSON.stringify({ "/read": 900, "/chart": 300, k3x9: 120 }));
  loadedBy("navigate");
  forgetPlaceOnNewVisit({ pathname: "/read" });
  expect(JSON.parse(sessionStorage.getItem(SCROLL_POSITIONS_KEY)!)).toEqual({ "/chart": 300, k3x9: 120 });
});

test("a reload or Back/Forward keeps every place", () => {
  const places = { "/read": 900 };
  for (const type of ["reload", "back_forward"] as const) {
    sessionStorage.setItem(SCROLL_POSITIONS_KEY, JSON.stringify(places));
    loadedBy(type);
    forgetPlaceOnNewVisit({ pathname: "/read" });
    expect(JSON.parse(sessionStorage.getItem(SCROLL_POSITIONS_KEY)!)).toEqual(places);
    vi.restoreAllMocks();
  }
});

test("a broken or missing store is left alone, never thrown at the page", () => {
  loadedBy("navigate");
  expect(() => forgetPlaceOnNewVisit({ pathname: "/read" })).not.toThrow();
  sessionStorage.setItem(SCROLL_POSITIONS_KEY, "{not json");
  expect(() => forgetPlaceOnNewVisit({ pathname: "/read" })).not.toThrow();
  expect(sessionStorage.getItem(SCROLL_POSITIONS_KEY)).toBe("{not json");
});
