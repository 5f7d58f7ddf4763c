// The aim-spot picture: putts of a few lengths coming to the hole from every side, each drawn where its aim spot
// lies on a plan of the green around the hole (the figure R. D. Grober's 2011 paper describes; docs/sources.md,
// "Break").
//
// Plan frame (metres, hole at the origin): y points uphill (against the fall line), x to the right of a person
// standing below the hole looking up the slope. A ball sits at bearing β, clockwise from straight uphill of the
// hole: β = 0 is a ball above the hole (a downhill putt), 90 to its right, 180 below it (an uphill putt).
import { feetToMetres, type UnitSystem } from "#shared/units";
import type { BreakChartAnswer } from "./chart-data";

/** Lengths the picture draws: 3, 6, 10, 15 and 20 ft, or 1, 2, 3, 5 and 7 m. */
export function ringLengthsM(units: UnitSystem): number[] {
  return units === "imperial" ? [3, 6, 10, 15, 20].map(feetToMetres) : [1, 2, 3, 5, 7];
}

/** Ball bearings around the hole, every 15°. */
export const RING_BEARINGS_DEG: ReadonlyArray<number> = Array.from({ length: 24 }, (_, i) => i * 15);

/**
 * The putt's fall-line angle (product frame: clockwise from the line ball → hole to the way the green falls) for a
 * ball at bearing β: the ball looks along bearing β + 180°, the green falls along 180°, so the angle is −β.
 */
export function fallLineForBearing(bearingDeg: number): number {
  return (((360 - bearingDeg) % 360) + 360) % 360;
}

/** Fall-line angles to ask the chart API for, one per bearing. */
export function ringFallLineDegs(): number[] {
  return RING_BEARINGS_DEG.map(fallLineForBearing);
}

/**
 * Where an aim spot lies on the plan: the start line passes `aimOffsetM` to the golfer's right of the hole, across
 * the line ball → hole. The ball looks along d = −(sin β, cos β); its right hand is (d.y, −d.x) = (−cos β, sin β).
 */
export function spotOnPlan(bearingDeg: number, aimOffsetM: number): [x: number, y: number] {
  const b = (bearingDeg * Math.PI) / 180;
  return [-Math.cos(b) * aimOffsetM + 0, Math.sin(b) * aimOffsetM + 0];
}

export type RingSpot = { bearingDeg: number; aimOffsetM: number; xM: number; yM: number };
/** One length's aim spots all round the hole; `missing` counts bearings with no spot (won't stop, or a start line past 60°). */
export type AimRing = { distanceM: number; spots: RingSpot[]; missing: number };

/** The chart API's answer (rows = lengths, columns = {@link ringFallLineDegs}) as one ring of spots per length. */
export function aimRings(answer: BreakChartAnswer): AimRing[] {
  const bearingOf = new Map(RING_BEARINGS_DEG.map((b) => [fallLineForBearing(b), b]));
  return answer.distances.map((distanceM, i) => {
    const spots: RingSpot[] = [];
    let missing = 0;
    answer.fallLineDegs.forEach((deg, j) => {
      const bearingDeg = bearingOf.get(deg);
      const cell = answer.cells[i]?.[j];
      if (bearingDeg === undefined) return;
      if (!cell?.ok || cell.aimOffsetM === null) {
        missing++;
        return;
      }
      const [xM, yM] = spotOnPlan(bearingDeg, cell.aimOffsetM);
      spots.push({ bearingDeg, aimOffsetM: cell.aimOffsetM, xM, yM });
    });
    spots.sort((a, b) => a.bearingDeg - b.bearingDeg);
    return { distanceM, spots, missing };
  });
}

/** A tidy grid step for the plan, in metres: about a quarter of its half-width, in whole inches or centimetres. */
export function gridStepM(halfWidthM: number, units: UnitSystem): number {
  const steps = units === "imperial" ? [1, 2, 3, 6, 12, 24].map((i) => i * 0.0254) : [0.01, 0.02, 0.05, 0.1, 0.2, 0.5];
  return steps.find((s) => halfWidthM / s <= 5) ?? steps[steps.length - 1]!;
}

/** Eight sides a ball can come from, by bearing, with words seen from below the hole looking uphill. */
export const BALL_SIDES: ReadonlyArray<{ bearingDeg: number; label: string }> = [
  { bearingDeg: 180, label: "Below (uphill putt)" },
  { bearingDeg: 135, label: "Below right" },
  { bearingDeg: 90, label: "Right (across)" },
  { bearingDeg: 45, label: "Above right" },
  { bearingDeg: 0, label: "Above (downhill putt)" },
  { bearingDeg: 315, label: "Above left" },
  { bearingDeg: 270, label: "Left (across)" },
  { bearingDeg: 225, label: "Below left" },
];
