// Height maps in and out: CSV grids and spot heights (papaparse), spot heights onto a grid (delaunator's Delaunay
// triangulation, linear within each triangle), and the validation every upload passes, with row/column errors.
import Delaunator from "delaunator";
import Papa from "papaparse";
import { HEIGHT_MAP_LIMITS, type HeightMapSummary, type StoredHeightMap } from "./schemas/height-map";
import { parseDecimal } from "./units";

/** `{ ok: true, value }` or field errors keyed by where they are ("row 3, column 5", "spacingM", …). */
export type Checked<T> = { ok: true; value: T } | { ok: false; message: string; errors: Record<string, string> };

const MAX_ERRORS = 20;

function collector() {
  const errors: Record<string, string> = {};
  let count = 0;
  return {
    errors,
    add(where: string, why: string) {
      count++;
      if (Object.keys(errors).length < MAX_ERRORS) errors[where] ??= why;
    },
    get count() {
      return count;
    },
  };
}

const fail = <T>(message: string, errors: Record<string, string>): Checked<T> => ({ ok: false, message, errors });

/**
 * A CSV grid of heights (m): one line per row, north to south, values west to east, comma or semicolon separated,
 * no header; lines starting with # are comments. Empty cells, text and NaN are errors named by row and column
 * (1-based, counting data lines), as are rows of the wrong length.
 */
export function parseHeightGridCsv(text: string): Checked<number[][]> {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), {
    skipEmptyLines: "greedy",
    comments: "#",
    delimitersToGuess: [",", ";", "\t"],
  });
  const rows = parsed.data;
  if (rows.length === 0) return fail("The file has no rows of heights.", { file: "no rows of heights" });
  const errs = collector();
  const width = rows[0]!.length;
  const heights: number[][] = [];
  rows.forEach((row, r) => {
    if (row.length !== width) errs.add(`row ${r + 1}`, `has ${row.length} values; row 1 has ${width} (every row needs the same number)`);
    heights.push(
      row.map((cell, c) => {
        const t = cell.trim();
        const v = parseDecimal(t) ?? Number.NaN;
        if (!Number.isFinite(v))
          errs.add(
            `row ${r + 1}, column ${c + 1}`,
            t === "" ? "is empty (a hole in the grid)" : `"${t.slice(0, 20)}" is not a height in metres`,
          );
        return v;
      }),
    );
  });
  if (errs.count > 0) return fail(`The grid has ${errs.count} problem(s).`, errs.errors);
  return { ok: true, value: heights };
}

/** A CSV of spot heights: rows x,y,z in metres (an optional header line x,y,z; # comments). */
export function parseSpotHeightsCsv(text: string): Checked<[number, number, number][]> {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), {
    skipEmptyLines: "greedy",
    comments: "#",
    delimitersToGuess: [",", ";", "\t"],
  });
  let rows = parsed.data;
  if (rows.length > 0 && rows[0]!.map((c) => c.trim().toLowerCase()).join(",") === "x,y,z") rows = rows.slice(1);
  const errs = collector();
  const points: [number, number, number][] = [];
  rows.forEach((row, r) => {
    if (row.length !== 3) {
      errs.add(`row ${r + 1}`, `has ${row.length} values; a spot height is x,y,z`);
      return;
    }
    const v = row.map((c) => parseDecimal(c) ?? Number.NaN);
    v.forEach((x, c) => {
      if (!Number.isFinite(x)) errs.add(`row ${r + 1}, column ${c + 1}`, "is not a number");
    });
    points.push([v[0]!, v[1]!, v[2]!]);
  });
  if (errs.count > 0) return fail(`The spot heights have ${errs.count} problem(s).`, errs.errors);
  return { ok: true, value: points };
}

/**
 * Spot heights onto a regular grid over their bounding box (origin at its south-west corner): Delaunay triangulation
 * by delaunator, then the linear interpolant on each triangle (a TIN, the surveyor's standard surface). Every grid
 * node must lie inside the surveyed area (the convex hull of the points): survey the corners, or send a grid.
 */
