// The forward roll on a planar green in closed form: the fast path of the Monte Carlo make probability.
// Same model and outputs as simulateRoll (odex), about a thousand times cheaper per roll.
import { captureAtRim, maxCaptureSpeedMps, type Capture, type RimCrossing } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { brentRoot } from "./root-find";
import { describeModel, requireFinite, resolveGreen, stopsInPractice, type Green } from "./roll-model";
import { cannotStop, type CannotStop } from "./read-types";
import type { RollInput } from "./simulate-roll";

/** Samples uniform in w = (u/u0)^n (about uniform in the remaining length), launch (w = 1) excluded. */
const W_SAMPLES = 16;
/** Samples every 10° of heading ψ to the fall line (the end of a roll on a slope turns fast over a short length). */
const PSI_SAMPLES = 18;
/** Brent's tolerance in ln w (a relative 1e-11 of the remaining roll). */
const LN_W_TOL = 1e-11;
const LN_W_TOL_MONTE_CARLO = 1e-7;
const NEVER = (): boolean => false;
/** The last coarse sample in w, just before rest. */
const W_LAST = 1e-12;
const LN_W_LAST = Math.log(W_LAST);

/**
 * A planar green prepared for closed-form rolls: accelerations (m/s²), k = a_r/a_g, n = 2k − 2 and the fall line.
 * `straight` when there is no slope (a_g = 0): every roll is a straight line.
 */
export interface PlanarRollField {
  readonly gravityDecelMps2: number;
  readonly rollingDecelMps2: number;
  readonly k: number;
  readonly n: number;
  readonly fallLine: readonly [number, number];
  readonly straight: boolean;
  /** Coarse samples uniform in w (descending, the last W_LAST) and their r = w^(1/n), shared by every roll. */
  readonly sampleW: Float64Array;
  readonly sampleLnW: Float64Array;
  readonly sampleR: Float64Array;
  /** tan(ψ_j/2) and its logarithm for ψ_j = 10°, 20°, … 170° (ascending). */
  readonly psiU: Float64Array;
  readonly psiLnU: Float64Array;
}

/**
 * Prepare a green for {@link rollPlanarInto}. Only the constant-resistance model has the closed form; the caller
 * must have checked {@link stopsInPractice} (k > 1). Throws RangeError otherwise.
 * @example planarRollField(resolveGreen({ slopePct: 2, fallLineDeg: 90, stimpFt: 10 })).k // ≈ 3.92
 */
export function planarRollField(green: Green): PlanarRollField {
  const key = `${green.gravityDecelMps2}|${green.rollingDecelMps2}|${green.fallLine[0]}|${green.fallLine[1]}|${green.closedForm}`;
  const hit = fieldCache.get(key);
  if (hit !== undefined) return hit;
  const field = buildField(green);
  if (fieldCache.size >= 256) fieldCache.clear();
  fieldCache.set(key, field);
  return field;
}

/** Prepared greens by their accelerations and fall line (a read, a chart or a Monte Carlo reuses a few). */
const fieldCache = new Map<string, PlanarRollField>();

function buildField(green: Green): PlanarRollField {
  if (!green.closedForm) throw new RangeError("planarRollField: the closed form needs the closed-form forces (gravity on a plane, constant rolling resistance)");
  if (!stopsInPractice(green)) throw new RangeError("planarRollField: the ball cannot stop on this green (check stopsInPractice first)");
  const ag = green.gravityDecelMps2;
  const ar = green.rollingDecelMps2;
  const straight = !(ag > 1e-9 * ar);
  const k = straight ? Number.POSITIVE_INFINITY : ar / ag;
  const n = 2 * k - 2;
  // Uniform in w (a sixteenth of the remaining length each), then every quarter of w (each halves the speed) down
  // to W_LAST: the slow end of a roll turns fast, and there the distance to the hole can dip and rise in a few cm.
  const ws: number[] = [];
  for (let i = 1; i < W_SAMPLES; i++) ws.push(1 - i / W_SAMPLES);
  for (let w = 1 / (4 * W_SAMPLES); w > W_LAST; w /= 4) ws.push(w);
  ws.push(W_LAST);
  const sampleW = Float64Array.from(ws);
  const sampleR = sampleW.map((w) => (straight ? 1 : Math.pow(w, 1 / n)));
  const psiU = new Float64Array(PSI_SAMPLES - 1);
  const psiLnU = new Float64Array(PSI_SAMPLES - 1);
  for (let j = 1; j < PSI_SAMPLES; j++) {
    psiU[j - 1] = Math.tan((j * Math.PI) / PSI_SAMPLES / 2);
    psiLnU[j - 1] = Math.log(psiU[j - 1]!);
  }
  const sampleLnW = sampleW.map(Math.log);
  return { gravityDecelMps2: ag, rollingDecelMps2: ar, k, n, fallLine: green.fallLine, straight, sampleW, sampleLnW, sampleR, psiU, psiLnU };
}

