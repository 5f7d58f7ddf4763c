import { expect, test } from "vitest";
import { BREDE_1990 } from "../../../../tests/fixtures/physics-references";
import { stimpFeetAndInches, rollFt, twoWayStimp } from "./stimp";

test("Brede's worked example: down 981 cm, up 185 cm gives 10.2 ft where the plain average says 19.1 ft", () => {
  // A. D. Brede, "Measuring Green Speed on Sloped Putting Greens", USGA Green Section Record 28(6):10–12, 1990 [published formula, secondary example].
  const up = rollFt({ major: "1", minor: "85" }, "metric");
  const down = rollFt({ major: "9", minor: "81" }, "metric");
  const r = twoWayStimp(up, down);
  expect(r.ok).toBe(true);
  if (!r.ok) return;
  expect(Math.abs(r.stimpFt - BREDE_1990.correctedFt)).toBeLessThan(BREDE_1990.toleranceFt);
  expect(r.stimpFt.toFixed(1)).toBe("10.2");
  expect(r.plainAverageFt.toFixed(1)).toBe("19.1");
});

test("feet and inches add up, centimetres may run past 100, and junk is refused", () => {
  expect(rollFt({ major: "9", minor: "6" }, "imperial")).toBeCloseTo(9.5, 12);
  expect(rollFt({ major: "", minor: "981" }, "metric")).toBeCloseTo(rollFt({ major: "9", minor: "81" }, "metric")!, 12);
  expect(rollFt({ major: "9,5", minor: "" }, "imperial")).toBeCloseTo(9.5, 12);
  expect(rollFt({ major: "nine", minor: "" }, "imperial")).toBeNull();
  expect(rollFt({ major: "", minor: "" }, "imperial")).toBeNull();
});

test("the same roll both ways is the flat reading; swapped directions and impossible results are explained", () => {
  const flat = twoWayStimp(10, 10);
  expect(flat).toMatchObject({ ok: true, stimpFt: 10 });
  expect(twoWayStimp(12, 8)).toMatchObject({ ok: false, reason: expect.stringMatching(/which is which/) });
  expect(twoWayStimp(1.5, 2)).toMatchObject({ ok: false, reason: expect.stringMatching(/outside 3–16 ft/) });
  expect(twoWayStimp(null, 9)).toMatchObject({ ok: false });
  expect(stimpFeetAndInches(10.21)).toBe("10.2 ft (10 ft 2 in)");
  expect(stimpFeetAndInches(9.5)).toBe("9.5 ft (9 ft 6 in)");
});
