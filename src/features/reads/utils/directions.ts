// Fall-line directions in words. The frame (product brief): fallLineDeg is the direction the green falls toward,
// clockwise from the line ball→hole seen from above. 0 = the green falls away from the golfer toward the hole (a
// downhill putt), 90 = it falls to the golfer's right (the ball breaks left to right), 180 = it falls toward the
// golfer (an uphill putt), 270 = it falls to the left. So 45° lies between "away" and "right": downhill, falling
// right; 135° lies between "right" and "toward you": uphill, falling right.

import { describeFallLine } from "#shared/format";

export type NamedDirection = { deg: number; label: string; detail: string };

export const NAMED_DIRECTIONS: ReadonlyArray<NamedDirection> = [
  { deg: 0, label: "Straight downhill", detail: "falls away toward the hole" },
  { deg: 45, label: "Downhill, falls right", detail: "breaks left to right" },
  { deg: 90, label: "Falls to the right", detail: "side hill, breaks left to right" },
  { deg: 135, label: "Uphill, falls right", detail: "breaks left to right" },
  { deg: 180, label: "Straight uphill", detail: "falls toward you" },
  { deg: 225, label: "Uphill, falls left", detail: "breaks right to left" },
  { deg: 270, label: "Falls to the left", detail: "side hill, breaks right to left" },
  { deg: 315, label: "Downhill, falls left", detail: "breaks right to left" },
];

/** Any angle in degrees to [0, 360). */
export function normaliseDeg(deg: number): number {
  const d = ((deg % 360) + 360) % 360;
  // -0 and floating dust just below 360 become 0.
  return d >= 359.9995 || Object.is(d, -0) ? 0 : d;
}

/** The named direction at exactly this angle, if any. */
export function namedDirectionAt(deg: number): NamedDirection | undefined {
  const d = normaliseDeg(deg);
  return NAMED_DIRECTIONS.find((n) => Math.abs(n.deg - d) < 1e-9);
}

/** The fall line in plain words (shared/format.ts): "falls to the right", "downhill, falls right". */
export { describeFallLine };

/** What a screen reader hears for the dial: "falls to the right, 90°". */
export function fallLineValueText(deg: number): string {
  return `${describeFallLine(deg)}, ${Math.round(normaliseDeg(deg))}°`;
}

/**
 * Angle of a point around a centre, clockwise from "up" on screen, in degrees [0, 360). On the dial the hole is
 * the centre and "up" is away from the golfer (the ball→hole direction), so this is a fallLineDeg.
 */
export function angleFromPoint(dx: number, dyDown: number): number {
  // Screen y grows downward; "up" is −y. atan2(x, −y) measures clockwise from up.
  return normaliseDeg((Math.atan2(dx, -dyDown) * 180) / Math.PI);
}

/** Which way a fall line makes the ball break, in the trade's words. */
export function breakWords(breaks: "left-to-right" | "right-to-left" | "none"): string {
  if (breaks === "left-to-right") return "Breaks left to right";
  if (breaks === "right-to-left") return "Breaks right to left";
  return "Runs straight";
}

/**
 * A short two-part heading for a chart column: the stronger lean first ("Falls right"), then the weaker one
 * ("a little downhill"), or no second part on a quarter.
 */
export function directionHeading(deg: number): { main: string; minor?: string } {
  const rad = (normaliseDeg(deg) * Math.PI) / 180;
  const along = Math.cos(rad);
  const side = Math.sin(rad);
  const slight = Math.sin((15 * Math.PI) / 180);
  const alongWord = along > 0 ? "downhill" : "uphill";
  const sideWord = side > 0 ? "right" : "left";
  if (Math.abs(side) >= Math.abs(along)) {
    return { main: `Falls ${sideWord}`, minor: Math.abs(along) > slight ? `a little ${alongWord}` : undefined };
  }
  return { main: alongWord === "downhill" ? "Downhill" : "Uphill", minor: Math.abs(side) > slight ? `a little ${sideWord}` : undefined };
}
