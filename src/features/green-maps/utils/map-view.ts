// The top-down map's geometry: the green's frame (x east, y north, metres) onto the SVG (north up, same scale both
// ways), and a tap on the screen back to metres on the green.
import type { Bounds } from "../../../components/green-3d/surface-grid";

export type MapLayout = {
  /** The SVG's viewBox size. */
  width: number;
  height: number;
  pad: number;
  /** SVG units per metre. */
  k: number;
  bounds: Bounds;
  toX: (xM: number) => number;
  toY: (yM: number) => number;
};

/** The map's drawing width and margin, SVG units: small enough that its words and markers stay legible on a phone. */
export const MAP_WIDTH = 420;
export const MAP_PAD = 22;

/** The map at `width` SVG units wide (the height follows the green's shape), `pad` round it for the edge labels. */
export function mapLayout(bounds: Bounds, width = MAP_WIDTH, pad = MAP_PAD): MapLayout {
  const spanX = Math.max(bounds.maxX - bounds.minX, 1e-6);
  const spanY = Math.max(bounds.maxY - bounds.minY, 1e-6);
  const k = (width - 2 * pad) / spanX;
  const height = Math.round(spanY * k + 2 * pad);
  return {
    width,
    height,
    pad,
    k,
    bounds,
    toX: (xM) => pad + (xM - bounds.minX) * k,
    toY: (yM) => pad + (bounds.maxY - yM) * k,
  };
}

/** The rectangle the SVG occupies on the screen (from getBoundingClientRect). */
export type ScreenRect = { left: number; top: number; width: number; height: number };

/**
 * A tap at (clientX, clientY) → the point of the green under it, metres in the green's frame, or null off the map.
 * The SVG keeps its viewBox's aspect ratio, so the screen rectangle is the viewBox scaled uniformly.
 */
export function screenToGreen(clientX: number, clientY: number, rect: ScreenRect, layout: MapLayout): [number, number] | null {
  if (!(rect.width > 0) || !(rect.height > 0)) return null;
  const sx = ((clientX - rect.left) / rect.width) * layout.width;
  const sy = ((clientY - rect.top) / rect.height) * layout.height;
  const xM = layout.bounds.minX + (sx - layout.pad) / layout.k;
  const yM = layout.bounds.maxY - (sy - layout.pad) / layout.k;
  const { minX, maxX, minY, maxY } = layout.bounds;
  // A tap a finger's width outside the edge still means the edge.
  const slack = 12 / layout.k;
  if (xM < minX - slack || xM > maxX + slack || yM < minY - slack || yM > maxY + slack) return null;
  return [roundCm(Math.min(maxX, Math.max(minX, xM))), roundCm(Math.min(maxY, Math.max(minY, yM)))];
}

/** Positions to the centimetre: finer than any tap, and short in a request. */
export function roundCm(m: number): number {
  return Math.round(m * 100) / 100 + 0;
}

/** Where the start line passes the hole: `aimOffsetM` to the golfer's right of the hole, across the line ball → hole. */
export function aimSpot(ball: readonly [number, number], hole: readonly [number, number], aimOffsetM: number): [number, number] {
  const d = Math.hypot(hole[0] - ball[0], hole[1] - ball[1]);
  if (d === 0) return [hole[0], hole[1]];
  const ey = [(hole[0] - ball[0]) / d, (hole[1] - ball[1]) / d];
  // The golfer's right of the direction of play (seen from above, x east and y north): (ey.y, −ey.x).
  return [hole[0] + aimOffsetM * ey[1]!, hole[1] - aimOffsetM * ey[0]!];
}
