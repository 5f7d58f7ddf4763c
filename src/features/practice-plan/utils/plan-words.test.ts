import { expect, test } from "vitest";
import { METRES_PER_FOOT } from "#shared/units";
import { bandLabel, planLadderName, passRuleText, rateWithRange, strokesWords } from "./plan-words";

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

// Issue 18: a coach in metres read "Practice plan: 6–10 ft" (the server names the ladder in the player's units).
test("the plan's ladder is named in the reader's units, whatever units the plan was built in", () => {
  const ft = METRES_PER_FOOT;
  // An imperial player's bands (edges in whole feet); targets are the 6–10 ft and 15–20 ft bands.
  const plan = {
    bands: [
      { fromM: 3 * ft, toM: 6 * ft },
      { fromM: 6 * ft, toM: 10 * ft },
      { fromM: 10 * ft, toM: 15 * ft },
      { fromM: 15 * ft, toM: 20 * ft },
    ],
    targets: [1, 3],
  };
  // 6 ft = 1.8288 m, 10 ft = 3.048 m, 15 ft = 4.572 m, 20 ft = 6.096 m (hand-computed), to one decimal.
  expect(planLadderName(plan, "metric")).toBe("Practice plan: 1.8–3 m and 4.6–6.1 m");
  expect(planLadderName(plan, "imperial")).toBe("Practice plan: 6–10 ft and 15–20 ft");
});
