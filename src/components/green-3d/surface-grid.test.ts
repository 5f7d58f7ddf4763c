import { expect, test } from "vitest";
import { contourLines, gridBounds, greenToScene, heightColour, heightRaster, surfaceMesh } from "./surface-grid";

// A plane rising 2 cm per metre to the east: h = 0.02·x over 4 m × 2 m (rows north to south).
const plane = { spacingM: 1, originM: [10, 20] as const, heightsM: [0, 1, 2].map(() => [0, 0.02, 0.04, 0.06, 0.08]) };

test("bounds follow the origin at the south-west corner and the spacing", () => {
  expect(gridBounds(plane)).toEqual({ minX: 10, maxX: 14, minY: 20, maxY: 22 });
});

test("the raster reproduces a plane, row 0 along the north edge", () => {
  const r = heightRaster(plane);
  expect(r.cols).toBe(17);
  expect(r.rows).toBe(9);
  expect(r.minM).toBeCloseTo(0, 9);
  expect(r.maxM).toBeCloseTo(0.08, 9);
  expect(r.values[r.cols - 1]).toBeCloseTo(0.08, 9);
  expect(r.values[(r.rows - 1) * r.cols]).toBeCloseTo(0, 9);
});

test("contours of a plane rising east run north–south at x where h is a whole step", () => {
  const segs = contourLines(heightRaster(plane), 0.02);
  const levels = [...new Set(segs.map((s) => Math.round(s.heightM * 1000)))].sort((a, b) => a - b);
  // Levels strictly inside the range cross cells; 0 and 0.08 lie on the edges.
  expect(levels).toEqual(expect.arrayContaining([20, 40, 60]));
  for (const s of segs.filter((x) => Math.abs(x.heightM - 0.04) < 1e-9)) {
    expect(s.from[0]).toBeCloseTo(12, 6);
    expect(s.to[0]).toBeCloseTo(12, 6);
  }
  // The 4 cm line crosses the whole map from south to north.
  const length = segs
    .filter((x) => Math.abs(x.heightM - 0.04) < 1e-9)
    .reduce((sum, s) => sum + Math.hypot(s.to[0] - s.from[0], s.to[1] - s.from[1]), 0);
  expect(length).toBeCloseTo(2, 6);
});

test("a saddle gives both of its crossing contours", () => {
  const saddle = {
    spacingM: 1,
    originM: [0, 0] as const,
    heightsM: [
      [0.01, -0.01],
      [-0.01, 0.01],
    ],
  };
  const segs = contourLines(heightRaster(saddle, 2), 0.005);
  expect(segs.length).toBeGreaterThan(0);
});

test("colours run from the low green to the light high green; the mesh has two triangles per cell", () => {
  expect(heightColour(0, 0, 1)).toEqual([0x2b, 0x66, 0x38]);
  expect(heightColour(1, 0, 1)).toEqual([0xb4, 0xdd, 0x8e]);
  const r = heightRaster(plane, 5);
  const mesh = surfaceMesh(r, 1);
  expect(mesh.positions.length).toBe(r.cols * r.rows * 3);
  expect(mesh.index.length).toBe((r.cols - 1) * (r.rows - 1) * 6);
  // North is −z, east is +x, heights above the lowest ground.
  expect(greenToScene(14, 22, 0.08, r)).toEqual([2, expect.closeTo(0.08, 9), -1]);
});
