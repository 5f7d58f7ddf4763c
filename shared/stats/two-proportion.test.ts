import { describe, expect, test } from "vitest";
import fc from "fast-check";
import jStat from "jstat";
import { normalCdf, twoProportionZTest } from "./two-proportion";

test("normalCdf agrees with jstat's normal CDF", () => {
  for (const x of [-3, -1.959964, -0.5, 0, 0.7, 1.644854, 2.5]) expect(normalCdf(x)).toBeCloseTo(jStat.normal.cdf(x, 0, 1), 9);
  expect(normalCdf(1.959964)).toBeCloseTo(0.975, 6);
});

test("30/100 against 45/100: the pooled z-test agrees with jstat's twoSidedDifferenceOfProportions", () => {
  const t = twoProportionZTest(30, 100, 45, 100);
  expect(t.difference).toBeCloseTo(0.15, 12);
  // pooled p̄ = 0.375, SE = √(0.375·0.625·0.02) = 0.068465 → z = 2.1909 [derived by hand]
  expect(t.z).toBeCloseTo(2.1909, 3);
  expect(t.pValue).toBeCloseTo(jStat().twoSidedDifferenceOfProportions(0.45, 100, 0.3, 100), 6);
});

test("an empty period or no variance gives no test", () => {
  expect(twoProportionZTest(0, 0, 3, 10)).toEqual({ difference: null, z: null, pValue: null });
  expect(twoProportionZTest(10, 10, 5, 5)).toEqual({ difference: 0, z: null, pValue: null });
  expect(twoProportionZTest(0, 10, 0, 5)).toEqual({ difference: 0, z: null, pValue: null });
});

describe("twoProportionZTest properties", () => {
  const counts = fc.integer({ min: 1, max: 2000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n)));

  test("swapping the periods flips the sign of z and keeps p", () => {
    fc.assert(
      fc.property(counts, counts, ([ma, na], [mb, nb]) => {
        const ab = twoProportionZTest(ma, na, mb, nb);
        const ba = twoProportionZTest(mb, nb, ma, na);
        if (ab.z === null) return ba.z === null;
        return Math.abs(ab.z + ba.z!) < 1e-9 && Math.abs(ab.pValue! - ba.pValue!) < 1e-9;
      }),
    );
  });

  test("matches jstat wherever jstat is defined (both rates strictly inside (0, 1])", () => {
    fc.assert(
      fc.property(counts, counts, ([ma, na], [mb, nb]) => {
        const t = twoProportionZTest(ma, na, mb, nb);
        fc.pre(ma > 0 && mb > 0 && t.z !== null);
        return Math.abs(t.pValue! - jStat().twoSidedDifferenceOfProportions(mb / nb, nb, ma / na, na)) < 1e-6;
      }),
    );
  });
});
