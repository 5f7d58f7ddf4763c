// The forward roll on a planar green in closed form: the fast path of the Monte Carlo make probability.
// Same model and outputs as simulateRoll (odex), about a thousand times cheaper per roll.
import { captureOutcome, type Capture } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { brentRoot } from "./root-find";
import { describeModel, requireFinite, resolveGreen, stopsInPractice, type Green } from "./roll-model";
import { cannotStop, type CannotStop } from "./read-types";
import type { RollInput } from "./simulate-roll";

const SAMPLES = 16;
const W_TOL = 1e-13;
/** Coarse samples in w: uniform, ending just before rest, where a gentle green turns the ball down the fall line. */
const W_LAST = 1e-12;
const sampleW = (i: number): number => (i === SAMPLES ? W_LAST : 1 - i / SAMPLES);

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
  /** (w_i)^(1/n) at the coarse samples w_i (uniform in w), shared by every roll on this green. */
  readonly sampleR: Float64Array;
}

/**
 * Prepare a green for {@link rollPlanarInto}. Only the constant-resistance model has the closed form; the caller
 * must have checked {@link stopsInPractice} (k > 1). Throws RangeError otherwise.
 * @example planarRollField(resolveGreen({ slopePct: 2, fallLineDeg: 90, stimpFt: 10 })).k // ≈ 3.92
 */
export function planarRollField(green: Green): PlanarRollField {
  if (green.model.resistanceSpeedFactor !== null) throw new RangeError("planarRollField: the closed form needs constant rolling resistance");
  if (!stopsInPractice(green)) throw new RangeError("planarRollField: the ball cannot stop on this green (check stopsInPractice first)");
  const ag = green.gravityDecelMps2;
  const ar = green.rollingDecelMps2;
  const straight = !(ag > 1e-9 * ar);
  const k = straight ? Number.POSITIVE_INFINITY : ar / ag;
  const n = 2 * k - 2;
  const sampleR = new Float64Array(SAMPLES + 1);
  for (let i = 0; i <= SAMPLES; i++) sampleR[i] = straight ? 1 : Math.pow(sampleW(i), 1 / n);
  return { gravityDecelMps2: ag, rollingDecelMps2: ar, k, n, fallLine: green.fallLine, straight, sampleR };
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
    rollLengthM: 0,
    rollTimeS: 0,
  };
}


