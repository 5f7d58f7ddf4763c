import { expect, test } from "vitest";
// Height grids read their cells with the one number parser (shared/units.ts parseDecimal).
import { parseHeightGridCsv } from "./height-map";

test("a height grid's cells go through the same parser: hexadecimal is refused, comma decimals in a ;-file are read", () => {
  const bad = parseHeightGridCsv("0,0x1A\n0,0\n");
  expect(bad.ok).toBe(false);
  if (!bad.ok) expect(bad.errors["row 1, column 2"]).toBe('"0x1A" is not a height in metres');
  const semicolons = parseHeightGridCsv("0,12;0,09\n0,06;0\n");
  expect(semicolons).toEqual({
    ok: true,
    value: [
      [0.12, 0.09],
      [0.06, 0],
    ],
  });
});
