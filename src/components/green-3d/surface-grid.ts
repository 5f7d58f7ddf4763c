// A green's height map as the pictures draw it: sampled from physics' smooth surface onto a raster, contour lines by
// marching squares, height colours, and the mesh of the 3D view. Pure (no three.js), so the 2D map, the 3D scene and
// the tests share it without pulling the 3D chunk.
//
// Green frame (shared/schemas/height-map.ts): x east, y north, metres; the stored rows run north to south and the
// origin is the south-west corner.
import { surfaceFromGrid, type HeightSurface } from "../../../physics";

export type HeightMapGrid = {
  spacingM: number;
  originM: readonly [number, number];
  heightsM: ReadonlyArray<ReadonlyArray<number>>;
};

export type Bounds = { minX: number; maxX: number; minY: number; maxY: number };

export function gridBounds(map: HeightMapGrid): Bounds {
  const ny = map.heightsM.length;
  const nx = map.heightsM[0]?.length ?? 0;
  const [x0, y0] = map.originM;
  return { minX: x0, maxX: x0 + (nx - 1) * map.spacingM, minY: y0, maxY: y0 + (ny - 1) * map.spacingM };
}

/** Heights sampled on a regular lattice over the map: `values[r * cols + c]` at (minX + c·dx, maxY − r·dy), row 0 north. */
export type HeightRaster = {
  cols: number;
  rows: number;
  dx: number;
  dy: number;
  bounds: Bounds;
  values: Float64Array;
  minM: number;
  maxM: number;
};

/**
 * Samples the C¹ surface the physics rolls on (bicubic Hermite through every node), a few samples per grid cell and
 * at most `maxPerSide` per side, so contours and shading are smooth where the grid is coarse.
 */
export function heightRaster(map: HeightMapGrid, maxPerSide = 128, surface: HeightSurface = surfaceFromGrid(map)): HeightRaster {
  const bounds = gridBounds(map);
  const ny = map.heightsM.length;
  const nx = map.heightsM[0]?.length ?? 0;
  const cols = Math.max(2, Math.min(maxPerSide, (nx - 1) * 4 + 1));
  const rows = Math.max(2, Math.min(maxPerSide, (ny - 1) * 4 + 1));
  const dx = (bounds.maxX - bounds.minX) / (cols - 1);
  const dy = (bounds.maxY - bounds.minY) / (rows - 1);
  const values = new Float64Array(cols * rows);
  let minM = Number.POSITIVE_INFINITY;
  let maxM = Number.NEGATIVE_INFINITY;
  for (let r = 0; r < rows; r++) {
    const y = r === rows - 1 ? bounds.minY : bounds.maxY - r * dy;
    for (let c = 0; c < cols; c++) {
      const x = c === cols - 1 ? bounds.maxX : bounds.minX + c * dx;
      const h = surface.heightAt(x, y);
      values[r * cols + c] = h;
      if (h < minM) minM = h;
      if (h > maxM) maxM = h;
    }
  }
  return { cols, rows, dx, dy, bounds, values, minM, maxM };
}

export type ContourSegment = { heightM: number; from: [number, number]; to: [number, number] };

/**
 * Lines of equal height every `intervalM` (levels k·interval), by marching squares on the raster, as segments in the
 * green frame. The two-way cells (a saddle) are split by the cell's mean height, the usual disambiguation.
 */
