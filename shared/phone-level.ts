// The phone as a level: its gravity reading → the ground's gradient, slope % and fall line, the half-turn correction
// of the sensor's own tilt, and the "held still for two seconds" average. Pure; derivation in docs/sources.md,
// "Measuring on the green with a phone".
//
// Frames. The phone's own (W3C Device Orientation and Motion): x to the right edge of the screen, y to its top edge,
// z out of the screen. Laid face up on the green with its top edge toward the hole, x is the golfer's right and y the
// line ball→hole: the putt frame. On a green map the top edge points at the fixed mark: y is the map's "north".

/** A 3-vector in the phone's frame. */
export type Vec3 = readonly [number, number, number];
/** The ground's gradient in the phone's frame: rise over run along x (right edge) and along y (top edge). */
export type Gradient = readonly [number, number];

/** A gravity sample: `accelerationIncludingGravity` as DeviceMotionEvent gives it (m/s²; null where not measured). */
export type MotionSample = { x: number | null; y: number | null; z: number | null };

/**
 * The unit "up" vector in the phone's frame from accelerationIncludingGravity (which reads +g along up when the phone
 * is at rest). Some browsers report the opposite sign; the phone lies face up, so up is taken on the screen's side
 * (z > 0) either way. Null when a component is missing or the reading is not a phone at rest (|a| off g by > 30 %),
 * or the phone is on its edge (tilted 45° or more).
 */
export function upFromMotion(a: MotionSample | null | undefined): Vec3 | null {
  if (!a || a.x == null || a.y == null || a.z == null) return null;
  const { x, y, z } = a;
  if (![x, y, z].every(Number.isFinite)) return null;
  const n = Math.hypot(x, y, z);
  if (n < 0.7 * STANDARD_GRAVITY || n > 1.3 * STANDARD_GRAVITY) return null;
  const s = z < 0 ? -1 / n : 1 / n;
  const up: Vec3 = [x * s, y * s, z * s];
  return up[2] > Math.SQRT1_2 ? up : null;
}

/**
 * The unit up vector from DeviceOrientationEvent's beta and gamma (degrees). The spec's rotation is
 * R = Rz(alpha)·Rx(beta)·Ry(gamma) (device to earth), so up in the phone's frame is Rᵀ·(0, 0, 1) =
 * (−cos β·sin γ, sin β, cos β·cos γ); alpha (the compass) drops out. Null for missing values or past 45° of tilt.
 */
export function upFromOrientation(betaDeg: number | null | undefined, gammaDeg: number | null | undefined): Vec3 | null {
  if (betaDeg == null || gammaDeg == null || !Number.isFinite(betaDeg) || !Number.isFinite(gammaDeg)) return null;
  const b = (betaDeg * Math.PI) / 180;
  const g = (gammaDeg * Math.PI) / 180;
  const up: Vec3 = [-Math.cos(b) * Math.sin(g), Math.sin(b), Math.cos(b) * Math.cos(g)];
  return up[2] > Math.SQRT1_2 ? up : null;
}

/**
 * The ground's gradient from the up vector. The phone's back lies on the ground, so the angle between up and the
 * phone's z is the ground's tilt θ: u_z = cos θ, |(u_x, u_y)| = sin θ, and the slope tan θ = |(u_x, u_y)|/u_z exactly.
 * (u_x, u_y) points uphill, so the gradient is (u_x, u_y)/u_z (derived in docs/sources.md: on h = −s·x,
 * u = (−s, 0, 1)/√(1 + s²)). Its direction is measured in the phone's plane, which differs from the horizontal by
 * terms of the order of the slope squared (0.04 % of a 2 % slope).
 */
export function gradientFromUp(up: Vec3): [number, number] {
  return [up[0] / up[2], up[1] / up[2]];
}

