import { describe, expect, test } from "vitest";
import fc from "fast-check";
import jStat from "jstat";
import { wilsonInterval, rateOf, Z95 } from "./wilson";

// R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
// Statistics in Medicine 17:857–872, 1998, Table I, method 3 (Wilson score, no continuity correction).
// The four-decimal values are [memory]; each is also checked strictly against the score-test inversion
// computed with jstat (the npm package "jstat", normal quantile and CDF), which is the basis of the strict check.
const NEWCOMBE_TABLE_I = [
  { made: 81, n: 263, lo: 0.2553, hi: 0.3662 },
  { made: 15, n: 148, lo: 0.0624, hi: 0.1605 },
  { made: 0, n: 20, lo: 0.0, hi: 0.1611 },
  { made: 1, n: 29, lo: 0.0061, hi: 0.1718 },
];

/** Wilson's interval is the set of p whose score test |p̂ − p|/√(p(1−p)/n) ≤ z accepts: solve by bisection. */
function scoreBoundary(made: number, n: number, side: "lo" | "hi", z: number): number {
  const phat = made / n;
  if (side === "lo" && made === 0) return 0;
  if (side === "hi" && made === n) return 1;
  const stat = (p: number) => Math.abs(phat - p) / Math.sqrt((p * (1 - p)) / n) - z;
  let [a, b] = side === "lo" ? [1e-15, phat] : [phat, 1 - 1e-15];
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    const inside = stat(m) <= 0;
    if (side === "lo") [a, b] = inside ? [a, m] : [m, b];
    else [a, b] = inside ? [m, b] : [a, m];
  }
  return (a + b) / 2;
}

test("the default z is the 97.5 % normal quantile (jstat's normal.inv)", () => {
  expect(Z95).toBeCloseTo(jStat.normal.inv(0.975, 0, 1), 6);
});

for (const row of NEWCOMBE_TABLE_I) {
  test(`Wilson interval for ${row.made}/${row.n} matches Newcombe 1998 Table I and the jstat score inversion`, () => {
    const [lo, hi] = wilsonInterval(row.made, row.n)!;
    // Newcombe 1998, Table I (four decimals, [memory]): half a unit in the last place plus rounding slack.
    expect(Math.abs(lo - row.lo)).toBeLessThanOrEqual(0.00006);
    expect(Math.abs(hi - row.hi)).toBeLessThanOrEqual(0.00006);
    // Strict: the endpoints are where the score test with jstat's z = Φ⁻¹(0.975) just accepts.
    const z = jStat.normal.inv(0.975, 0, 1);
    const [loZ, hiZ] = wilsonInterval(row.made, row.n, z)!;
    expect(loZ).toBeCloseTo(scoreBoundary(row.made, row.n, "lo", z), 10);
    expect(hiZ).toBeCloseTo(scoreBoundary(row.made, row.n, "hi", z), 10);
  });
}

test("an empty band has no interval and no rate", () => {
  expect(wilsonInterval(0, 0)).toBeNull();
  expect(rateOf(0, 0)).toEqual({ attempts: 0, made: 0, rate: null, ci95: null });
});

test("impossible counts are refused", () => {
  expect(() => wilsonInterval(5, 4)).toThrow(RangeError);
  expect(() => wilsonInterval(-1, 4)).toThrow(RangeError);
  expect(() => wilsonInterval(1.5, 4)).toThrow(RangeError);
});

describe("wilsonInterval properties", () => {
  const counts = fc.integer({ min: 1, max: 5000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n)));

  test("contains the observed rate and stays inside [0, 1]", () => {
    fc.assert(
      fc.property(counts, ([made, n]) => {
        const [lo, hi] = wilsonInterval(made, n)!;
        return lo >= 0 && hi <= 1 && lo <= made / n + 1e-12 && hi >= made / n - 1e-12;
      }),
    );
  });

  test("is symmetric: made/n mirrors (n − made)/n", () => {
    fc.assert(
      fc.property(counts, ([made, n]) => {
        const [lo, hi] = wilsonInterval(made, n)!;
        const [lo2, hi2] = wilsonInterval(n - made, n)!;
        return Math.abs(lo - (1 - hi2)) < 1e-12 && Math.abs(hi - (1 - lo2)) < 1e-12;
      }),
    );
  });

  test("narrows as n grows at the same rate", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200 }), fc.integer({ min: 0, max: 10 }), fc.integer({ min: 2, max: 10 }), (n, k, mult) => {
        const made = Math.min(k, n);
        const [lo, hi] = wilsonInterval(made, n)!;
        const [lo2, hi2] = wilsonInterval(made * mult, n * mult)!;
        return hi2 - lo2 < hi - lo;
      }),
    );
  });
});
