import { expect, test } from "vitest";
import { greeting } from "./greeting";

const now = new Date("2026-12-02T12:00:00Z");

test("an account made minutes ago is welcomed as new, not back", () => {
  expect(greeting("Ivo", "2026-12-02T11:55:00Z", now)).toBe("Welcome to Borrowline, Ivo");
});

test("an account older than a day is welcomed back", () => {
  expect(greeting("Ivo", "2026-10-20T18:00:00Z", now)).toBe("Welcome back, Ivo");
  expect(greeting("Ivo", "2026-12-01T11:59:59Z", now)).toBe("Welcome back, Ivo");
});