/** Slope % (rise over run × 100) and the fall line, degrees clockwise from the phone's top edge seen from above. */
export function slopeAndFallLine(g: Gradient): { slopePct: number; fallLineDeg: number } {
  const slopePct = 100 * Math.hypot(g[0], g[1]);
  // Downhill is −∇h; clockwise from +y (the top edge) toward +x (the right): atan2(east, north).
  const deg = slopePct === 0 ? 0 : (Math.atan2(-g[0], -g[1]) * 180) / Math.PI;
  return { slopePct, fallLineDeg: ((deg % 360) + 360) % 360 };
}

export const STANDARD_GRAVITY = 9.80665;

/** One reading held still: the mean up vector, how many samples over how long, and how much they varied. */
export type StillReading = {
  up: Vec3;
  samples: number;
  spanS: number;
  /** Standard deviation of the single samples' slope (both components together), %: how steady the phone was. */
  spreadPct: number;
};

/** How long a reading must be held still, and how still (the phones' own noise is about 0.1–0.2 % a sample). */
export const STILL_RULES = { windowS: 2, maxSpreadPct: 0.5, minSamples: 10 } as const;

/**
 * The reading over the last `windowS` seconds of `samples` (time in seconds, oldest first), or null when that window
 * is not yet full, has too few samples, or the samples vary more than `maxSpreadPct` (the phone is moving).
 */
export function stillReading(
  samples: readonly { t: number; up: Vec3 }[],
  rules: { windowS: number; maxSpreadPct: number; minSamples: number } = STILL_RULES,
): StillReading | null {
  if (samples.length < rules.minSamples) return null;
  const last = samples[samples.length - 1]!.t;
  if (last - samples[0]!.t < rules.windowS) return null;
  let first = samples.length - 1;
  while (first > 0 && last - samples[first - 1]!.t <= rules.windowS) first--;
  const window = samples.slice(first);
  if (window.length < rules.minSamples) return null;
  const sum: [number, number, number] = [0, 0, 0];
  let gx = 0;
  let gy = 0;
  let gxx = 0;
  let gyy = 0;
  for (const { up } of window) {
    sum[0] += up[0];
    sum[1] += up[1];
    sum[2] += up[2];
    const [a, b] = gradientFromUp(up);
    gx += a;
    gy += b;
    gxx += a * a;
    gyy += b * b;
  }
  const n = window.length;
  const variance = Math.max(0, gxx / n - (gx / n) ** 2) + Math.max(0, gyy / n - (gy / n) ** 2);
  const spreadPct = 100 * Math.sqrt(variance);
  if (spreadPct > rules.maxSpreadPct) return null;
  const norm = Math.hypot(sum[0], sum[1], sum[2]);
  return { up: [sum[0] / norm, sum[1] / norm, sum[2] / norm], samples: n, spanS: last - window[0]!.t, spreadPct };
}

/** The result of a reading and a second one with the phone turned half a turn on the same spot. */
export type HalfTurnResult = {
  /** The ground's gradient in the first reading's frame, the sensor's own tilt taken out. */
  gradient: [number, number];
  slopePct: number;
  fallLineDeg: number;
  /** The sensor's own tilt against the phone's back, as a gradient in the first reading's frame and in degrees. */
  sensorTilt: [number, number];
  sensorTiltDeg: number;
  /** How far the two readings disagreed once the half turn is undone (slope %; twice the sensor's own tilt). */
  disagreementPct: number;
};

/**
 * Half-turn correction (common practice for spirit and digital levels; derived in docs/sources.md). Turning the phone
 * half a turn about its normal flips the ground's tilt in the phone's frame, (x, y) → (−x, −y), while the sensor's
 * own tilt against the case stays. So the half-difference of the two up vectors' x, y parts is the ground's and the
 * half-sum the sensor's; z is the mean of both. Exact to second order in the sensor's tilt.
 */