/**
 * One roll's path in closed form (derived; the classical particle on a rough incline, here for a true-rolling ball):
 * with ψ the angle between the velocity and the fall line and u = tan(ψ/2), the equation dv/dt = a_g·d̂ − a_r·v̂
 * gives |v| ∝ u^(k−1)(1 + u²) and every coordinate as a polynomial in u: along the fall line ∝ u^n(1/n − u⁴/(n+4)),
 * across it ∝ 2u^(n+1)(1/(n+1) + u²/(n+3)), with k = a_r/a_g, n = 2k − 2. The path is parameterised by
 * w = (u/u0)^n ∈ [0, 1] (1 at launch, 0 at rest), almost proportional to the remaining length. `set(w, r)` (with
 * r = w^(1/n)) writes position, heading, speed and length rolled into the public fields. Reusable: `reset`.
 * Only for rolls that are not straight (a slope, and a start line off the fall line).
 */
export class PlanarPath {
  /** The hole (for the root functions below) and the radius² of its edge. */
  holeX = 0;
  holeY = 0;
  rim2 = 0;
  /** (p − h)·v̂ at ln w: negative while approaching the hole, zero at a closest pass. */
  readonly gLn = (lnW: number): number => {
    this.atLn(lnW);
    return (this.x - this.holeX) * this.hx + (this.y - this.holeY) * this.hy;
  };
  /** |p − h|² − r_h² at ln w: crosses zero where the centre crosses the hole's edge. */
  readonly eLn = (lnW: number): number => {
    this.atLn(lnW);
    return (this.x - this.holeX) * (this.x - this.holeX) + (this.y - this.holeY) * (this.y - this.holeY) - this.rim2;
  };
  x = 0;
  y = 0;
  hx = 0;
  hy = 0;
  speed = 0;
  length = 0;
  /** tan(ψ0/2) at launch, and ln of it. */
  u0 = 0;
  lnU0 = 0;
  private dx = 0;
  private dy = 0;
  private px = 0;
  private py = 0;
  private n = 0;
  private invN = 0;
  private v = 0;
  private q = 1;
  private S = 0;
  private fx1 = 0;
  private fy1 = 0;
  private fs1 = 0;
  /** Total length and time of the roll, m and s. */
  totalLength = 0;
  totalTime = 0;

  /** Prepare for a launch at `v` (m/s) along the unit direction (ex, ey); false when the roll is straight. */
  reset(field: PlanarRollField, v: number, ex: number, ey: number): boolean {
    const dx = field.fallLine[0];
    const dy = field.fallLine[1];
    const c0 = ex * dx + ey * dy;
    let px = ex - c0 * dx;
    let py = ey - c0 * dy;
    const sn = Math.sqrt(px * px + py * py);
    if (field.straight || sn < 1e-12) return false;
    px /= sn;
    py /= sn;
    const n = field.n;
    this.dx = dx;
    this.dy = dy;
    this.px = px;
    this.py = py;
    this.n = n;
    this.invN = 1 / n;
    this.v = v;
    // tan(ψ0/2) by the half-angle identity in its stable form on either side of 90°.
    const u0 = c0 > -0.5 ? sn / (1 + c0) : (1 - c0) / sn;
    this.u0 = u0;
    this.lnU0 = Math.log(u0);
    const u02 = u0 * u0;
    this.q = 1 + u02;
    this.S = (v * v) / (field.gravityDecelMps2 * this.q * this.q);
    this.fx1 = this.invN - (u02 * u02) / (n + 4);
    this.fy1 = 2 * u0 * (1 / (n + 1) + u02 / (n + 3));
    this.fs1 = this.invN + (2 * u02) / (n + 2) + (u02 * u02) / (n + 4);
    this.totalLength = this.S * this.fs1;
    const k = field.k;
    this.totalTime = (v / (field.gravityDecelMps2 * this.q)) * (1 / (k - 1) + u02 / (k + 1));
    return true;
  }

  /** Evaluate the state at w with r = w^(1/n). */
  set(w: number, r: number): void {
    const n = this.n;
    const u = this.u0 * r;
    const u2 = u * u;
    const fx = w * (this.invN - (u2 * u2) / (n + 4));
    const fy = 2 * w * u * (1 / (n + 1) + u2 / (n + 3));
    const along = this.S * (this.fx1 - fx);
    const across = this.S * (this.fy1 - fy);
    this.x = along * this.dx + across * this.px;
    this.y = along * this.dy + across * this.py;
    const p = 1 + u2;
    const cosT = (1 - u2) / p;
    const sinT = (2 * u) / p;
    this.hx = cosT * this.dx + sinT * this.px;
    this.hy = cosT * this.dy + sinT * this.py;
    this.speed = (this.v * Math.sqrt(w) * p) / this.q;
    this.length = this.S * (this.fs1 - w * (this.invN + (2 * u2) / (n + 2) + (u2 * u2) / (n + 4)));
  }

