import { expect, test } from "vitest";
import { todayIso } from "./dates";

test("today is the player's own calendar day", () => {
  expect(todayIso(new Date(2024, 4, 9, 7, 30))).toBe("2024-05-09");
});
