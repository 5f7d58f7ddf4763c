// A green's height map as a smooth surface: C¹ bicubic Hermite interpolation of a regular grid, with its gradient.

/**
 * A regular grid of heights in the green's own frame (x east/right, y north/up the map), metres, rows north to south
 * as a map is read: `heightsM[r][i]` is the height at (originM[0] + i·spacingM, originM[1] + (ny − 1 − r)·spacingM),
 * so the last row is the south edge through the origin (the south-west corner). At least 2×2.
 */
export interface HeightGrid {
  readonly spacingM: number;
  readonly originM: readonly [number, number];
  readonly heightsM: readonly (readonly number[])[];
}

/** A smooth height field: height (m) and gradient (dimensionless, rise over run) at any point of its rectangle. */
export interface HeightSurface {
  readonly bounds: { readonly minX: number; readonly maxX: number; readonly minY: number; readonly maxY: number };
  /** Whether (x, y) lies on the map (boundary included). */
  contains(x: number, y: number): boolean;
  heightAt(x: number, y: number): number;
  /** Writes [∂h/∂x, ∂h/∂y] into `out` (allocation-free for the integrator) and returns it. */
  gradientAt(x: number, y: number, out: [number, number]): [number, number];
}

// Cubic Hermite basis on [0, 1] and its derivatives (textbook: h00, h01 carry values, h10, h11 tangents).
const A0 = (t: number) => (1 + 2 * t) * (1 - t) * (1 - t);
const A1 = (t: number) => t * t * (3 - 2 * t);
const B0 = (t: number) => t * (1 - t) * (1 - t);
const B1 = (t: number) => t * t * (t - 1);
const dA0 = (t: number) => 6 * t * t - 6 * t;
const dA1 = (t: number) => -6 * t * t + 6 * t;
const dB0 = (t: number) => 3 * t * t - 4 * t + 1;
const dB1 = (t: number) => 3 * t * t - 2 * t;

/**
 * The C¹ bicubic Hermite surface through every grid height, with node derivatives from finite differences (central
 * inside, second-order one-sided at the edges; Fxy the central difference of Fx) — the scheme of e.g. Apache Commons
 * Math's BicubicInterpolator (textbook: de Boor, "A Practical Guide to Splines", 1978, ch. on bicubic Hermite).
 * It reproduces a plane exactly (its gradient is the plane's everywhere), so the planar roll is its special case.
 * Written here rather than taken from a package because physics/ may import only odex and mathjs (which has no 2-D
 * interpolation) and the equation of motion needs the interpolant's analytic gradient (see DEVELOPERS.md).
 * @example surfaceFromGrid({ spacingM: 1, originM: [0, 0], heightsM: [[0, 0.02], [0, 0.02]] }).gradientAt(0.5, 0.5, [0, 0]) // [0.02, 0]
 */
export function surfaceFromGrid(grid: HeightGrid): HeightSurface {
  const h = grid.spacingM;
  const ny = grid.heightsM.length;
  const nx = ny > 0 ? grid.heightsM[0]!.length : 0;
  if (!(h > 0) || !Number.isFinite(h)) throw new RangeError(`spacingM must be > 0 (got ${h})`);
  if (nx < 2 || ny < 2) throw new RangeError(`a height grid needs at least 2×2 nodes (got ${nx}×${ny})`);
  const F = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    const r = ny - 1 - j;
    const row = grid.heightsM[r]!;
    if (row.length !== nx) throw new RangeError(`row ${r} has ${row.length} heights, expected ${nx}`);
    for (let i = 0; i < nx; i++) {
      const v = row[i]!;
      if (!Number.isFinite(v)) throw new RangeError(`height at row ${r}, column ${i} is not a finite number`);
      F[j * nx + i] = v;
    }
  }
  const diff = (get: (k: number) => number, k: number, n: number): number => {
    if (n === 2) return get(1) - get(0);
    if (k === 0) return (-3 * get(0) + 4 * get(1) - get(2)) / 2;
    if (k === n - 1) return (3 * get(n - 1) - 4 * get(n - 2) + get(n - 3)) / 2;
    return (get(k + 1) - get(k - 1)) / 2;
  };
  // Derivatives per grid step (∂f/∂i, ∂f/∂j, ∂²f/∂i∂j).
  const Fx = new Float64Array(nx * ny);
  const Fy = new Float64Array(nx * ny);
  const Fxy = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) Fx[j * nx + i] = diff((k) => F[j * nx + k]!, i, nx);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) Fy[j * nx + i] = diff((k) => F[k * nx + i]!, j, ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) Fxy[j * nx + i] = diff((k) => Fx[k * nx + i]!, j, ny);

  const [x0, y0] = grid.originM;
  const bounds = { minX: x0, maxX: x0 + (nx - 1) * h, minY: y0, maxY: y0 + (ny - 1) * h };
  const cell = (x: number, y: number) => {
    const gx = (x - x0) / h;
    const gy = (y - y0) / h;
    const i = Math.min(Math.max(Math.floor(gx), 0), nx - 2);
    const j = Math.min(Math.max(Math.floor(gy), 0), ny - 2);
    return { i, j, u: gx - i, v: gy - j, k: j * nx + i };
  };
  const corner = (arr: Float64Array, k: number, a: number, b: number) => arr[k + b * nx + a]!;
  const patch = (k: number, au: readonly number[], bu: readonly number[], av: readonly number[], bv: readonly number[]) => {
    let s = 0;
    for (let a = 0; a < 2; a++) {
      for (let b = 0; b < 2; b++) {
        s +=
          corner(F, k, a, b) * au[a]! * av[b]! +
          corner(Fx, k, a, b) * bu[a]! * av[b]! +
          corner(Fy, k, a, b) * au[a]! * bv[b]! +
          corner(Fxy, k, a, b) * bu[a]! * bv[b]!;
      }
    }
    return s;
  };
  return {
    bounds,
    contains: (x, y) => x >= bounds.minX && x <= bounds.maxX && y >= bounds.minY && y <= bounds.maxY,
    heightAt(x, y) {
      const c = cell(x, y);
      return patch(c.k, [A0(c.u), A1(c.u)], [B0(c.u), B1(c.u)], [A0(c.v), A1(c.v)], [B0(c.v), B1(c.v)]);
    },
    gradientAt(x, y, out) {
      const c = cell(x, y);
      const au = [A0(c.u), A1(c.u)];
      const bu = [B0(c.u), B1(c.u)];
      const av = [A0(c.v), A1(c.v)];
      const bv = [B0(c.v), B1(c.v)];
      out[0] = patch(c.k, [dA0(c.u), dA1(c.u)], [dB0(c.u), dB1(c.u)], av, bv) / h;
      out[1] = patch(c.k, au, bu, [dA0(c.v), dA1(c.v)], [dB0(c.v), dB1(c.v)]) / h;
      return out;
    },
  };
}
