// The forward roll on a planar green in closed form (the path of planar-path.ts): rest point, closest pass at the
// hole, rim crossing and capture. Same model and outputs as simulateRoll (odex), about a thousand times cheaper per roll.
import { maxCaptureSpeedMps } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { PlanarPath, W_LAST, type PlanarRollField } from "./planar-path";
import { brentRoot } from "./root-find";

/** Brent's tolerance in ln w (a relative 1e-11 of the remaining roll). */
const LN_W_TOL = 1e-11;
const LN_W_TOL_MONTE_CARLO = 1e-7;
const NEVER = (): boolean => false;
const LN_W_LAST = Math.log(W_LAST);

/** Mutable result of one closed-form roll (reused across the Monte Carlo loop to avoid allocation). */
export interface PlanarRollOut {
  restX: number;
  restY: number;
  /** Closest pass at the hole centre: distance (m), signed offset (+ = ball passes right of the centre), speed (m/s). */
  passDistanceM: number;
  passOffsetM: number;
  passSpeedMps: number;
  passX: number;
  passY: number;
  passAtRest: boolean;
  /**
   * Where the ball's centre crosses the hole's edge before its closest pass (only when the pass is over the hole):
   * the offset of its line of travel from the hole centre there (m, unsigned) and its speed (m/s); NaN otherwise.
   */
  rimOffsetM: number;
  rimSpeedMps: number;
  /** Holed by Holmes's criterion applied at the rim (see capture.ts). */
  holed: boolean;
  rollLengthM: number;
  rollTimeS: number;
}

/** A fresh {@link PlanarRollOut}. @example const out = newPlanarRollOut(); */
export function newPlanarRollOut(): PlanarRollOut {
  return {
    restX: 0,
    restY: 0,
    passDistanceM: 0,
    passOffsetM: 0,
    passSpeedMps: 0,
    passX: 0,
    passY: 0,
    passAtRest: true,
    rimOffsetM: Number.NaN,
    rimSpeedMps: Number.NaN,
    holed: false,
    rollLengthM: 0,
    rollTimeS: 0,
  };
}

const sharedPath = new PlanarPath();

/**
 * One roll from (0, 0) in the putt frame, launched at `launchSpeedMps` along the start line `startLineRad`
 * (+ = right), with the hole centre at (holeX, holeY) and radius `holeRadiusM`; writes the rest point, the closest
 * pass at the hole (as simulateRoll defines it: the nearest of the local minima of |p − h| along the path and the
 * rest point), the rim crossing before that pass, the capture outcome and the roll's length and time into `out`.
 *
 * Method: the closed form of {@link PlanarPath}; the local minima of the distance to the hole are the sign changes of
 * (p − h)·v̂ from − to +, bracketed on coarse samples (uniform in w and every 10° of heading, so neither a long
 * nearly straight stretch nor the fast final turn down the fall line hides a pass) and refined by Brent's method
 * (root-find.ts). Straight rolls (no slope, or along the fall line) use s = v²/(2·a_eff). With `passWithinM`
 * (default ∞) a pass is only refined where it can be nearer than that (the Monte Carlo passes the hole radius: a
 * farther pass cannot be holed).
 * @example rollPlanarInto(field, 2, 0, 0, 3, out); out.restY // straight flat putt: 2²/(2·a_r)
 */
