import { describe, expect, it } from "vitest";
import { solveReadOnSurface, standardNormals, surfaceFromGrid } from "../physics";
import { heightsFromGradients, SUSPECT_RESIDUAL_PCT, type WalkedGrid } from "./gradient-map";
import { seededUniform } from "./seeded-random";
import { validateHeightMap } from "./height-map";

// Synthetic greens 8 m × 8 m with slopes of a real green (1–3 %, common practice; docs/sources.md), walked every
// 1 m (9 × 9 spots). Heights and gradients are written out by hand from each formula (derived).
type Surface = { name: string; h: (x: number, y: number) => number; grad: (x: number, y: number) => [number, number] };
const SURFACES: Surface[] = [
  // A plane falling 2 % toward the east-south-east.
  { name: "plane", h: (x, y) => -0.018 * x + 0.008 * y, grad: () => [-0.018, 0.008] },
  // A bowl: 3 % at the middle of each edge.
  { name: "bowl", h: (x, y) => 0.00375 * ((x - 4) ** 2 + (y - 4) ** 2), grad: (x, y) => [0.0075 * (x - 4), 0.0075 * (y - 4)] },
  // A saddle with a 1 % tilt: 3 % at the corners.
  { name: "saddle", h: (x, y) => 0.0075 * (x - 4) * (y - 4) - 0.01 * y, grad: (x, y) => [0.0075 * (y - 4), 0.0075 * (x - 4) - 0.01] },
];
const N = 9;
const S = 1;
/** A steady phone's reading of one spot scatters by about this much (slope %): grass, placement, sensor noise. */
const NOISE_PCT = 0.2;

function walk(surface: Surface, noisePct: number, seed: number): WalkedGrid {
  const z = standardNormals(seededUniform(seed), 2 * N * N);
  const gradients: [number, number][] = [];
  for (let j = 0; j < N; j++)
    for (let i = 0; i < N; i++) {
      const [gx, gy] = surface.grad(i * S, j * S);
      const k = j * N + i;
      gradients.push([gx + (noisePct / 100) * z[2 * k]!, gy + (noisePct / 100) * z[2 * k + 1]!]);
    }
  return { nx: N, ny: N, spacingM: S, gradients };
}

/** The original on a fine 0.25 m grid, rows north to south: what a survey would have stored. */
function surveyed(surface: Surface) {
  const n = 33;
  const heightsM = Array.from({ length: n }, (_, r) => Array.from({ length: n }, (_, i) => surface.h(i * 0.25, (n - 1 - r) * 0.25)));
  return surfaceFromGrid({ spacingM: 0.25, originM: [0, 0], heightsM });
}

function maxHeightError(surface: Surface, heightsM: number[][]): number {
  // Heights are known up to a constant: compare after matching the means.
  const diffs: number[] = [];
  heightsM.forEach((row, r) => row.forEach((v, i) => diffs.push(v - surface.h(i * S, (N - 1 - r) * S))));
  const mean = diffs.reduce((a, b) => a + b, 0) / diffs.length;
  return Math.max(...diffs.map((d) => Math.abs(d - mean)));
}

