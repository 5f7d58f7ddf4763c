// Plain words for what the scene shows. Signed values: + = the golfer's right.
import { formatShort, metresToHoleWidths, type UnitSystem } from "../../../shared/units";

/** Which way the green falls, in words, from the golfer's point of view ("falls to your right and away"). */
export function fallLineWords(fallLineDeg: number): string {
  const r = (fallLineDeg * Math.PI) / 180;
  const side = Math.sin(r);
  const along = Math.cos(r);
  const slight = Math.sin((15 * Math.PI) / 180);
  if (Math.abs(side) <= slight) return along > 0 ? "falls toward the hole (downhill putt)" : "falls toward you (uphill putt)";
  const sideWords = side > 0 ? "falls to your right" : "falls to your left";
  if (Math.abs(along) <= slight) return `${sideWords} (side hill)`;
  return `${sideWords} and ${along > 0 ? "toward the hole (downhill)" : "toward you (uphill)"}`;
}

/**
 * "39 cm left of the hole" / "straight at the hole"; with no offset (a start line wider than 60°), the start line:
 * "start it 75° left of the hole".
 */
export function aimWords(aimOffsetM: number | null, units: UnitSystem, startLineDeg = 0): string {
  if (aimOffsetM === null) return `start it ${Math.abs(startLineDeg).toFixed(0)}° ${startLineDeg < 0 ? "left" : "right"} of the hole`;
  if (Math.abs(aimOffsetM) < 0.005) return "straight at the hole";
  return `${formatShort(aimOffsetM, units)} ${aimOffsetM < 0 ? "left" : "right"} of the hole`;
}

/** "3.6 hole widths". */
export function holeWidthsWords(m: number): string {
  const w = metresToHoleWidths(Math.abs(m));
  return `${w < 10 ? w.toFixed(1) : Math.round(w)} hole width${w >= 0.95 && w < 1.05 ? "" : "s"}`;
}
