import { expect, test } from "vitest";
import { ladderInputSchema } from "../../../shared/schemas/ladders";
import { formatLength } from "../../../shared/units";
import { BUILT_IN_LADDERS } from "./built-in-ladders";

// Issue 14: the built-in ladders read "2 ft 11 in to 5 ft 11 in" (rungs set in rounded metres).
test("every built-in rung is a whole number of feet, shown as the golfer says it", () => {
  for (const ladder of BUILT_IN_LADDERS) {
    for (const rung of ladder.rungs) expect(formatLength(rung.distanceM, "imperial"), `${ladder.name}`).toMatch(/^\d+ ft$/);
  }
  const circle = BUILT_IN_LADDERS.find((l) => l.name === "Circle of four")!;
  expect(circle.rungs.map((r) => formatLength(r.distanceM, "imperial"))).toEqual(["3 ft", "4 ft", "5 ft", "6 ft"]);
});

test("the built-in ladders pass the schema a coach's copy must pass", () => {
  for (const { name, description, failRule, rungs } of BUILT_IN_LADDERS)
    expect(ladderInputSchema.safeParse({ name, description, failRule, rungs }).success).toBe(true);
});

// Issue 18: a coach in metres read "about 18 in (45 cm)" in the Pace ladder's description on /ladders. The rungs are
// shown in the reader's units; the fixed words around them must name no length in any unit.
test("the built-in ladders' descriptions and rung notes name no length in feet, inches, metres or centimetres", () => {
  const lengthInAUnit = /\d\s*(?:ft|feet|foot|in|inch(?:es)?|m|cm|metres?|centimetres?)\b/i;
  for (const ladder of BUILT_IN_LADDERS) {
    expect(ladder.description ?? "", ladder.name).not.toMatch(lengthInAUnit);
    for (const rung of ladder.rungs) expect(rung.note ?? "", ladder.name).not.toMatch(lengthInAUnit);
  }
});