export function gridFromSpotHeights(points: readonly (readonly [number, number, number])[], spacingM: number): Checked<StoredHeightMap> {
  if (points.length < HEIGHT_MAP_LIMITS.spots.min)
    return fail("Too few spot heights.", { points: `at least ${HEIGHT_MAP_LIMITS.spots.min} spot heights` });
  if (points.length > HEIGHT_MAP_LIMITS.spots.max)
    return fail("Too many spot heights.", { points: `at most ${HEIGHT_MAP_LIMITS.spots.max} spot heights` });
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const nx = Math.floor((maxX - minX) / spacingM + 1e-9) + 1;
  const ny = Math.floor((maxY - minY) / spacingM + 1e-9) + 1;
  const size = checkSize<StoredHeightMap>(nx, ny);
  if (size) return size;
  const delaunay = Delaunator.from(
    [...points],
    (p) => p[0],
    (p) => p[1],
  );
  const tri = delaunay.triangles;
  if (tri.length === 0) return fail("The spot heights lie on a line.", { points: "they lie on one line: no surface can be fitted" });
  const heights = Array.from({ length: ny }, () => new Array<number>(nx).fill(Number.NaN));
  const eps = 1e-9 * Math.max(maxX - minX, maxY - minY, 1);
  for (let t = 0; t < tri.length; t += 3) {
    const [a, b, c] = [points[tri[t]!]!, points[tri[t + 1]!]!, points[tri[t + 2]!]!];
    const det = (b[1] - c[1]) * (a[0] - c[0]) + (c[0] - b[0]) * (a[1] - c[1]);
    if (Math.abs(det) < 1e-15) continue;
    const i0 = Math.max(0, Math.ceil((Math.min(a[0], b[0], c[0]) - minX - eps) / spacingM));
    const i1 = Math.min(nx - 1, Math.floor((Math.max(a[0], b[0], c[0]) - minX + eps) / spacingM));
    const j0 = Math.max(0, Math.ceil((Math.min(a[1], b[1], c[1]) - minY - eps) / spacingM));
    const j1 = Math.min(ny - 1, Math.floor((Math.max(a[1], b[1], c[1]) - minY + eps) / spacingM));
    for (let j = j0; j <= j1; j++) {
      const y = minY + j * spacingM;
      for (let i = i0; i <= i1; i++) {
        const x = minX + i * spacingM;
        // Barycentric weights of (x, y) in the triangle; inside (within rounding) when all are ≥ 0.
        const wa = ((b[1] - c[1]) * (x - c[0]) + (c[0] - b[0]) * (y - c[1])) / det;
        const wb = ((c[1] - a[1]) * (x - c[0]) + (a[0] - c[0]) * (y - c[1])) / det;
        const wc = 1 - wa - wb;
        if (wa < -1e-9 || wb < -1e-9 || wc < -1e-9) continue;
        heights[ny - 1 - j]![i] = wa * a[2] + wb * b[2] + wc * c[2];
      }
    }
  }
  let outside = 0;
  for (const row of heights) for (const v of row) if (Number.isNaN(v)) outside++;
  if (outside > 0) {
    return fail("Part of the grid lies outside the surveyed area.", {
      points: `${outside} of ${nx * ny} grid nodes lie outside the area the spot heights enclose (their convex hull); add spot heights at the corners`,
    });
  }
  const stored: StoredHeightMap = { spacingM, originM: [minX, minY], heightsM: heights, source: "spots", spotCount: points.length };
  return validateHeightMap(stored);
}

