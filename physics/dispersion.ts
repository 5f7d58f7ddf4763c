// A player's start-line and pace dispersion estimated from their logged putts (Bayesian, on a grid), with a weak
// prior for club golfers that dominates while the log is thin.
// Over 300 lines on purpose: one estimator (data preparation, the posterior on a zooming grid and its summaries)
// whose private pieces have no other caller.
import { erf } from "mathjs";
import { ballDropTimeS } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { DEFAULT_GREEN_LATERAL_M, DEFAULT_READ_ERROR_SLOPE_PCT, greenLateralSigmaM, readSensitivity } from "./make-probability";
import { DEFAULT_ROLL_MODEL, rollingDecelFromStimp } from "./forces";

/**
 * One logged putt: distance (m), holed, the side a miss finished on (seen by the golfer) and its signed length
 * (m, − = short of the hole, + = past it, along the line), and the Stimp of its session (ft) when known.
 */
export interface LoggedPutt {
  readonly distanceM: number;
  readonly holed: boolean;
  readonly missSide?: "left" | "right" | null;
  readonly missLengthM?: number | null;
  readonly stimpFt?: number | null;
}

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

const NA = 18;
const NP = 18;
const NR = 14;
const MAX_STAGES = 5;
const SQRT1_2 = Math.SQRT1_2;
const LOG_FLOOR = Math.log(1e-300);
/** Prior share of the information above which the estimate is flagged as leaning on the prior. */
const PRIOR_WEIGHT_FLAG = 0.2;

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
  const data = prepareData(used, defaultStimp, options.readSlopePct ?? DEFAULT_READ_ERROR_SLOPE_PCT, options.greenLateralM ?? DEFAULT_GREEN_LATERAL_M);
  const minD = used.reduce((m, p) => Math.min(m, p.distanceM), Number.POSITIVE_INFINITY);

  const la0 = Math.log(prior.angleDeg.median);
  const lp0 = Math.log(prior.pace.median);
  let box: Box = {
    a: [la0 - 4 * prior.angleDeg.logSd, la0 + 4 * prior.angleDeg.logSd],
    p: [lp0 - 4 * prior.pace.logSd, lp0 + 4 * prior.pace.logSd],
    r: [Math.max(prior.rollPastM.mean - 4 * prior.rollPastM.sd, Number.isFinite(minD) ? -0.9 * minD : -1), prior.rollPastM.mean + 4 * prior.rollPastM.sd],
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

interface Box {
  a: [number, number];
  p: [number, number];
  r: [number, number];
}

/** Putts integrated over L, grouped by distance and Stimp: how many holed, how many missed (by side known or not). */
interface Group {
  readonly D: number;
  readonly ar: number;
  /** The start-line σ (degrees) and ln-length σ the read error and the green add at this distance and Stimp. */
  readonly extraAngleDeg: number;
  readonly extraPace: number;
  holed: number;
  missedSided: number;
  missedUnsided: number;
}

/** A miss with a usable length: its L, capture angle (degrees) there, and whether its side is known. */
interface Miss {
  readonly D: number;
  readonly L: number;
  readonly extraAngleDeg: number;
  readonly extraPace: number;
  readonly capDeg: number;
  readonly sided: boolean;
}

interface Data {
  readonly groups: Group[];
  readonly misses: Miss[];
}

const capture = { rh: HOLE_RADIUS_M, tR: ballDropTimeS() };

/** Holmes's capture half-width (m) for a straight roll of length L to a hole at D, a_r the rolling deceleration. */
function captureHalfWidth(D: number, L: number, ar: number): number {
  const { rh, tR } = capture;
  const b2 = L >= D ? rh * rh - (ar * (L - D) * tR * tR) / 2 : rh * rh - (D - L) * (D - L);
  return b2 > 0 ? Math.sqrt(b2) : 0;
}

const capAngleDeg = (D: number, bc: number) => (Math.asin(Math.min(1, bc / D)) * 180) / Math.PI;

/**
 * The extra spread a flat straight putt of length D gets from the read error and the green (derived from the same
 * model as makeProbability): start line ±σ_r·∂θ/∂(cross slope) and σ_g(D)/D, ln length ±2σ_r·∂ln v/∂(slope along).
 */
function extraSpread(D: number, stimpFt: number, readSlopePct: number, greenLateralM: number, cache: Map<string, { angleDeg: number; pace: number }>) {
  const key = `${D}|${stimpFt}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const sens = readSlopePct > 0 ? readSensitivity({ distanceM: D, slopePct: 0, fallLineDeg: 0, stimpFt, pace: { rollPastM: 0.45 } }) : null;
  const readAngle = sens ? readSlopePct * Math.abs(sens.lineX) : 0;
  const greenAngle = greenLateralSigmaM(D, greenLateralM) / D;
  const angleDeg = (Math.sqrt(readAngle * readAngle + greenAngle * greenAngle) * 180) / Math.PI;
  const pace = sens ? 2 * readSlopePct * Math.abs(sens.lnSpeedY) : 0;
  const out = { angleDeg, pace };
  cache.set(key, out);
  return out;
}

function prepareData(putts: readonly LoggedPutt[], defaultStimp: number, readSlopePct: number, greenLateralM: number): Data {
  const groups = new Map<string, Group>();
  const misses: Miss[] = [];
  const cache = new Map<string, { angleDeg: number; pace: number }>();
  for (const p of putts) {
    const stimp = p.stimpFt != null && Number.isFinite(p.stimpFt) && p.stimpFt > 0 ? p.stimpFt : defaultStimp;
    const ar = rollingDecelFromStimp(stimp, DEFAULT_ROLL_MODEL);
    const D = p.distanceM;
    const m = p.missLengthM;
    const sided = p.missSide === "left" || p.missSide === "right";
    const extra = extraSpread(Math.round(D * 1000) / 1000, stimp, readSlopePct, greenLateralM, cache);
    if (!p.holed && m != null && Number.isFinite(m) && D + m > 0.01 * D) {
      const L = D + m;
      misses.push({ D, L, capDeg: capAngleDeg(D, captureHalfWidth(D, L, ar)), sided, extraAngleDeg: extra.angleDeg, extraPace: extra.pace });
      continue;
    }
    const key = `${Math.round(D * 1000)}:${Math.round(stimp * 100)}`;
    let g = groups.get(key);
    if (!g) {
      g = { D: Math.round(D * 1000) / 1000, ar, extraAngleDeg: extra.angleDeg, extraPace: extra.pace, holed: 0, missedSided: 0, missedUnsided: 0 };
      groups.set(key, g);
    }
    if (p.holed) g.holed++;
    else if (sided) g.missedSided++;
    else g.missedUnsided++;
  }
  return { groups: [...groups.values()], misses };
}

/** Φ(x), the standard normal CDF, from mathjs's erf. */
function normalCdf(x: number): number {
  return 0.5 * (1 + erf(x * SQRT1_2));
}

const axis = (range: [number, number], n: number) => Array.from({ length: n }, (_, i) => range[0] + ((range[1] - range[0]) * i) / (n - 1));

/**
 * Nodes over x = ln L across the capture window of one group, L ∈ [D − r_h, D + Λ] (Λ = 2r_h²/(a_r·t_R²), where the
 * entry speed reaches v_c(0)): trapezoid weights on a uniform grid of step ≤ 0.004 in ln L, fine against the
 * narrowest pace σ on the grid (the trapezoid rule is spectrally accurate for the Gaussian factor).
 */
function captureNodes(g: Group): { x: Float64Array; w: Float64Array; capDeg: Float64Array } {
  const { rh, tR } = capture;
  const lambda = (2 * rh * rh) / (g.ar * tR * tR);
  const x0 = Math.log(g.D - rh);
  const x1 = Math.log(g.D + lambda);
  const n = Math.max(65, Math.ceil((x1 - x0) / 0.004) + 1);
  const h = (x1 - x0) / (n - 1);
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  const capDeg = new Float64Array(n);
  for (let q = 0; q < n; q++) {
    x[q] = x0 + q * h;
    w[q] = q === 0 || q === n - 1 ? h / 2 : h;
    capDeg[q] = capAngleDeg(g.D, captureHalfWidth(g.D, Math.exp(x[q]!), g.ar));
  }
  return { x, w, capDeg };
}

/** Unnormalised posterior weights on the grid, index ((i·NP) + j)·NR + l for (σ_a, σ_p, P). */
function posteriorOnGrid(data: Data, prior: DispersionPrior, box: Box): { w: Float64Array } {
  const la = axis(box.a, NA);
  const lp = axis(box.p, NP);
  const rp = axis(box.r, NR);
  const sa = la.map(Math.exp);
  const sp = lp.map(Math.exp);
  const logPost = new Float64Array(NA * NP * NR);
  const idx = (i: number, j: number, l: number) => (i * NP + j) * NR + l;

  // Priors: normal in ln σ (log-normal σ on a grid uniform in ln σ), normal in P.
  for (let i = 0; i < NA; i++) {
    const za = (la[i]! - Math.log(prior.angleDeg.median)) / prior.angleDeg.logSd;
    for (let j = 0; j < NP; j++) {
      const zp = (lp[j]! - Math.log(prior.pace.median)) / prior.pace.logSd;
      for (let l = 0; l < NR; l++) {
        const zr = (rp[l]! - prior.rollPastM.mean) / prior.rollPastM.sd;
        logPost[idx(i, j, l)] = -0.5 * (za * za + zp * zp + zr * zr);
      }
    }
  }

  // Misses with a length: separable into a pace term (σ_p, P) and an angle term (σ_a).
  const paceTerm = new Float64Array(NP * NR);
  const angleTerm = new Float64Array(NA);
  for (const m of data.misses) {
    const lnL = Math.log(m.L);
    for (let j = 0; j < NP; j++) {
      const s = Math.sqrt(sp[j]! * sp[j]! + m.extraPace * m.extraPace);
      for (let l = 0; l < NR; l++) {
        const z = (lnL - Math.log(m.D + rp[l]!)) / s;
        paceTerm[j * NR + l]! += -0.5 * z * z - Math.log(s) - lnL;
      }
    }
    for (let i = 0; i < NA; i++) {
      const tail = normalCdf(-m.capDeg / Math.sqrt(sa[i]! * sa[i]! + m.extraAngleDeg * m.extraAngleDeg)) * (m.sided ? 1 : 2);
      angleTerm[i]! += tail > 1e-300 ? Math.log(tail) : LOG_FLOOR;
    }
  }

  // Holed putts and misses without a length: P(holed) integrated over L, per group.
  const holedProb = new Float64Array(NA * NP * NR);
  const groupTerm = new Float64Array(NA * NP * NR);
  for (const g of data.groups) {
    const nodes = captureNodes(g);
    const nn = nodes.x.length;
    const x0 = nodes.x[0]!;
    const h = nodes.x[1]! - x0;
    const angle = new Float64Array(NA * nn);
    for (let i = 0; i < NA; i++) {
      const sEff = Math.sqrt(sa[i]! * sa[i]! + g.extraAngleDeg * g.extraAngleDeg);
      for (let q = 0; q < nn; q++) angle[i * nn + q] = 2 * normalCdf(nodes.capDeg[q]! / sEff) - 1;
    }
    const weight = new Float64Array(nn);
    for (let j = 0; j < NP; j++) {
      for (let l = 0; l < NR; l++) {
        // ln L ~ N(ln(D + P), σ_p²): only nodes within 8σ of its mean carry weight.
        const mu = Math.log(g.D + rp[l]!);
        const s = Math.sqrt(sp[j]! * sp[j]! + g.extraPace * g.extraPace);
        const qLo = Math.max(0, Math.floor((mu - 8 * s - x0) / h));
        const qHi = Math.min(nn - 1, Math.ceil((mu + 8 * s - x0) / h));
        for (let q = qLo; q <= qHi; q++) {
          const z = (nodes.x[q]! - mu) / s;
          weight[q] = (nodes.w[q]! * Math.exp(-0.5 * z * z)) / (s * Math.sqrt(2 * Math.PI));
        }
        for (let i = 0; i < NA; i++) {
          let p = 0;
          const row = i * nn;
          for (let q = qLo; q <= qHi; q++) p += weight[q]! * angle[row + q]!;
          holedProb[idx(i, j, l)] = Math.min(1, Math.max(0, p));
        }
      }
    }
    const missed = g.missedSided + g.missedUnsided;
    for (let c = 0; c < holedProb.length; c++) {
      const p = holedProb[c]!;
      let t = 0;
      if (g.holed > 0) t += g.holed * (p > 1e-300 ? Math.log(p) : LOG_FLOOR);
      if (missed > 0) t += missed * (1 - p > 1e-300 ? Math.log(1 - p) : LOG_FLOOR) - g.missedSided * Math.LN2;
      groupTerm[c]! += t;
    }
  }

  let max = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < NA; i++) {
    for (let j = 0; j < NP; j++) {
      for (let l = 0; l < NR; l++) {
        const c = idx(i, j, l);
        const v = logPost[c]! + paceTerm[j * NR + l]! + angleTerm[i]! + groupTerm[c]!;
        logPost[c] = v;
        if (v > max) max = v;
      }
    }
  }
  const w = new Float64Array(logPost.length);
  let total = 0;
  for (let c = 0; c < w.length; c++) total += w[c] = Math.exp(logPost[c]! - max);
  for (let c = 0; c < w.length; c++) w[c]! /= total;
  return { w };
}

/** Marginal weights along one axis (0: σ_a, 1: σ_p, 2: P). */
function marginal(post: { w: Float64Array }, dim: 0 | 1 | 2): Float64Array {
  const n = dim === 0 ? NA : dim === 1 ? NP : NR;
  const m = new Float64Array(n);
  for (let i = 0; i < NA; i++) {
    for (let j = 0; j < NP; j++) {
      for (let l = 0; l < NR; l++) m[dim === 0 ? i : dim === 1 ? j : l]! += post.w[(i * NP + j) * NR + l]!;
    }
  }
  return m;
}

/** Quantile of a marginal on a uniform axis, each grid value the centre of a cell of uniform density. */
function quantile(m: Float64Array, range: [number, number], q: number): number {
  const n = m.length;
  const h = (range[1] - range[0]) / (n - 1);
  let acc = 0;
  for (let i = 0; i < n; i++) {
    const next = acc + m[i]!;
    if (next >= q) {
      const frac = m[i]! > 0 ? (q - acc) / m[i]! : 0.5;
      return range[0] + (i - 0.5 + frac) * h;
    }
    acc = next;
  }
  return range[1];
}

function variance(m: Float64Array, range: [number, number]): number {
  const xs = axis(range, m.length);
  let mean = 0;
  for (let i = 0; i < m.length; i++) mean += m[i]! * xs[i]!;
  let v = 0;
  for (let i = 0; i < m.length; i++) v += m[i]! * (xs[i]! - mean) ** 2;
  // Add the within-cell variance of a uniform cell (h²/12), which the point masses leave out.
  const h = (range[1] - range[0]) / (m.length - 1);
  return v + (h * h) / 12;
}

/** Whether the grid step of every axis is at most 1/2.5 of that marginal's posterior sd. */
function resolved(post: { w: Float64Array }, box: Box): boolean {
  const ok = (m: Float64Array, range: [number, number]) => (range[1] - range[0]) / (m.length - 1) <= Math.sqrt(variance(m, range)) / 2.5;
  return ok(marginal(post, 0), box.a) && ok(marginal(post, 1), box.p) && ok(marginal(post, 2), box.r);
}

/** The box holding the posterior's mass (marginal quantiles 0.05 %–99.95 %), one coarse cell wider each side. */
function refineBox(post: { w: Float64Array }, box: Box): Box {
  const shrink = (m: Float64Array, range: [number, number]): [number, number] => {
    const h = (range[1] - range[0]) / (m.length - 1);
    const lo = Math.max(range[0], quantile(m, range, 0.0005) - h);
    const hi = Math.min(range[1], quantile(m, range, 0.9995) + h);
    return hi - lo > 1e-9 ? [lo, hi] : [lo - h, hi + h];
  };
  return { a: shrink(marginal(post, 0), box.a), p: shrink(marginal(post, 1), box.p), r: shrink(marginal(post, 2), box.r) };
}
