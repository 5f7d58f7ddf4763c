// The path of a ball on a planar green in closed form, for the forces of physics/forces/ when the closed form models
// them exactly (gravity on a plane, constant rolling resistance): the fast path of the read, the chart and the Monte
// Carlo. Tested against integrating the same forces (forces/forces.test.ts, planar-roll*.test.ts).
import { stopsInPractice, type Green } from "./roll-model";

/** Samples uniform in w = (u/u0)^n (about uniform in the remaining length), launch (w = 1) excluded. */
const W_SAMPLES = 16;
/** Samples every 10° of heading ψ to the fall line (the end of a roll on a slope turns fast over a short length). */
const PSI_SAMPLES = 18;
/** The last coarse sample in w, just before rest. */
export const W_LAST = 1e-12;

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
  if (!green.closedForm)
    throw new RangeError("planarRollField: the closed form needs the closed-form forces (gravity on a plane, constant rolling resistance)");
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
  return {
    gravityDecelMps2: ag,
    rollingDecelMps2: ar,
    k,
    n,
    fallLine: green.fallLine,
    straight,
    sampleW,
    sampleLnW,
    sampleR,
    psiU,
    psiLnU,
  };
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