export function contourLines(raster: HeightRaster, intervalM: number): ContourSegment[] {
  const out: ContourSegment[] = [];
  if (!(intervalM > 0)) return out;
  const { cols, rows, dx, dy, bounds, values } = raster;
  const first = Math.ceil(raster.minM / intervalM);
  const last = Math.floor(raster.maxM / intervalM);
  const X = (c: number) => bounds.minX + c * dx;
  const Y = (r: number) => bounds.maxY - r * dy;
  for (let k = first; k <= last; k++) {
    const level = k * intervalM;
    for (let r = 0; r < rows - 1; r++) {
      for (let c = 0; c < cols - 1; c++) {
        const a = values[r * cols + c]!; // north-west
        const b = values[r * cols + c + 1]!; // north-east
        const cc = values[(r + 1) * cols + c + 1]!; // south-east
        const d = values[(r + 1) * cols + c]!; // south-west
        const A = a > level;
        const B = b > level;
        const C = cc > level;
        const D = d > level;
        if (A === B && B === C && C === D) continue;
        const at = (v0: number, v1: number) => (level - v0) / (v1 - v0);
        const top = A !== B ? ([X(c + at(a, b)), Y(r)] as [number, number]) : null;
        const right = B !== C ? ([X(c + 1), Y(r + at(b, cc))] as [number, number]) : null;
        const bottom = C !== D ? ([X(c + 1 - at(cc, d)), Y(r + 1)] as [number, number]) : null;
        const left = D !== A ? ([X(c), Y(r + 1 - at(d, a))] as [number, number]) : null;
        const push = (p: [number, number] | null, q: [number, number] | null) => {
          if (p && q) out.push({ heightM: level, from: p, to: q });
        };
        if (top && right && bottom && left) {
          const centreAbove = (a + b + cc + d) / 4 > level;
          if (centreAbove !== A) {
            // The north-west and south-east corners are cut off.
            push(left, top);
            push(right, bottom);
          } else {
            push(top, right);
            push(bottom, left);
          }
        } else {
          const pts = [top, right, bottom, left].filter((p): p is [number, number] => p !== null);
          push(pts[0] ?? null, pts[1] ?? null);
        }
      }
    }
  }
  return out;
}

/** Height colours of our own, shared with the planar 3D green: darker low ground, lighter high ground. */
export const LOW_RGB: readonly [number, number, number] = [0x2b, 0x66, 0x38];
export const HIGH_RGB: readonly [number, number, number] = [0xb4, 0xdd, 0x8e];

/** The colour (0–255 per channel) of a height between the lowest and highest ground. */
export function heightColour(heightM: number, minM: number, maxM: number): [number, number, number] {
  const t = maxM - minM > 1e-9 ? Math.min(1, Math.max(0, (heightM - minM) / (maxM - minM))) : 0.55;
  return [0, 1, 2].map((i) => Math.round(LOW_RGB[i]! + (HIGH_RGB[i]! - LOW_RGB[i]!) * t)) as [number, number, number];
}

/**
 * The 3D view's mesh: one vertex per raster sample at scene [x − cx, (h − minM)·exaggeration, −(y − cy)] (scene y up,
 * north = −z, as the putt frame's "toward the hole" is −z), height colours 0–1, two triangles per raster cell.
 */
export function surfaceMesh(raster: HeightRaster, exaggeration = 1) {
  const { cols, rows, dx, dy, bounds, values, minM, maxM } = raster;
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  const positions = new Float32Array(cols * rows * 3);
  const colours = new Float32Array(cols * rows * 3);
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const i = r * cols + c;
      const h = values[i]!;
      positions[i * 3] = bounds.minX + c * dx - cx;
      positions[i * 3 + 1] = (h - minM) * exaggeration;
      positions[i * 3 + 2] = -(bounds.maxY - r * dy - cy);
      const [cr, cg, cb] = heightColour(h, minM, maxM);
      colours[i * 3] = cr / 255;
      colours[i * 3 + 1] = cg / 255;
      colours[i * 3 + 2] = cb / 255;
    }
  }
  const index = new Uint32Array((cols - 1) * (rows - 1) * 6);
  let n = 0;
  for (let r = 0; r < rows - 1; r++) {
    for (let c = 0; c < cols - 1; c++) {
      const nw = r * cols + c;
      const ne = nw + 1;
      const sw = nw + cols;
      const se = sw + 1;
      // Counter-clockwise seen from above (+y), so the faces look up.
      index.set([nw, sw, ne, ne, sw, se], n);
      n += 6;
    }
  }
  return { positions, colours, index, centre: [cx, cy] as [number, number] };
}

/** Green-frame point and height → scene [x, y, z] for the same mesh (heights relative to the map's lowest ground). */
export function greenToScene(x: number, y: number, heightM: number, raster: HeightRaster, exaggeration = 1): [number, number, number] {
  const cx = (raster.bounds.minX + raster.bounds.maxX) / 2;
  const cy = (raster.bounds.minY + raster.bounds.maxY) / 2;
  return [x - cx, (heightM - raster.minM) * exaggeration, -(y - cy)];
}