export function rollPlanarInto(
  field: PlanarRollField,
  launchSpeedMps: number,
  startLineRad: number,
  holeX: number,
  holeY: number,
  out: PlanarRollOut,
  passWithinM: number = Number.POSITIVE_INFINITY,
  holeRadiusM: number = HOLE_RADIUS_M,
): void {
  const v = launchSpeedMps;
  const ex = Math.sin(startLineRad);
  const ey = Math.cos(startLineRad);
  out.rimOffsetM = Number.NaN;
  out.rimSpeedMps = Number.NaN;
  if (v <= 0) {
    setAtRest(out, 0, 0, holeX, holeY, ex, ey);
    out.rollLengthM = 0;
    out.rollTimeS = 0;
    out.holed = out.passDistanceM < holeRadiusM;
    return;
  }
  const path = sharedPath;
  if (!path.reset(field, v, ex, ey)) {
    rollStraight(field, v, ex, ey, holeX, holeY, out, holeRadiusM);
    return;
  }
  path.holeX = holeX;
  path.holeY = holeY;
  path.rim2 = holeRadiusM * holeRadiusM;

  // Rest point (w = 0): the ball finishes heading down the fall line.
  path.set(0, 0);
  setAtRest(out, path.x, path.y, holeX, holeY, path.hx, path.hy);
  out.rollLengthM = path.totalLength;
  out.rollTimeS = path.totalTime;
  const restInside = out.passDistanceM < holeRadiusM;

  // Local minima of the distance to the hole: (p − h)·v̂ from − to + in the direction of travel (w decreasing),
  // bracketed on the merged samples (uniform and geometric in w, and every 10° of heading below the launch heading)
  // and refined by Brent's method in ln w. A sample is skipped unevaluated while the ball cannot yet be within
  // `passWithinM` of the hole there (its distance at the last evaluated sample less the exact length rolled since,
  // from the closed-form remaining length); the last skipped sample is evaluated first when sampling resumes, so it
  // starts a clean bracket. The last sample outside the hole's edge is kept to bracket the rim crossing.
  path.set(1, 1);
  let lnWPrev = 0;
  let gPrev = (path.x - holeX) * path.hx + (path.y - holeY) * path.hy;
  let dPrev = Math.sqrt((path.x - holeX) * (path.x - holeX) + (path.y - holeY) * (path.y - holeY));
  let remPrev = path.totalLength;
  let lnWOut = dPrev >= holeRadiusM ? 0 : Number.NaN;
  let passLnW = Number.NaN;
  let lnWOutAtPass = Number.NaN;
  const finite = passWithinM !== Number.POSITIVE_INFINITY;
  // The Monte Carlo (a finite `passWithinM`) needs the pass to micrometres only: 1e-7 in ln w is under a micrometre.
  const tol = finite ? LN_W_TOL_MONTE_CARLO : LN_W_TOL;
  const sw = field.sampleW;
  const lnSw = field.sampleLnW;
  const sr = field.sampleR;
  const pu = field.psiU;
  const pl = field.psiLnU;
  const n = field.n;
  const u0 = path.u0;
  const lnU0 = path.lnU0;
  let j = pu.length - 1;
  while (j >= 0 && pu[j]! >= u0 * 0.999999) j--;
  let lnWj = j >= 0 ? n * (pl[j]! - lnU0) : Number.NEGATIVE_INFINITY;
  if (lnWj < LN_W_LAST) j = -1;
  let i = 0;
  let skippedLnW = Number.NaN;
  let skippedR = 0;
  while (i < sw.length || j >= 0) {
    let lnW: number;
    let w: number;
    let r: number;
    if (j >= 0 && (i >= sw.length || lnWj > lnSw[i]!)) {
      lnW = lnWj;
      w = Math.exp(lnW);
      r = pu[j]! / u0;
      j--;
      lnWj = j >= 0 ? n * (pl[j]! - lnU0) : Number.NEGATIVE_INFINITY;
      if (lnWj < LN_W_LAST) j = -1;
    } else {
      lnW = lnSw[i]!;
      w = sw[i]!;
      r = sr[i]!;
      i++;
    }
    if (finite && dPrev - (remPrev - path.remainingAt(w, r)) > passWithinM) {
      skippedLnW = lnW;
      skippedR = r;
      continue;
    }
    for (let k = Number.isNaN(skippedLnW) ? 1 : 0; k < 2; k++) {
      const lw = k === 0 ? skippedLnW : lnW;
      path.set(k === 0 ? Math.exp(lw) : w, k === 0 ? skippedR : r);
      const gw = (path.x - holeX) * path.hx + (path.y - holeY) * path.hy;
      const dw = Math.sqrt((path.x - holeX) * (path.x - holeX) + (path.y - holeY) * (path.y - holeY));
      const remW = path.totalLength - path.length;
      if (gPrev < 0 && gw >= 0 && Math.min(dPrev, dw) - 0.5 * (remPrev - remW) < passWithinM) {
        const root = gw === 0 ? lw : brentRoot(path.gLn, lw, lnWPrev, gw, gPrev, NEVER, tol, 80).x;
        path.gLn(root);
        const d = Math.sqrt((path.x - holeX) * (path.x - holeX) + (path.y - holeY) * (path.y - holeY));
        if (d < out.passDistanceM) {
          setPass(out, d, path.x, path.y, holeX, holeY, path.hx, path.hy, path.speed);
          passLnW = root;
          lnWOutAtPass = lnWOut;
        }
      }
      if (dw >= holeRadiusM) lnWOut = lw;
      lnWPrev = lw;
      gPrev = gw;
      dPrev = dw;
      remPrev = remW;
    }
    skippedLnW = Number.NaN;
    // Farther from the hole than the whole remaining roll (plus the margin): no later pass can count.
    if (finite && dPrev - remPrev > passWithinM) break;
  }
  // A pass within the hole's radius: find where the centre crossed the edge, e = |p − h|² − r_h² from + to −.
  if (out.passDistanceM < holeRadiusM && !out.passAtRest && Number.isFinite(passLnW) && Number.isFinite(lnWOutAtPass)) {
    const ePass = out.passDistanceM * out.passDistanceM - path.rim2;
    const eOut = path.eLn(lnWOutAtPass);
    const root = eOut === 0 ? lnWOutAtPass : brentRoot(path.eLn, passLnW, lnWOutAtPass, ePass, eOut, NEVER, tol, 80).x;
    path.atLn(root);
    setRim(out, path.x, path.y, holeX, holeY, path.hx, path.hy, path.speed);
  }
  out.holed = judge(out, holeRadiusM, restInside);
}

