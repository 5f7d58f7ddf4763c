// The dispersion estimator's posterior (dispersion.ts) on a 3-D grid (ln σ_a × ln σ_p × P): its weights under the
// prior and the logged putts, the marginals and their quantiles, and the zoom onto the posterior's mass.
import { erf } from "mathjs";
import { captureNodes, type Data } from "./dispersion-data";
import type { DispersionPrior } from "./dispersion-prior";

export const NA = 18;
export const NP = 18;
export const NR = 14;
const SQRT1_2 = Math.SQRT1_2;
const LOG_FLOOR = Math.log(1e-300);

export interface Box {
  a: [number, number];
  p: [number, number];
  r: [number, number];
}

/** Φ(x), the standard normal CDF, from mathjs's erf. */
function normalCdf(x: number): number {
  return 0.5 * (1 + erf(x * SQRT1_2));
}

const axis = (range: [number, number], n: number) => Array.from({ length: n }, (_, i) => range[0] + ((range[1] - range[0]) * i) / (n - 1));

/** Unnormalised posterior weights on the grid, index ((i·NP) + j)·NR + l for (σ_a, σ_p, P). */
export function posteriorOnGrid(data: Data, prior: DispersionPrior, box: Box): { w: Float64Array } {
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
export function marginal(post: { w: Float64Array }, dim: 0 | 1 | 2): Float64Array {
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
export function quantile(m: Float64Array, range: [number, number], q: number): number {
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

export function variance(m: Float64Array, range: [number, number]): number {
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
export function resolved(post: { w: Float64Array }, box: Box): boolean {
  const ok = (m: Float64Array, range: [number, number]) => (range[1] - range[0]) / (m.length - 1) <= Math.sqrt(variance(m, range)) / 2.5;
  return ok(marginal(post, 0), box.a) && ok(marginal(post, 1), box.p) && ok(marginal(post, 2), box.r);
}

/** The box holding the posterior's mass (marginal quantiles 0.05 %–99.95 %), one coarse cell wider each side. */
export function refineBox(post: { w: Float64Array }, box: Box): Box {
  const shrink = (m: Float64Array, range: [number, number]): [number, number] => {
    const h = (range[1] - range[0]) / (m.length - 1);
    const lo = Math.max(range[0], quantile(m, range, 0.0005) - h);
    const hi = Math.min(range[1], quantile(m, range, 0.9995) + h);
    return hi - lo > 1e-9 ? [lo, hi] : [lo - h, hi + h];
  };
  return { a: shrink(marginal(post, 0), box.a), p: shrink(marginal(post, 1), box.p), r: shrink(marginal(post, 2), box.r) };
}
