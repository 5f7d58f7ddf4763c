// The putt frame and the 3D scene, mapped explicitly. Pure: no three.js here, so the 2D fallback, the pages and
// the tests can use it without pulling the 3D chunk.
//
// Putt frame (product brief): ball at (0, 0), hole at (0, D), x to the golfer's right looking at the hole,
// fallLineDeg clockwise from ball→hole seen from above (0 = downhill putt, 90 = falls to the right).
// Scene (three.js, right-handed, y up): scene x = putt x, scene y = height, scene z = −putt y. A camera behind the
// ball looking down −z then has the golfer's right on its right.

export type PuttPlane = {
  slopePct: number;
  fallLineDeg: number;
  /** heights drawn this many times steeper (1 = true) */ exaggeration?: number;
};
export type Vec2 = readonly [number, number];
export type Vec3 = [number, number, number];

const RAD = Math.PI / 180;

/** Unit vector the green falls toward, in the putt frame: (sin φ, cos φ). */
export function fallVector(fallLineDeg: number): [number, number] {
  return [Math.sin(fallLineDeg * RAD), Math.cos(fallLineDeg * RAD)];
}

/**
 * Height of the green at (x, y) in the putt frame, m, relative to the ball: h = −tanθ·(x·sin φ + y·cos φ),
 * tanθ = slopePct/100. It falls along the fall line: a downhill putt's hole lies below the ball.
 */
export function heightAtM(xM: number, yM: number, plane: PuttPlane): number {
  const [ux, uy] = fallVector(plane.fallLineDeg);
  return -(plane.slopePct / 100) * (plane.exaggeration ?? 1) * (xM * ux + yM * uy);
}

/** Putt-frame point (x, y) and height h → scene [x, y, z] = [x, h, −y]. */
export function puttToScene(xM: number, yM: number, hM: number): Vec3 {
  return [xM, hM, yM === 0 ? 0 : -yM];
}

/** A point on the green's surface (plus `liftM` above it), in scene coordinates. */
export function surfacePoint(xM: number, yM: number, plane: PuttPlane, liftM = 0): Vec3 {
  return puttToScene(xM, yM, heightAtM(xM, yM, plane) + liftM);
}

/** Scene [x, y, z] → putt-frame [x, y] (the height is dropped). */
export function sceneToPutt(x: number, _y: number, z: number): [number, number] {
  return [x, z === 0 ? 0 : -z];
}

/** Unit normal of the tilted plane in scene coordinates: ∝ (t·sin φ, 1, −t·cos φ), t = tanθ·exaggeration. */
export function surfaceNormal(plane: PuttPlane): Vec3 {
  const t = (plane.slopePct / 100) * (plane.exaggeration ?? 1);
  const [ux, uy] = fallVector(plane.fallLineDeg);
  const n: Vec3 = [t * ux, 1, -t * uy];
  const len = Math.hypot(n[0], n[1], n[2]);
  return [n[0] / len, n[1] / len, n[2] / len];
}

/** The green drawn around a putt: an ellipse in the putt frame wide enough for the break and a roll past. */
export type GreenShape = { cx: number; cy: number; a: number; b: number };

export function greenShape(distanceM: number): GreenShape {
  return { cx: 0, cy: distanceM / 2 + 0.4, a: Math.max(2.6, 0.5 * distanceM + 1.6), b: distanceM / 2 + 2.2 };
}

/** Points around the ellipse, counter-clockwise in the putt frame. */
export function ellipsePoints(shape: GreenShape, count = 96, grow = 0): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < count; i++) {
    const t = (i / count) * 2 * Math.PI;
    out.push([shape.cx + (shape.a + grow) * Math.cos(t), shape.cy + (shape.b + grow) * Math.sin(t)]);
  }
  return out;
}

/** Lowest and highest true heights on the green (m, relative to the ball), and where they are. */
export function heightRange(
  shape: GreenShape,
  plane: PuttPlane,
): { minM: number; maxM: number; highPoint: [number, number]; lowPoint: [number, number] } {
  const [ux, uy] = fallVector(plane.fallLineDeg);
  const r = Math.hypot(shape.a * ux, shape.b * uy);
  // Extremes of p·u over the ellipse lie at the centre ± (a²·ux, b²·uy)/r.
  const dx = r === 0 ? 0 : (shape.a * shape.a * ux) / r;
  const dy = r === 0 ? 0 : (shape.b * shape.b * uy) / r;
  const low: [number, number] = [shape.cx + dx, shape.cy + dy];
  const high: [number, number] = [shape.cx - dx, shape.cy - dy];
  const flat = { ...plane, exaggeration: 1 };
  return { minM: heightAtM(low[0], low[1], flat), maxM: heightAtM(high[0], high[1], flat), highPoint: high, lowPoint: low };
}

const METRIC_INTERVALS_M = [0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5];
const IMPERIAL_INTERVALS_M = [0.25, 0.5, 1, 2, 4, 8, 16].map((inches) => inches * 0.0254);

/**
 * Height between contour lines, m: the smallest round step (cm or inches) that draws at most `maxLines` lines
 * across the green. Null on a flat green.
 */
export function contourIntervalM(rangeM: number, units: "metric" | "imperial", maxLines = 12): number | null {
  if (!(rangeM > 1e-6)) return null;
  const steps = units === "imperial" ? IMPERIAL_INTERVALS_M : METRIC_INTERVALS_M;
  return steps.find((s) => rangeM / s <= maxLines) ?? steps[steps.length - 1]!;
}

/**
 * Contour lines of the planar green clipped to its ellipse: for each height k·interval, the chord where
 * h(x, y) = k·interval, as two putt-frame end points and the (true) height.
 */
export function contourSegments(
  shape: GreenShape,
  plane: PuttPlane,
  intervalM: number,
): { heightM: number; from: [number, number]; to: [number, number] }[] {
  const t = plane.slopePct / 100;
  if (!(t > 0) || !(intervalM > 0)) return [];
  const [ux, uy] = fallVector(plane.fallLineDeg);
  const vx = uy;
  const vy = -ux;
  const { minM, maxM } = heightRange(shape, plane);
  const out: { heightM: number; from: [number, number]; to: [number, number] }[] = [];
  for (let k = Math.ceil(minM / intervalM); k * intervalM <= maxM; k++) {
    const heightM = k * intervalM;
    const s = -heightM / t; // p·u on this contour
    const px = s * ux - shape.cx;
    const py = s * uy - shape.cy;
    const A = (vx / shape.a) ** 2 + (vy / shape.b) ** 2;
    const B = 2 * ((px * vx) / shape.a ** 2 + (py * vy) / shape.b ** 2);
    const C = (px / shape.a) ** 2 + (py / shape.b) ** 2 - 1;
    const disc = B * B - 4 * A * C;
    if (disc <= 1e-12) continue;
    const w1 = (-B - Math.sqrt(disc)) / (2 * A);
    const w2 = (-B + Math.sqrt(disc)) / (2 * A);
    out.push({ heightM, from: [s * ux + w1 * vx, s * uy + w1 * vy], to: [s * ux + w2 * vx, s * uy + w2 * vy] });
  }
  return out;
}