/** Holmes's criterion at the rim; a ball that comes to rest over the hole drops. */
function judge(out: PlanarRollOut, holeRadiusM: number, restInside: boolean): boolean {
  if (restInside && out.passAtRest) return true;
  if (!(out.passDistanceM < holeRadiusM)) return restInside;
  if (!Number.isFinite(out.rimSpeedMps)) return true;
  return out.rimSpeedMps < maxCaptureSpeedMps(out.rimOffsetM, holeRadiusM) || restInside;
}

function setRim(out: PlanarRollOut, x: number, y: number, holeX: number, holeY: number, hx: number, hy: number, speed: number): void {
  out.rimOffsetM = Math.abs(hy * (x - holeX) - hx * (y - holeY));
  out.rimSpeedMps = speed;
}

function rollStraight(
  field: PlanarRollField,
  v: number,
  ex: number,
  ey: number,
  holeX: number,
  holeY: number,
  out: PlanarRollOut,
  holeRadiusM: number,
): void {
  const [dx, dy] = field.fallLine;
  const c0 = ex * dx + ey * dy;
  const aEff = field.rollingDecelMps2 - field.gravityDecelMps2 * c0;
  const L = (v * v) / (2 * aEff);
  setAtRest(out, ex * L, ey * L, holeX, holeY, ex, ey);
  out.rollLengthM = L;
  out.rollTimeS = v / aEff;
  const restInside = out.passDistanceM < holeRadiusM;
  const sStar = holeX * ex + holeY * ey;
  if (sStar > 0 && sStar < L) {
    const x = ex * sStar;
    const y = ey * sStar;
    const dist = Math.sqrt((x - holeX) * (x - holeX) + (y - holeY) * (y - holeY));
    if (dist < out.passDistanceM) {
      setPass(out, dist, x, y, holeX, holeY, ex, ey, Math.sqrt(Math.max(0, v * v - 2 * aEff * sStar)));
      if (dist < holeRadiusM) {
        const sRim = Math.max(0, sStar - Math.sqrt(holeRadiusM * holeRadiusM - dist * dist));
        out.rimOffsetM = dist;
        out.rimSpeedMps = Math.sqrt(Math.max(0, v * v - 2 * aEff * sRim));
      }
    }
  }
  out.holed = judge(out, holeRadiusM, restInside);
}

function setAtRest(out: PlanarRollOut, x: number, y: number, holeX: number, holeY: number, dirX: number, dirY: number): void {
  out.restX = x;
  out.restY = y;
  const dist = Math.sqrt((x - holeX) * (x - holeX) + (y - holeY) * (y - holeY));
  setPass(out, dist, x, y, holeX, holeY, dirX, dirY, 0);
  out.passAtRest = true;
}

function setPass(
  out: PlanarRollOut,
  dist: number,
  x: number,
  y: number,
  holeX: number,
  holeY: number,
  dirX: number,
  dirY: number,
  speed: number,
): void {
  // Signed as simulateRoll signs it: + when the hole centre lies to the left of the travel direction.
  const side = dirY * (x - holeX) - dirX * (y - holeY);
  out.passDistanceM = dist;
  out.passOffsetM = side >= 0 ? dist : -dist;
  out.passSpeedMps = speed;
  out.passX = x;
  out.passY = y;
  out.passAtRest = speed === 0;
}