function checkSize<T>(nx: number, ny: number): Checked<T> | null {
  const L = HEIGHT_MAP_LIMITS;
  if (nx < L.minNodesPerSide || ny < L.minNodesPerSide) {
    return fail("The grid is too small.", { heightsM: `at least ${L.minNodesPerSide}×${L.minNodesPerSide} heights (got ${nx}×${ny})` });
  }
  if (nx > L.maxNodesPerSide || ny > L.maxNodesPerSide || nx * ny > L.maxNodes) {
    return fail("The grid is too large.", {
      heightsM: `at most ${L.maxNodesPerSide} per side and ${L.maxNodes} heights in all (got ${nx}×${ny} = ${nx * ny}); use a coarser spacing`,
    });
  }
  return null;
}

/**
 * Checks a grid: size within limits, every height finite and within ±100 m, rows of equal length, and no grade
 * between neighbouring nodes over 15 % (named by row and column, rows counted from the north edge, 1-based).
 */
export function validateHeightMap(map: StoredHeightMap): Checked<StoredHeightMap> {
  const rows = map.heightsM;
  const ny = rows.length;
  const nx = ny > 0 ? rows[0]!.length : 0;
  const size = checkSize<StoredHeightMap>(nx, ny);
  if (size) return size;
  const errs = collector();
  rows.forEach((row, r) => {
    if (row.length !== nx) errs.add(`row ${r + 1}`, `has ${row.length} values; row 1 has ${nx} (every row needs the same number)`);
    row.forEach((v, c) => {
      if (!Number.isFinite(v)) errs.add(`row ${r + 1}, column ${c + 1}`, "is not a finite height (a hole in the grid)");
      else if (Math.abs(v) > HEIGHT_MAP_LIMITS.maxAbsHeightM)
        errs.add(`row ${r + 1}, column ${c + 1}`, `${v} m is beyond ±${HEIGHT_MAP_LIMITS.maxAbsHeightM} m`);
    });
  });
  if (errs.count > 0) return fail(`The grid has ${errs.count} problem(s).`, errs.errors);
  const h = map.spacingM;
  const max = HEIGHT_MAP_LIMITS.maxSlopePct;
  for (let r = 0; r < ny; r++) {
    for (let c = 0; c < nx; c++) {
      const v = rows[r]![c]!;
      if (c + 1 < nx) {
        const g = (100 * Math.abs(rows[r]![c + 1]! - v)) / h;
        if (g > max)
          errs.add(
            `row ${r + 1}, column ${c + 1}`,
            `grade ${g.toFixed(1)} % to column ${c + 2} is over ${max} %: check the heights and the spacing`,
          );
      }
      if (r + 1 < ny) {
        const g = (100 * Math.abs(rows[r + 1]![c]! - v)) / h;
        if (g > max)
          errs.add(
            `row ${r + 1}, column ${c + 1}`,
            `grade ${g.toFixed(1)} % to row ${r + 2} is over ${max} %: check the heights and the spacing`,
          );
      }
    }
  }
  if (errs.count > 0) return fail(`${errs.count} grade(s) over ${max} % between neighbouring heights.`, errs.errors);
  return { ok: true, value: map };
}

/** Size, extent, height range and the steepest grade between neighbours of a validated map. */
export function summarizeHeightMap(map: StoredHeightMap): HeightMapSummary {
  const rows = map.heightsM;
  const ny = rows.length;
  const nx = rows[0]!.length;
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  let slope = 0;
  for (let r = 0; r < ny; r++) {
    for (let c = 0; c < nx; c++) {
      const v = rows[r]![c]!;
      min = Math.min(min, v);
      max = Math.max(max, v);
      if (c + 1 < nx) slope = Math.max(slope, Math.abs(rows[r]![c + 1]! - v));
      if (r + 1 < ny) slope = Math.max(slope, Math.abs(rows[r + 1]![c]! - v));
    }
  }
  return {
    nx,
    ny,
    spacingM: map.spacingM,
    originM: map.originM,
    widthM: (nx - 1) * map.spacingM,
    depthM: (ny - 1) * map.spacingM,
    minHeightM: min,
    maxHeightM: max,
    maxSlopePct: (100 * slope) / map.spacingM,
    source: map.source,
    spotCount: map.spotCount,
  };
}
