import { expect, test } from "vitest";
import { METRES_PER_FOOT, METRES_PER_INCH } from "#shared/units";
import { percent, puttLine, resultText, tally, waitingText } from "./putt-text";

const base = { distanceM: 8 * METRES_PER_FOOT, holed: false, missSide: null, missLengthM: null, breakType: null } as const;

test("a miss reads side then length, with short for a negative length", () => {
  expect(resultText({ ...base, missSide: "left", missLengthM: -0.3 }, "metric")).toBe("Missed left, 30 cm short");
  expect(resultText({ ...base, missLengthM: 12 * METRES_PER_INCH }, "imperial")).toBe("Missed 12 in long");
  expect(resultText(base, "imperial")).toBe("Missed");
  expect(resultText({ ...base, holed: true }, "imperial")).toBe("Holed");
  expect(puttLine({ ...base, holed: true, breakType: "uphill" }, "imperial")).toBe("8 ft · Holed · Uphill");
});

test("the tally counts holed putts and gives no rate without putts", () => {
  expect(tally([{ holed: true }, { holed: false }, { holed: true }])).toEqual({ putts: 3, holed: 2, rate: 2 / 3 });
  expect(tally([])).toEqual({ putts: 0, holed: 0, rate: null });
  expect(percent(2 / 3)).toBe("67 %");
  expect(percent(null)).toBe("–");
  expect(waitingText(1)).toBe("1 putt waiting to be saved");
  expect(waitingText(3)).toBe("3 putts waiting to be saved");
});
