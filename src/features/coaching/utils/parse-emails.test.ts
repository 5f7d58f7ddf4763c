import { expect, test } from "vitest";
import { parseEmails } from "./parse-emails";

test("several addresses on lines, with commas or semicolons, each kept once in lower case", () => {
  expect(parseEmails("ivo@example.test, Leena@Example.test;\nsam@example.test  ivo@EXAMPLE.test")).toEqual({
    valid: ["ivo@example.test", "leena@example.test", "sam@example.test"],
    invalid: [],
  });
});

test("something that is not an address is reported, not sent", () => {
  expect(parseEmails("ruth@example.test ruth-at-example <sam@example.test>")).toEqual({
    valid: ["ruth@example.test", "sam@example.test"],
    invalid: ["ruth-at-example"],
  });
});

test("an empty box gives nothing", () => {
  expect(parseEmails("  \n ,")).toEqual({ valid: [], invalid: [] });
});