describe("heights from walked slopes (least squares; docs/sources.md, 'A green from its slopes')", () => {
  it.each(SURFACES)("$name: exact slopes give the exact heights (trapezoid rule exact for quadratics, derived)", (surface) => {
    const rebuilt = heightsFromGradients(walk(surface, 0, 1));
    expect(maxHeightError(surface, rebuilt.heightsM)).toBeLessThan(1e-9);
    expect(rebuilt.rmsResidualPct).toBeLessThan(1e-7);
  });

  // Tolerance: with 0.2 % of noise per reading on 1 m spacing, heights within 8 mm everywhere (the noise integrates
  // like a random walk: 2 mm a step), reads within max(2 cm, 10 %) of the original's aim (the bound).
  it.each(SURFACES.map((s, i) => ({ ...s, seed: 17 + i })))(
    "$name: noisy slopes (σ 0.2 %) rebuild the heights within 8 mm and the reads within max(2 cm, 10 %) of aim",
    (surface) => {
      const grid = walk(surface, NOISE_PCT, surface.seed);
      const rebuilt = heightsFromGradients(grid);
      const error = maxHeightError(surface, rebuilt.heightsM);
      expect(error).toBeLessThan(0.008);
      // The misfit reflects the noise: about the noise's size, not zero, not many times it.
      expect(rebuilt.rmsResidualPct).toBeGreaterThan(0.05);
      expect(rebuilt.rmsResidualPct).toBeLessThan(2 * NOISE_PCT);

      const stored = validateHeightMap({ spacingM: S, originM: [0, 0], heightsM: rebuilt.heightsM, source: "grid", spotCount: null });
      expect(stored.ok).toBe(true);
      const original = surveyed(surface);
      const walked = surfaceFromGrid({ spacingM: S, originM: [0, 0], heightsM: rebuilt.heightsM });
      for (const [ballM, holeM] of [
        [
          [4, 1],
          [4.6, 6.5],
        ],
        [
          [1, 3.5],
          [6.8, 4.4],
        ],
      ] as const) {
        const a = solveReadOnSurface({ surface: original, stimpFt: 10, ballM, holeM });
        const b = solveReadOnSurface({ surface: walked, stimpFt: 10, ballM, holeM });
        expect(a.ok && b.ok).toBe(true);
        if (!a.ok || !b.ok) continue;
        const aimA = a.read.aimOffsetM!;
        const aimB = b.read.aimOffsetM!;
        expect(Math.abs(aimB - aimA)).toBeLessThanOrEqual(Math.max(0.02, 0.1 * Math.abs(aimA)));
      }
    },
  );

  it("a single bad reading (3 % off: the phone on a tuft) has the largest misfit and is flagged", () => {
    const grid = walk(SURFACES[1]!, NOISE_PCT, 5);
    const bad = 4 * N + 6;
    const gradients = grid.gradients.map((g, k) => (k === bad ? ([g[0] + 0.03, g[1]] as [number, number]) : g));
    const rebuilt = heightsFromGradients({ ...grid, gradients });
    const worst = rebuilt.residualPct.indexOf(Math.max(...rebuilt.residualPct));
    expect(worst).toBe(bad);
    expect(rebuilt.residualPct[bad]).toBeGreaterThan(SUSPECT_RESIDUAL_PCT);
    // With the plain noise only, no spot is flagged on this walk, nor (19 in 20) on others (measured on 59 seeds).
    expect(Math.max(...heightsFromGradients(grid).residualPct)).toBeLessThan(SUSPECT_RESIDUAL_PCT);
    const flagged = Array.from({ length: 40 }, (_, seed) =>
      Math.max(...heightsFromGradients(walk(SURFACES[1]!, NOISE_PCT, 100 + seed)).residualPct),
    ).filter((m) => m >= SUSPECT_RESIDUAL_PCT).length;
    expect(flagged).toBeLessThanOrEqual(4);
  });

  it("rows are stored north to south: the far row (toward the mark) of a green rising toward it comes first and highest", () => {
    const grid: WalkedGrid = { nx: 3, ny: 3, spacingM: 2, gradients: Array.from({ length: 9 }, () => [0, 0.01] as [number, number]) };
    const { heightsM } = heightsFromGradients(grid);
    // Rising 1 % over 2 m per row: 0.02 m between rows; mean 0 → +0.02, 0, −0.02 (hand-computed).
    heightsM.forEach((row, r) => row.forEach((v) => expect(v).toBeCloseTo([0.02, 0, -0.02][r]!, 12)));
  });

  it("refuses a grid whose count of readings does not match its size", () => {
    expect(() => heightsFromGradients({ nx: 3, ny: 3, spacingM: 1, gradients: [[0, 0]] })).toThrow(RangeError);
  });
});
