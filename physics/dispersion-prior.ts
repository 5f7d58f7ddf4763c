// The prior of the dispersion estimator (dispersion.ts): a weak one centred on a club golfer.

/**
 * The prior: σ_angle and σ_pace log-normal (median, sd of the natural log), the habitual roll-past normal (m).
 * See {@link CLUB_GOLFER_PRIOR}.
 */
export interface DispersionPrior {
  readonly angleDeg: { readonly median: number; readonly logSd: number };
  readonly pace: { readonly median: number; readonly logSd: number };
  readonly rollPastM: { readonly mean: number; readonly sd: number };
  readonly why: string;
}

/**
 * Weakly informative prior centred on a club golfer: start-line σ 1.2° and pace σ 0.12 (12 % of the roll length),
 * each log-normal with log-sd 0.5 (a factor 1.65 per σ; 95 % within ×/÷ 2.7: 0.45–3.2° and 0.045–0.32), and a
 * habitual roll-past of 0.45 ± 0.35 m. Values [memory / common practice, not from a published survey]: elite
 * players' start-line spread is usually quoted near 0.5–1°, club golfers' wider; club golfers' lag putts finish
 * within roughly ±10–20 % of their length; 0.45 m (17 in) past is the common-practice pace. Wide on purpose: a
 * few dozen logged putts move the estimate away from it.
 * @example CLUB_GOLFER_PRIOR.angleDeg.median // 1.2
 */
export const CLUB_GOLFER_PRIOR: DispersionPrior = Object.freeze({
  angleDeg: { median: 1.2, logSd: 0.5 },
  pace: { median: 0.12, logSd: 0.5 },
  rollPastM: { mean: 0.45, sd: 0.35 },
  why:
    "Weak prior centred on a club golfer [memory / common practice, not a published survey]: start-line σ 1.2° " +
    "and pace σ 12 % of the roll length (each ×/÷ 1.65 per σ), habitual roll-past 0.45 ± 0.35 m (17 in, common " +
    "practice). With few putts the estimate stays near it; each logged putt pulls it toward your own numbers.",
});
