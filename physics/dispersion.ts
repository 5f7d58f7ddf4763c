// A player's start-line and pace dispersion estimated from their logged putts (Bayesian, on a grid), with a weak
// prior for club golfers that dominates while the log is thin.
// Its pieces: the prior (dispersion-prior.ts), the logged putts as the likelihood sees them (dispersion-data.ts),
// the posterior on a zooming grid and its summaries (dispersion-grid.ts).
import { prepareData, type LoggedPutt } from "./dispersion-data";
import { marginal, NA, NP, NR, posteriorOnGrid, quantile, refineBox, resolved, variance, type Box } from "./dispersion-grid";
import { CLUB_GOLFER_PRIOR, type DispersionPrior } from "./dispersion-prior";
import { DEFAULT_GREEN_LATERAL_M, DEFAULT_READ_ERROR_SLOPE_PCT } from "./make-probability-types";

/** Zoom stages at most. */
const MAX_STAGES = 5;
/** Prior share of the information above which the estimate is flagged as leaning on the prior. */
const PRIOR_WEIGHT_FLAG = 0.2;

/** A posterior summary: median and the 95 % equal-tailed credible interval. */
export interface Interval {
  readonly estimate: number;
  readonly lo: number;
  readonly hi: number;
}

/** Result of {@link estimateDispersion}. */
export interface DispersionEstimate {
  /** σ of the start line, degrees. */
  readonly angleDeg: Interval;
  /** σ of ln(actual ÷ intended roll length) (see PuttDispersion in make-probability.ts). */
  readonly pace: Interval;
  /** The habitual roll-past the player's misses imply, m (a nuisance parameter of the fit). */
  readonly rollPastM: Interval;
  /** Putts given, and putts used (those with a usable distance). */
  readonly putts: number;
  readonly usedPutts: number;
  /** Share of the posterior information on ln σ that is the prior's (posterior var ÷ prior var), per parameter. */
  readonly priorWeight: { readonly angleDeg: number; readonly pace: number };
  /** True while the prior carries more than 20 % of the information on either σ. */
  readonly usedPrior: boolean;
  readonly prior: DispersionPrior;
  /** Grid points evaluated, zoom stages (the grid is refined around the posterior's mass until it resolves it). */
  readonly diagnostics: { readonly gridPoints: number; readonly stages: number; readonly groups: number };
}

/** Options of {@link estimateDispersion}. */
export interface EstimateOptions {
  readonly prior?: DispersionPrior;
  /**
   * The misses beyond the stroke that the make probability adds (see PuttDispersion): read error (σ, % of slope) and
   * the green's sideways deviation after 1 m (m). Defaults as makeProbability's, so the fitted σ are the stroke's own.
   */
  readonly readSlopePct?: number;
  readonly greenLateralM?: number;
  /** Stimp for putts whose session has none, ft (default 10). */
  readonly defaultStimpFt?: number;
}

/**
 * Estimate a player's start-line σ (degrees) and pace σ (log roll-length ratio) from logged putts.
 *
 * Model (derived, for a straight putt on a flat green — the log records no slope, so a misread counts as start-line
 * error): the ball starts δ ~ N(0, σ_a²) off line and rolls L = (D + P)·e^ε, ε ~ N(0, σ_p²), with P the player's
 * habitual roll-past. It is holed when its offset D·sin δ is inside Holmes's capture half-width at its entry speed
 * (b_c² = r_h² − a_r(L − D)t_R²/2 past the centre, r_h² − (D − L)² when it stops short over the hole; B. W. Holmes,
 * Am. J. Phys. 59(2), 1991; a_r from the session's Stimp). A miss with a length gives L = D + missLength (its pace
 * term) and P(|δ| beyond the capture angle at that L) on the logged side; a holed putt (or a miss without a length)
 * integrates over ln L (trapezoid rule across the capture window).
 *
 * Inference: exact posterior on a 3-D grid (ln σ_a × ln σ_p × P) under {@link CLUB_GOLFER_PRIOR}, zoomed in on its
 * mass until the grid resolves it; reported as posterior medians with 95 % equal-tailed credible intervals. No optimiser, no asymptotics,
 * so a thin log gives an honest wide interval near the prior.
 * @example estimateDispersion([{ distanceM: 2, holed: false, missSide: "left", missLengthM: 0.3 }]).angleDeg // near the prior
 */
export function estimateDispersion(putts: readonly LoggedPutt[], options: EstimateOptions = {}): DispersionEstimate {
  const prior = options.prior ?? CLUB_GOLFER_PRIOR;
  const defaultStimp = options.defaultStimpFt ?? 10;
  const used = putts.filter((p) => Number.isFinite(p.distanceM) && p.distanceM >= 0.1 && p.distanceM <= 60);
  const data = prepareData(
    used,
    defaultStimp,
    options.readSlopePct ?? DEFAULT_READ_ERROR_SLOPE_PCT,
    options.greenLateralM ?? DEFAULT_GREEN_LATERAL_M,
  );
  const minD = used.reduce((m, p) => Math.min(m, p.distanceM), Number.POSITIVE_INFINITY);

  const la0 = Math.log(prior.angleDeg.median);
  const lp0 = Math.log(prior.pace.median);
  let box: Box = {
    a: [la0 - 4 * prior.angleDeg.logSd, la0 + 4 * prior.angleDeg.logSd],
    p: [lp0 - 4 * prior.pace.logSd, lp0 + 4 * prior.pace.logSd],
    r: [
      Math.max(prior.rollPastM.mean - 4 * prior.rollPastM.sd, Number.isFinite(minD) ? -0.9 * minD : -1),
      prior.rollPastM.mean + 4 * prior.rollPastM.sd,
    ],
  };
  // Zoom in on the posterior's mass until every axis resolves it (grid step ≤ posterior sd / 2.5).
  let post = posteriorOnGrid(data, prior, box);
  let stages = 1;
  while (stages < MAX_STAGES && !resolved(post, box)) {
    box = refineBox(post, box);
    post = posteriorOnGrid(data, prior, box);
    stages++;
  }

  const ma = marginal(post, 0);
  const mp = marginal(post, 1);
  const mr = marginal(post, 2);
  const summary = (m: Float64Array, range: [number, number], transform: (x: number) => number): Interval => ({
    estimate: transform(quantile(m, range, 0.5)),
    lo: transform(quantile(m, range, 0.025)),
    hi: transform(quantile(m, range, 0.975)),
  });
  const priorWeight = {
    angleDeg: Math.min(1, variance(ma, box.a) / prior.angleDeg.logSd ** 2),
    pace: Math.min(1, variance(mp, box.p) / prior.pace.logSd ** 2),
  };
  return {
    angleDeg: summary(ma, box.a, Math.exp),
    pace: summary(mp, box.p, Math.exp),
    rollPastM: summary(mr, box.r, (x) => x),
    putts: putts.length,
    usedPutts: used.length,
    priorWeight,
    usedPrior: priorWeight.angleDeg > PRIOR_WEIGHT_FLAG || priorWeight.pace > PRIOR_WEIGHT_FLAG,
    prior,
    diagnostics: { gridPoints: stages * NA * NP * NR, stages, groups: data.groups.length },
  };
}
