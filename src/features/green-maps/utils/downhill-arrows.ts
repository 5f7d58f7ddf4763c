// Small arrows on the map pointing down the slope, longer where it is steeper: the slope cue a golfer reads first.
import type { HeightSurface } from "../../../../physics";
import type { Bounds } from "../../../components/green-3d/surface-grid";

export type DownhillArrow = { at: [number, number]; to: [number, number]; slopePct: number };

/**
 * Arrows on a lattice of about `perSide` across the longer side, each from its point toward −∇h (downhill), its length
 * in metres proportional to the grade: the steepest on the lattice gets 0.8 of the lattice step.
 */
export function downhillArrows(surface: HeightSurface, bounds: Bounds, perSide = 9): DownhillArrow[] {
  const span = Math.max(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY);
  const step = span / perSide;
  const g: [number, number] = [0, 0];
  const raw: { at: [number, number]; gx: number; gy: number; slope: number }[] = [];
  for (let y = bounds.minY + step / 2; y < bounds.maxY; y += step) {
    for (let x = bounds.minX + step / 2; x < bounds.maxX; x += step) {
      surface.gradientAt(x, y, g);
      raw.push({ at: [x, y], gx: g[0], gy: g[1], slope: Math.hypot(g[0], g[1]) });
    }
  }
  const steepest = Math.max(...raw.map((r) => r.slope), 0);
  if (!(steepest > 1e-6)) return [];
  return raw
    .filter((r) => r.slope > steepest * 0.05)
    .map((r) => {
      const len = (0.8 * step * r.slope) / steepest;
      return { at: r.at, to: [r.at[0] - (r.gx / r.slope) * len, r.at[1] - (r.gy / r.slope) * len], slopePct: r.slope * 100 };
    });
}
