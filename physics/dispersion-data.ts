// The logged putts as the dispersion estimator's likelihood sees them (dispersion.ts): misses with a length one by
// one, the rest grouped by distance and Stimp; Holmes's capture half-width and the nodes over the capture window.
import { ballDropTimeS } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { DEFAULT_ROLL_MODEL, rollingDecelFromStimp } from "./forces";
import { greenLateralSigmaM } from "./make-probability-types";
import { readSensitivity } from "./read-sensitivity";

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

/** Putts integrated over L, grouped by distance and Stimp: how many holed, how many missed (by side known or not). */
export interface Group {
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
export interface Miss {
  readonly D: number;
  readonly L: number;
  readonly extraAngleDeg: number;
  readonly extraPace: number;
  readonly capDeg: number;
  readonly sided: boolean;
}

export interface Data {
  readonly groups: Group[];
  readonly misses: Miss[];
}

export const capture = { rh: HOLE_RADIUS_M, tR: ballDropTimeS() };

/** Holmes's capture half-width (m) for a straight roll of length L to a hole at D, a_r the rolling deceleration. */
export function captureHalfWidth(D: number, L: number, ar: number): number {
  const { rh, tR } = capture;
  const b2 = L >= D ? rh * rh - (ar * (L - D) * tR * tR) / 2 : rh * rh - (D - L) * (D - L);
  return b2 > 0 ? Math.sqrt(b2) : 0;
}

const capAngleDeg = (D: number, bc: number) => (Math.asin(Math.min(1, bc / D)) * 180) / Math.PI;

/**
 * The extra spread a flat straight putt of length D gets from the read error and the green (derived from the same
 * model as makeProbability): start line ±σ_r·∂θ/∂(cross slope) and σ_g(D)/D, ln length ±2σ_r·∂ln v/∂(slope along).
 */
function extraSpread(
  D: number,
  stimpFt: number,
  readSlopePct: number,
  greenLateralM: number,
  cache: Map<string, { angleDeg: number; pace: number }>,
) {
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

export function prepareData(putts: readonly LoggedPutt[], defaultStimp: number, readSlopePct: number, greenLateralM: number): Data {
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
      misses.push({
        D,
        L,
        capDeg: capAngleDeg(D, captureHalfWidth(D, L, ar)),
        sided,
        extraAngleDeg: extra.angleDeg,
        extraPace: extra.pace,
      });
      continue;
    }
    const key = `${Math.round(D * 1000)}:${Math.round(stimp * 100)}`;
    let g = groups.get(key);
    if (!g) {
      g = {
        D: Math.round(D * 1000) / 1000,
        ar,
        extraAngleDeg: extra.angleDeg,
        extraPace: extra.pace,
        holed: 0,
        missedSided: 0,
        missedUnsided: 0,
      };
      groups.set(key, g);
    }
    if (p.holed) g.holed++;
    else if (sided) g.missedSided++;
    else g.missedUnsided++;
  }
  // A canonical order: the likelihood is summed in floating point, so the same putts in another order (the database
  // returns putts logged in the same instant in no fixed order) would give an estimate a few ulps apart.
  const byKey = [...groups.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([, g]) => g);
  misses.sort(
    (a, b) =>
      a.D - b.D ||
      a.L - b.L ||
      a.capDeg - b.capDeg ||
      a.extraAngleDeg - b.extraAngleDeg ||
      a.extraPace - b.extraPace ||
      Number(a.sided) - Number(b.sided),
  );
  return { groups: byKey, misses };
}

/**
 * Nodes over x = ln L across the capture window of one group, L ∈ [D − r_h, D + Λ] (Λ = 2r_h²/(a_r·t_R²), where the
 * entry speed reaches v_c(0)): trapezoid weights on a uniform grid of step ≤ 0.004 in ln L, fine against the
 * narrowest pace σ on the grid (the trapezoid rule is spectrally accurate for the Gaussian factor).
 */
export function captureNodes(g: Group): { x: Float64Array; w: Float64Array; capDeg: Float64Array } {
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
