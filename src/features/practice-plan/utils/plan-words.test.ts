import { expect, test } from "vitest";
import { METRES_PER_FOOT } from "../../../../shared/units";
import { bandLabel, passRuleText, rateWithRange, strokesWords } from "./plan-words";

test("bands read in the user's units, the last one open-ended", () => {
  expect(bandLabel({ fromM: 6 * METRES_PER_FOOT, toM: 10 * METRES_PER_FOOT }, "imperial")).toBe("6–10 ft");
  expect(bandLabel({ fromM: 30 * METRES_PER_FOOT, toM: null }, "imperial")).toBe("30+ ft");
  expect(bandLabel({ fromM: 2, toM: 3 }, "metric")).toBe("2–3 m");
});

test("a rate shows its 95 % range; strokes say lost or gained", () => {
  expect(rateWithRange(0.2, [0.105, 0.353])).toBe("20 % (11–35 %)");
  expect(rateWithRange(null, null)).toBe("no putts");
  expect(strokesWords(0.756)).toBe("0.76 lost");
  expect(strokesWords(-0.1)).toBe("0.10 gained");
  expect(passRuleText({ kind: "make", made: 3 }, 8)).toBe("hole 3 of 8");
});
