import { expect, test } from "vitest";
import { exportMetres, formatCount, formatDate, formatSpeed, formatStimp, stimpText, atHoleText } from "./format";
import { parseDecimal } from "./units";

test("a corrected Stimp reads to 0.1 ft: 9.58974358974359 is 9.6, 10 is 10", () => {
  expect(formatStimp(9.58974358974359)).toBe("9.6");
  expect(formatStimp(10)).toBe("10");
  expect(formatStimp(9.96)).toBe("10");
  expect(stimpText(11.04)).toBe("Stimp 11");
});

test("speeds are ft/s in feet and inches, m/s in metres (0.3048 m a foot)", () => {
  expect(formatSpeed(0.9, "imperial")).toBe("3.0 ft/s");
  expect(formatSpeed(1.637, "imperial")).toBe("5.4 ft/s");
  expect(formatSpeed(0.9, "metric")).toBe("0.90 m/s");
  expect(atHoleText(0.01, "imperial")).toBe("just reaching the hole, dying");
  expect(atHoleText(0.67, "imperial")).toBe("rolling at 2.2 ft/s");
});

test("files get metres to the millimetre", () => {
  expect(exportMetres(6 * 0.3048)).toBe(1.829);
  expect(exportMetres(-(7 * 0.0254))).toBe(-0.178);
  expect(String(exportMetres(0.1 + 0.2))).toBe("0.3");
});

test("one date format, in the reader's locale; a calendar day is that day in every time zone", () => {
  expect(formatDate("2026-12-02", "date", "en-GB")).toBe("2 Dec 2026");
  expect(formatDate("2026-12-02", "date", "en-US")).toBe("Dec 2, 2026");
  expect(formatDate("2024-05-01", "weekday", "en-GB")).toMatch(/^Wed,? 1 May 2024$/);
  expect(formatDate("2024-05-06", "day", "en-GB")).toBe("6 May");
  expect(formatDate("2099-06-30", "long", "en-GB")).toMatch(/^Tuesday,? 30 June 2099$/);
  // An instant is shown in local time; its day depends on where the reader is, but the format does not.
  expect(formatDate("2026-12-02T12:00:00Z", "date", "de-DE")).toMatch(/^\d\. Dez\. 2026$/);
  expect(formatDate("not a date")).toBe("not a date");
  expect(formatCount(10000, "en-GB")).toBe("10,000");
});

test("the one number parser: comma decimals yes; hex, exponents, blanks and units no", () => {
  expect(parseDecimal("3,5")).toBe(3.5);
  expect(parseDecimal(" 3.5 ")).toBe(3.5);
  expect(parseDecimal("+2")).toBe(2);
  expect(parseDecimal(".5")).toBe(0.5);
  expect(parseDecimal("-0.25")).toBe(-0.25);
  for (const bad of ["0x1A", "1e3", "", "  ", "Infinity", "NaN", "3.5 ft", "1,234.5", "1.2.3", null, undefined])
    expect(parseDecimal(bad), String(bad)).toBeNull();
  expect(Number("0x1A")).toBe(26); // why bare Number() is not used
});

test("the fall line's two wordings (the read's short one, the scene's from where the golfer stands) agree on every lean", async () => {
  const { describeFallLine, fallLineWords } = await import("./format");
  const cases: [number, string, string][] = [
    [0, "straight downhill", "falls toward the hole (downhill putt)"],
    [45, "downhill, falls right", "falls to your right and toward the hole (downhill)"],
    [90, "falls to the right", "falls to your right (side hill)"],
    [135, "uphill, falls right", "falls to your right and toward you (uphill)"],
    [180, "straight uphill", "falls toward you (uphill putt)"],
    [260, "falls to the left", "falls to your left (side hill)"],
    [315, "downhill, falls left", "falls to your left and toward the hole (downhill)"],
    // 15° either side of a quarter still takes the quarter's name (common practice: nobody reads a 10° lean).
    [14, "straight downhill", "falls toward the hole (downhill putt)"],
  ];
  for (const [deg, short, golfer] of cases) {
    expect(describeFallLine(deg)).toBe(short);
    expect(fallLineWords(deg)).toBe(golfer);
  }
});

test("aim words: an offset by side, the centre, and a start line too wide for an offset", async () => {
  const { aimWords, holeWidthsWords } = await import("./format");
  expect(aimWords(-0.39, "metric")).toBe("39 cm left of the hole");
  expect(aimWords(0.003, "imperial")).toBe("straight at the hole");
  expect(aimWords(null, "imperial", -75.4)).toBe("start it 75° left of the hole");
  // From a yard or a metre on, an aim is a length, as a golfer says it.
  expect(aimWords(-3.2766, "imperial")).toBe("10 ft 9 in left of the hole");
  expect(aimWords(0.8, "imperial")).toBe("31 in right of the hole");
  expect(aimWords(1.5, "metric")).toBe("1.50 m right of the hole");
  // 4.25 in = 10.795 cm a hole width (Rules of Golf, Definitions "Hole").
  expect(holeWidthsWords(0.10795)).toBe("1.0 hole width");
  expect(holeWidthsWords(-0.27)).toBe("2.5 hole widths");
});
