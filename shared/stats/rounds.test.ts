import { expect, test } from "vitest";
import { METRES_PER_FOOT } from "../units";
import { roundTotals, valueHole } from "./rounds";

const ft = (x: number) => x * METRES_PER_FOOT;

test("a round's strokes gained is the sum over putted holes of E(first putt) − putts (Broadie 2012)", () => {
  // E(8 ft) = 1.5 and E(33 ft) ≈ 2.0 (Broadie, "Putts Gained", 2011 [published]); E(3 ft) = 1.04 [memory table].
  const holes = [
    { holeNumber: 1, firstPuttM: ft(8), putts: 1, leftAfterFirstM: null },
    { holeNumber: 2, firstPuttM: ft(33), putts: 3, leftAfterFirstM: 1.8 },
    { holeNumber: 3, firstPuttM: ft(3), putts: 2, leftAfterFirstM: 0.2 },
    { holeNumber: 4, firstPuttM: null, putts: 0, leftAfterFirstM: null },
  ];
  const t = roundTotals(holes);
  expect(t).toMatchObject({ holes: 4, putts: 6, onePutts: 1, threePutts: 1, longFirstPutts: 1, longLagsOutside1m: 1 });
  expect(t.strokesGained).toBeCloseTo(0.5 + (2.0 - 3) + (1.04 - 2), 1);
  expect(t.strokesGained).toBeCloseTo(
    holes.reduce((s, h) => s + (valueHole(h).strokesGained ?? 0), 0),
    12,
  );
  expect(valueHole(holes[3]!)).toMatchObject({ expectedPutts: null, strokesGained: null });
});
