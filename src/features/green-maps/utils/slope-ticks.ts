// The slope on the map, our own way: short ticks of one length laid along the fall line, a bead at the low end, each
// coloured by how steep the ground is there (a few named bands). Steepness is read from the colour, never the length.
import type { HeightSurface } from "#physics";
import type { Bounds } from "../../../components/green-3d/surface-grid";

/** The steepness bands, gentlest first: `maxPct` is the band's upper edge. Colours of our own, keyed in the legend. */
export const SLOPE_BANDS = [
  { maxPct: 1, colour: "#f4f1e8", label: "under 1 %" },
  { maxPct: 2, colour: "#f5c842", label: "1–2 %" },
  { maxPct: 3, colour: "#f08a3c", label: "2–3 %" },
  { maxPct: Infinity, colour: "#d9363e", label: "3 % or more" },
] as const;

/** Index into {@link SLOPE_BANDS} of a slope in percent (to 0.01 %, so a plane of exactly 2 % is not 1.999… %). */
export function slopeBand(slopePct: number): number {
  const s = Math.round(slopePct * 100) / 100;
  const i = SLOPE_BANDS.findIndex((b) => s < b.maxPct);
  return i === -1 ? SLOPE_BANDS.length - 1 : i;
}

/** One tick: from its high end to its low end (`to`, where the bead sits), centred on a lattice point. */
export type SlopeTick = { at: [number, number]; from: [number, number]; to: [number, number]; slopePct: number; band: number };

/** Below this grade a tick's direction means nothing (a flat spot): no tick is drawn there. */
export const FLAT_PCT = 0.1;

/**
 * Ticks on a lattice of about `perSide` across the longer side. Every tick is half the lattice step long and runs
 * along −∇h (downhill) through its lattice point.
 */
export function slopeTicks(surface: HeightSurface, bounds: Bounds, perSide = 9): SlopeTick[] {
  const span = Math.max(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY);
  const step = span / perSide;
  const half = 0.25 * step;
  const g: [number, number] = [0, 0];
  const out: SlopeTick[] = [];
  for (let y = bounds.minY + step / 2; y < bounds.maxY; y += step) {
    for (let x = bounds.minX + step / 2; x < bounds.maxX; x += step) {
      surface.gradientAt(x, y, g);
      const grade = Math.hypot(g[0], g[1]);
      const slopePct = grade * 100;
      if (!(slopePct >= FLAT_PCT)) continue;
      const ux = -g[0] / grade;
      const uy = -g[1] / grade;
      out.push({
        at: [x, y],
        from: [x - ux * half, y - uy * half],
        to: [x + ux * half, y + uy * half],
        slopePct,
        band: slopeBand(slopePct),
      });
    }
  }
  return out;
}
