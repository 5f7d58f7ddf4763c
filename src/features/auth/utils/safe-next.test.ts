import { expect, test } from "vitest";
import { safeNext } from "./safe-next";

test("a path on this site is kept", () => {
  expect(safeNext("/account?tab=units")).toBe("/account?tab=units");
});

test("missing, absolute or protocol-relative targets go home", () => {
  expect(safeNext(null)).toBe("/");
  expect(safeNext("https://example.com/")).toBe("/");
  expect(safeNext("//example.com/")).toBe("/");
  expect(safeNext("/\\example.com")).toBe("/");
});

test("the sign-in page is never the place to land after signing in", () => {
  expect(safeNext("/sign-in?next=%2F")).toBe("/");
});
