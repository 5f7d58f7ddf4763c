import Papa from "papaparse";
import { expect, test } from "vitest";
import { guardFormulae, toCsv, unguard } from "./csv";

const cells = ["=1+1\n=2+2", "a\r\n=b", "a\n\r=b", "\tx", "@SUM(A1)\nok", "+1", "-2", "'=quoted", "a\n'=b", "plain", "two\nlines"];

test("guardFormulae marks every line that starts with = + - @ tab or CR, and unguard undoes it exactly", () => {
  for (const cell of cells) {
    const guarded = guardFormulae(cell);
    for (const line of guarded.split(/\r\n|\n|\r/)) expect(line, JSON.stringify(cell)).not.toMatch(/^[=+\-@\t]/);
    expect(unguard(guarded)).toBe(cell);
  }
  expect(guardFormulae("plain")).toBe("plain");
  expect(guardFormulae("=1+1\n=2+2")).toBe("'=1+1\n'=2+2");
});

test("toCsv writes text cells guarded and numbers as numbers, through papaparse", () => {
  const csv = toCsv(["a", "b"], [["=1+1\n=2+2", -0.3]]);
  expect(Papa.parse<string[]>(csv).data[1]).toEqual(["'=1+1\n'=2+2", "-0.3"]);
});
