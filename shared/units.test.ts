import { expect, test } from "vitest";
import { parseHeightGridCsv } from "./height-map";
import { parseDecimal } from "./units";

// What a golfer types (or a shared link carries) and what it means; "common practice" for number entry: a comma is
// a decimal point in much of Europe, and nothing a person types as a distance is hexadecimal or in exponent form.
test("parseDecimal reads numbers as a golfer writes them, and nothing else", () => {
  expect(parseDecimal("2,5")).toBe(2.5);
  expect(parseDecimal(" 3.5 ")).toBe(3.5);
  expect(parseDecimal("-1,25")).toBe(-1.25);
  expect(parseDecimal("+2")).toBe(2);
  expect(parseDecimal(".5")).toBe(0.5);
  expect(parseDecimal("10.")).toBe(10);
  expect(parseDecimal("0")).toBe(0);
  // Number() would read these as 26, 1000, 0, 0, Infinity and 16.
  for (const text of ["0x1A", "1e3", "", "   ", "Infinity", "0x10"]) expect(parseDecimal(text)).toBeNull();
  // Units, thousands separators and two decimal marks are not a number either (a form says so).
  for (const text of ["3.5 ft", "1,234.5", "1.2.3", "2,5,0", "-", ".", "NaN"]) expect(parseDecimal(text)).toBeNull();
  expect(parseDecimal(null)).toBeNull();
  expect(parseDecimal(undefined)).toBeNull();
});

test("a height grid's cells go through the same parser: hexadecimal is refused, comma decimals in a ;-file are read", () => {
  const bad = parseHeightGridCsv("0,0x1A\n0,0\n");
  expect(bad.ok).toBe(false);
  if (!bad.ok) expect(bad.errors["row 1, column 2"]).toBe('"0x1A" is not a height in metres');
  const semicolons = parseHeightGridCsv("0,12;0,09\n0,06;0\n");
  expect(semicolons).toEqual({ ok: true, value: [[0.12, 0.09], [0.06, 0]] });
});
