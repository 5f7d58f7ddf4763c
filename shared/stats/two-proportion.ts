import { erf } from "mathjs";

export type TwoProportionTest = {
  /** rate B − rate A; null when either period has no attempts. */
  difference: number | null;
  /** Pooled two-proportion z statistic (B − A); null when it is undefined. */
  z: number | null;
  /** Two-sided p-value from the standard normal; null when z is. */
  pValue: number | null;
};

/** Standard normal CDF Φ(x) = (1 + erf(x/√2))/2 (erf from mathjs). */
export function normalCdf(x: number): number {
  return 0.5 * (1 + erf(x / Math.SQRT2));
}

/**
 * Two-proportion z-test with the pooled proportion (the textbook large-sample test of H0: pA = pB):
 * z = (p̂B − p̂A)/√(p̄(1−p̄)(1/nA + 1/nB)), p̄ = (madeA + madeB)/(nA + nB). z and p are null when a period is
 * empty or when p̄ is 0 or 1 (both periods all made or all missed: no variance, nothing to test). A large-sample
 * approximation: with few attempts per band read the Wilson intervals instead.
 * @example twoProportionZTest(30, 100, 45, 100) // difference 0.15, z ≈ 2.19, p ≈ 0.028
 */
export function twoProportionZTest(madeA: number, nA: number, madeB: number, nB: number): TwoProportionTest {
  for (const [made, n] of [
    [madeA, nA],
    [madeB, nB],
  ] as const) {
    if (!Number.isInteger(made) || !Number.isInteger(n) || made < 0 || n < 0 || made > n) {
      throw new RangeError(`need integers 0 ≤ made ≤ n (got ${made}/${n})`);
    }
  }
  if (nA === 0 || nB === 0) return { difference: null, z: null, pValue: null };
  const difference = madeB / nB - madeA / nA;
  const pooled = (madeA + madeB) / (nA + nB);
  if (pooled === 0 || pooled === 1) return { difference, z: null, pValue: null };
  const z = difference / Math.sqrt(pooled * (1 - pooled) * (1 / nA + 1 / nB));
  const pValue = Math.min(1, 2 * (1 - normalCdf(Math.abs(z))));
  return { difference, z, pValue };
}
