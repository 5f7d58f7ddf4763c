import { expect, test } from "vitest";
import { formatSessionDate, formatShortDate, todayIso } from "./dates";

test("calendar days are shown as written, whatever the time zone", () => {
  expect(formatSessionDate("2024-05-01")).toBe("Wed 1 May 2024");
  expect(formatShortDate("2024-12-31")).toBe("31 Dec 2024");
  expect(formatSessionDate("not a date")).toBe("not a date");
  expect(todayIso(new Date(2024, 4, 9, 7, 30))).toBe("2024-05-09");
});
