import { expect, test } from "vitest";
import { solveRead } from "#physics";
import { ROLL_PAST_RANGE_M, decodeRehearse, encodeRehearse } from "./rehearse-putt";

test("a read's link decodes to that putt in SI, and encodes back to the same link", () => {
  const { putt, replaced } = decodeRehearse(new URLSearchParams("d=3.048&s=2.5&f=270&st=11&rp=0.4318"), "imperial");
  expect(replaced).toEqual([]);
  expect(putt).toEqual({ distanceM: 3.048, slopePct: 2.5, fallLineDeg: 270, stimpFt: 11, rollPastM: 0.4318 });
  expect(encodeRehearse(putt)).toBe("d=3.048&s=2.5&f=270&st=11&rp=0.4318");
});

test("the defaults are the read calculator's: 10 ft and 17 in past in feet, 3 m and 45 cm in metres", () => {
  expect(decodeRehearse(new URLSearchParams(""), "imperial").putt.rollPastM).toBeCloseTo(17 * 0.0254, 12);
  expect(decodeRehearse(new URLSearchParams(""), "metric").putt).toEqual({
    distanceM: 3,
    slopePct: 2,
    fallLineDeg: 90,
    stimpFt: 10,
    rollPastM: 0.45,
  });
});

test("an entry-speed read becomes the roll-past that speed gives on the same putt", () => {
  const d = decodeRehearse(new URLSearchParams("d=3&s=2&f=45&st=10&es=0.9"), "metric");
  expect(d.fromEntrySpeedMps).toBe(0.9);
  // Rolled back at that roll-past, the ball reaches the hole at the link's speed.
  const again = solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: 45, stimpFt: 10, pace: { rollPastM: d.putt.rollPastM } });
  expect(again.ok && again.read.entrySpeedMps).toBeCloseTo(0.9, 3);
});

test("a roll-past beyond the pace control's firm end is brought back to it, and said", () => {
  const d = decodeRehearse(new URLSearchParams("d=3&s=2&f=45&st=10&rp=2.5"), "metric");
  expect(d.putt.rollPastM).toBe(ROLL_PAST_RANGE_M.max);
  expect(d.clampedRollPastM).toBe(2.5);
});