  /**
   * The w at which the heading's x component turns from negative to positive (null if it never does): the quadratic
   * (1 − u²)·d̂x + 2u·p̂x = 0 for u in (0, u0), when the launch heads to −x and the fall line to +x.
   */
  wWhereHeadingXIsZero(): number | null {
    const dx = this.dx;
    const pxx = this.px;
    if (!(dx > 0)) return null;
    const u = (pxx + Math.hypot(pxx, dx)) / dx;
    if (!(u > 0 && u < this.u0)) return null;
    return Math.exp(this.n * (Math.log(u) - this.lnU0));
  }

  /** S·(1/n): the remaining length is at least this times w. */
  minRemainingPerW(): number {
    return this.S * this.invN;
  }

  /** Remaining length (m) to rest from the sample (w, r), without evaluating the rest of the state. */
  remainingAt(w: number, r: number): number {
    const u = this.u0 * r;
    const u2 = u * u;
    const n = this.n;
    return this.S * w * (this.invN + (2 * u2) / (n + 2) + (u2 * u2) / (n + 4));
  }

  /** Evaluate at ln w (two exponentials, cheaper than a fractional power). */
  atLn(lnW: number): void {
    this.set(Math.exp(lnW), Math.exp(lnW * this.invN));
  }

  /** Evaluate at w (computing r). */
  at(w: number): void {
    this.set(w, w > 0 ? Math.pow(w, this.invN) : 0);
  }
}

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

/** A closed-form roll in the shape of simulateRoll's answer (without the drawn path and samples). */
export interface PlanarRoll {
  readonly restM: [number, number];
  readonly rollLengthM: number;
  readonly rollTimeS: number;
  readonly closestApproach: {
    readonly distanceM: number;
    readonly offsetM: number;
    readonly speedMps: number;
    readonly pointM: [number, number];
    readonly atRest: boolean;
  };
  readonly capture: Capture;
  /** Where the ball's centre crossed the hole's edge before its closest pass (null if it never did). */
  readonly rim: RimCrossing | null;
}

/**
 * The closed-form forward roll for the same input as simulateRoll (ball at (0, 0), hole at (0, D)): rest point,
 * closest pass and the capture outcome at the rim (Holmes 1991; docs/sources.md) at a hole of radius `holeRadiusM`
 * (default 54 mm). See {@link rollPlanarInto} for the method; agrees with simulateRoll to well under 1 mm.
 * @example rollClosedForm({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, launchSpeedMps: 2, startLineDeg: -4 })
 */
export function rollClosedForm(
  input: RollInput & { readonly holeRadiusM?: number },
): { readonly ok: true; readonly roll: PlanarRoll } | CannotStop {
  requireFinite("launchSpeedMps", input.launchSpeedMps);
  requireFinite("startLineDeg", input.startLineDeg);
  if (!(input.distanceM > 0) || !Number.isFinite(input.distanceM)) throw new RangeError(`distanceM must be > 0 (got ${input.distanceM})`);
  if (input.launchSpeedMps < 0) throw new RangeError(`launchSpeedMps must be ≥ 0 (got ${input.launchSpeedMps})`);
  const green = resolveGreen(input);
  if (!stopsInPractice(green)) return cannotStop(describeModel(green));
  const out = newPlanarRollOut();
  const rh = input.holeRadiusM ?? HOLE_RADIUS_M;
  rollPlanarInto(planarRollField(green), input.launchSpeedMps, (input.startLineDeg * Math.PI) / 180, 0, input.distanceM, out, Number.POSITIVE_INFINITY, rh);
  return {
    ok: true,
    roll: {
      restM: [out.restX, out.restY],
      rollLengthM: out.rollLengthM,
      rollTimeS: out.rollTimeS,
      closestApproach: {
        distanceM: out.passDistanceM,
        offsetM: out.passOffsetM,
        speedMps: out.passSpeedMps,
        pointM: [out.passX, out.passY],
        atRest: out.passAtRest,
      },
      capture: captureAtRim(
        out.passDistanceM,
        Number.isFinite(out.rimSpeedMps) ? { offsetM: out.rimOffsetM, speedMps: out.rimSpeedMps } : null,
        out.passSpeedMps,
        Math.hypot(out.restX, out.restY - input.distanceM) < (input.holeRadiusM ?? HOLE_RADIUS_M),
        input.holeRadiusM ?? HOLE_RADIUS_M,
      ),
      rim: Number.isFinite(out.rimSpeedMps) ? { offsetM: out.rimOffsetM, speedMps: out.rimSpeedMps } : null,
    },
  };
}
