/** The two-sided 95 % normal quantile, z = Φ⁻¹(0.975) (rounded to 7 significant figures). */
export const Z95 = 1.959964;

export type Interval = [lo: number, hi: number];

function requireCounts(made: number, n: number): void {
  if (!Number.isInteger(made) || !Number.isInteger(n) || n < 0 || made < 0 || made > n) {
    throw new RangeError(`need integers 0 ≤ made ≤ n (got made=${made}, n=${n})`);
  }
}

/**
 * Wilson score interval for a binomial proportion made/n, without continuity correction
 * (E. B. Wilson, "Probable inference, the law of succession, and statistical inference", JASA 22:209–212, 1927):
 * centre (p̂ + z²/2n)/(1 + z²/n), half-width z·√(p̂(1−p̂)/n + z²/4n²)/(1 + z²/n). Null when n = 0: no attempts,
 * no interval. Unlike the plain normal ("Wald") interval it stays inside [0, 1] and is not degenerate at 0/n.
 * @example wilsonInterval(81, 263) // ≈ [0.2553, 0.3662]
 */
export function wilsonInterval(made: number, n: number, z = Z95): Interval | null {
  requireCounts(made, n);
  if (n === 0) return null;
  const p = made / n;
  const z2 = z * z;
  const denom = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denom;
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / denom;
  // Clamp the rounding at the ends: 0/n must give exactly 0, n/n exactly 1.
  const lo = made === 0 ? 0 : Math.max(0, centre - half);
  const hi = made === n ? 1 : Math.min(1, centre + half);
  return [lo, hi];
}

export type Rate = { attempts: number; made: number; rate: number | null; ci95: Interval | null };

/** A make rate with its Wilson 95 % interval; rate and ci95 are null for an empty band. */
export function rateOf(made: number, attempts: number): Rate {
  requireCounts(made, attempts);
  return { attempts, made, rate: attempts === 0 ? null : made / attempts, ci95: wilsonInterval(made, attempts) };
}