/**
 * One roll from (0, 0) in the putt frame, launched at `launchSpeedMps` along the start line `startLineRad`
 * (+ = right), with the hole centre at (holeX, holeY); writes the rest point, the closest pass at the hole (as
 * simulateRoll defines it: the nearest of the local minima of |p − h| along the path and the rest point) and the
 * roll's length and time into `out`.
 *
 * Closed form (derived; the classical particle on a rough incline, here for a true-rolling ball): with ψ the angle
 * between the velocity and the fall line and u = tan(ψ/2), the equation dv/dt = a_g·d̂ − a_r·v̂ gives
 * |v| ∝ u^(k−1)(1 + u²) and every coordinate as a polynomial in u: along the fall line ∝ u^n(1/n − u⁴/(n+4)), across
 * it ∝ 2u^(n+1)(1/(n+1) + u²/(n+3)), with k = a_r/a_g, n = 2k − 2. The path is parameterised by w = (u/u0)^n ∈ [0, 1]
 * (1 at launch, 0 at rest), almost proportional to the remaining length; the closest pass is the sign change of
 * (p − h)·v̂ located by Brent's method (root-find.ts). Straight rolls (no slope, or along the fall line) use
 * s = v²/(2·a_eff). With `passWithinM` (default ∞) the closest pass is only located where it can be nearer than
 * that (the Monte Carlo passes the hole radius: a farther pass cannot be holed).
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
): void {
  const v = launchSpeedMps;
  const ex = Math.sin(startLineRad);
  const ey = Math.cos(startLineRad);
  const [dx, dy] = field.fallLine;
  const c0 = ex * dx + ey * dy;
  let px = ex - c0 * dx;
  let py = ey - c0 * dy;
  const sn = Math.hypot(px, py);
  if (v <= 0) {
    setAtRest(out, 0, 0, holeX, holeY, ex, ey);
    out.rollLengthM = 0;
    out.rollTimeS = 0;
    return;
  }
  if (field.straight || sn < 1e-12) {
    rollStraight(field, v, ex, ey, c0, holeX, holeY, out);
    return;
  }
  px /= sn;
  py /= sn;
  const ag = field.gravityDecelMps2;
  const n = field.n;
  const k = field.k;
  const invN = 1 / n;
  // tan(ψ0/2) by the half-angle identity in its stable form on either side of 90°.
  const u0 = c0 > -0.5 ? sn / (1 + c0) : (1 - c0) / sn;
  const u02 = u0 * u0;
  const q = 1 + u02;
  const S = (v * v) / (ag * q * q);
  const fx1 = invN - (u02 * u02) / (n + 4);
  const fy1 = 2 * u0 * (1 / (n + 1) + u02 / (n + 3));

  // State of the last evaluation (position, direction, speed, path length) at parameter w, with r = w^(1/n).
  let ax = 0;
  let ay = 0;
  let vhx = 0;
  let vhy = 0;
  let spd = 0;
  let len = 0;
  const fs1 = invN + (2 * u02) / (n + 2) + (u02 * u02) / (n + 4);
  const at = (w: number, r: number): void => {
    const u = u0 * r;
    const u2 = u * u;
    const fx = w * (invN - (u2 * u2) / (n + 4));
    const fy = 2 * w * u * (1 / (n + 1) + u2 / (n + 3));
    const along = S * (fx1 - fx);
    const across = S * (fy1 - fy);
    ax = along * dx + across * px;
    ay = along * dy + across * py;
    const p = 1 + u2;
    const cosT = (1 - u2) / p;
    const sinT = (2 * u) / p;
    vhx = cosT * dx + sinT * px;
    vhy = cosT * dy + sinT * py;
    spd = (v * Math.sqrt(w) * p) / q;
    len = S * (fs1 - w * (invN + (2 * u2) / (n + 2) + (u2 * u2) / (n + 4)));
  };
  const g = (w: number): number => {
    at(w, w > 0 ? Math.pow(w, invN) : 0);
    return (ax - holeX) * vhx + (ay - holeY) * vhy;
  };

  // Rest point (w = 0): the ball finishes heading down the fall line.
  at(0, 0);
  setAtRest(out, ax, ay, holeX, holeY, dx, dy);
  out.rollLengthM = len;
  out.rollTimeS = (v / (ag * q)) * (1 / (k - 1) + u02 / (k + 1));

  // Local minima of the distance to the hole: (p − h)·v̂ from − to + in the direction of travel (w decreasing),
  // bracketed on the coarse samples and refined only where the segment can come within `passWithinM` of the hole
  // (no point of a segment is nearer than the nearer end's distance less half the segment's length).
  const rs = field.sampleR;
  at(1, 1);
  let wPrev = 1;
  let gPrev = (ax - holeX) * vhx + (ay - holeY) * vhy;
  let dPrev = Math.sqrt((ax - holeX) * (ax - holeX) + (ay - holeY) * (ay - holeY));
  let lenPrev = len;
  for (let i = 1; i <= SAMPLES; i++) {
    const w = sampleW(i);
    at(w, rs[i]!);
    const gw = (ax - holeX) * vhx + (ay - holeY) * vhy;
    const dw = Math.sqrt((ax - holeX) * (ax - holeX) + (ay - holeY) * (ay - holeY));
    const lenW = len;
    if (gPrev < 0 && gw >= 0 && Math.min(dPrev, dw) - 0.5 * (lenW - lenPrev) < passWithinM) {
      const root = gw === 0 ? w : brentRoot(g, w, wPrev, gw, gPrev, () => false, W_TOL, 80).x;
      g(root);
      const dist = Math.sqrt((ax - holeX) * (ax - holeX) + (ay - holeY) * (ay - holeY));
      if (dist < out.passDistanceM) setPass(out, dist, ax, ay, holeX, holeY, vhx, vhy, spd);
    }
    wPrev = w;
    gPrev = gw;
    dPrev = dw;
    lenPrev = lenW;
  }
}

function rollStraight(
  field: PlanarRollField,
  v: number,
  ex: number,
  ey: number,
  c0: number,
  holeX: number,
  holeY: number,
  out: PlanarRollOut,
): void {
  const aEff = field.rollingDecelMps2 - field.gravityDecelMps2 * c0;
  const L = (v * v) / (2 * aEff);
  setAtRest(out, ex * L, ey * L, holeX, holeY, ex, ey);
  out.rollLengthM = L;
  out.rollTimeS = v / aEff;
  const sStar = holeX * ex + holeY * ey;
  if (sStar > 0 && sStar < L) {
    const x = ex * sStar;
    const y = ey * sStar;
    const dist = Math.sqrt((x - holeX) * (x - holeX) + (y - holeY) * (y - holeY));
    if (dist < out.passDistanceM) setPass(out, dist, x, y, holeX, holeY, ex, ey, Math.sqrt(Math.max(0, v * v - 2 * aEff * sStar)));
  }
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
}

/**
 * The closed-form forward roll for the same input as simulateRoll (ball at (0, 0), hole at (0, D)): rest point,
 * closest pass and Holmes's capture outcome (Am. J. Phys. 59(2), 1991) at a hole of radius `holeRadiusM`
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
  rollPlanarInto(planarRollField(green), input.launchSpeedMps, (input.startLineDeg * Math.PI) / 180, 0, input.distanceM, out);
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
      capture: captureOutcome(out.passOffsetM, out.passSpeedMps, input.holeRadiusM ?? HOLE_RADIUS_M),
    },
  };
}