export function halfTurn(first: Vec3, second: Vec3): HalfTurnResult {
  const hx = (first[0] - second[0]) / 2;
  const hy = (first[1] - second[1]) / 2;
  const ox = (first[0] + second[0]) / 2;
  const oy = (first[1] + second[1]) / 2;
  const vz = (first[2] + second[2]) / 2;
  const gradient: [number, number] = [hx / vz, hy / vz];
  const sensorTilt: [number, number] = [ox / vz, oy / vz];
  const g1 = gradientFromUp(first);
  const g2 = gradientFromUp(second);
  return {
    gradient,
    ...slopeAndFallLine(gradient),
    sensorTilt,
    sensorTiltDeg: (Math.atan(Math.hypot(sensorTilt[0], sensorTilt[1])) * 180) / Math.PI,
    disagreementPct: 100 * Math.hypot(g1[0] + g2[0], g1[1] + g2[1]),
  };
}

/** A single reading with a sensor tilt learned earlier (by {@link halfTurn}) taken out. */
export function correctedGradient(up: Vec3, sensorTilt: Gradient): [number, number] {
  const g = gradientFromUp(up);
  return [g[0] - sensorTilt[0], g[1] - sensorTilt[1]];
}

/** Above this the two readings of a half turn disagree too much to trust (a sensor's own tilt is rarely over 0.5°). */
export const HALF_TURN_SUSPECT_PCT = 2;

// The compass: a walk may record, at every spot, which way the phone's top edge points (clockwise from north, seen
// from above), and turn each reading into the green's frame (x east, y north). Derivation in docs/sources.md,
// "Measuring on the green with a phone", the compass.

/** What a DeviceOrientationEvent (or the iOS one) says about the compass; absent fields are null or undefined. */
export type OrientationSample = {
  alpha?: number | null;
  beta?: number | null;
  absolute?: boolean | null;
  /** iOS Safari's own: degrees clockwise from magnetic north, already a heading. */
  webkitCompassHeading?: number | null;
};

const wrap360 = (deg: number) => ((deg % 360) + 360) % 360;

/**
 * The compass heading of the phone's top edge, degrees clockwise from north (0 north, 90 east), or null where the
 * sample carries none. iOS's `webkitCompassHeading` is already that. Otherwise only an absolute event (absolute: true,
 * as `deviceorientationabsolute` sends) counts: its alpha is the W3C rotation about the vertical, counter-clockwise
 * seen from above with 0 when the top edge points north, so the heading is 360 − alpha (exact for any beta below 90°
 * and any gamma: the top edge's horizontal part is (−sin α, cos α)·cos β in (east, north)).
 */
export function headingFromOrientation(e: OrientationSample | null | undefined): number | null {
  if (!e) return null;
  if (e.webkitCompassHeading != null && Number.isFinite(e.webkitCompassHeading) && e.webkitCompassHeading >= 0)
    return wrap360(e.webkitCompassHeading);
  if (e.absolute !== true || e.alpha == null || !Number.isFinite(e.alpha)) return null;
  return wrap360(360 - e.alpha);
}

/** The mean of compass headings (degrees) on the circle, so 359° and 1° average to 0°, not 180°; null for none. */
export function meanHeadingDeg(headings: readonly number[]): number | null {
  if (headings.length === 0) return null;
  let s = 0;
  let c = 0;
  for (const h of headings) {
    s += Math.sin((h * Math.PI) / 180);
    c += Math.cos((h * Math.PI) / 180);
  }
  if (Math.hypot(s, c) < 1e-9 * headings.length) return null;
  return wrap360((Math.atan2(s, c) * 180) / Math.PI);
}

/**
 * A gradient in the phone's frame (x right edge, y top edge) turned into the green's frame (x east, y north), the top
 * edge pointing `headingDeg` clockwise from north. The top edge is t = (sin H, cos H) in (east, north) and the right
 * edge r = (cos H, −sin H) (a quarter turn clockwise of it), so g = g_x·r + g_y·t.
 */
export function phoneToNorthGradient(g: Gradient, headingDeg: number): [number, number] {
  const h = (headingDeg * Math.PI) / 180;
  const c = Math.cos(h);
  const s = Math.sin(h);
  return [g[0] * c + g[1] * s, -g[0] * s + g[1] * c];
}
