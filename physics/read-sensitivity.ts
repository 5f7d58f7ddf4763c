// How a read changes with the slope the player believes in: the linearised sensitivity the make probability uses
// for read error, and the dispersion estimator for the extra spread a misread adds.
import { solveRead } from "./solve-read";
import type { ReadInput } from "./read-types";

/** How a read's start line (rad) and ln launch speed change per 1 % of slope misjudged across (x) and along (y). */
export interface ReadSensitivity {
  readonly lineX: number;
  readonly lineY: number;
  readonly lnSpeedX: number;
  readonly lnSpeedY: number;
}

const SENSITIVITY_STEP_PCT = 0.05;

/**
 * The read's start line and launch speed as functions of the slope the player believes in, linearised: central
 * differences of solveRead over ±0.05 % of grade across and along the putt (one-sided, or 0, where a neighbour cannot
 * stop). The slope vector in the putt frame is slopePct·(sin φ, cos φ), φ the fall line.
 */
export function readSensitivity(input: ReadInput): ReadSensitivity {
  const phi = (input.fallLineDeg * Math.PI) / 180;
  const sx = input.slopePct * Math.sin(phi);
  const sy = input.slopePct * Math.cos(phi);
  const h = SENSITIVITY_STEP_PCT;
  const at = (x: number, y: number) => {
    const r = solveRead({ ...input, slopePct: Math.hypot(x, y), fallLineDeg: (Math.atan2(x, y) * 180) / Math.PI });
    return r.ok ? { line: (r.read.startLineDeg * Math.PI) / 180, lnV: Math.log(r.read.launchSpeedMps) } : null;
  };
  const mid = at(sx, sy);
  const diff = (plus: ReturnType<typeof at>, minus: ReturnType<typeof at>) => {
    if (plus && minus) return { line: (plus.line - minus.line) / (2 * h), lnV: (plus.lnV - minus.lnV) / (2 * h) };
    const one = plus ?? minus;
    if (!one || !mid) return { line: 0, lnV: 0 };
    const sign = plus ? 1 : -1;
    return { line: (sign * (one.line - mid.line)) / h, lnV: (sign * (one.lnV - mid.lnV)) / h };
  };
  const dx = diff(at(sx + h, sy), at(sx - h, sy));
  const dy = diff(at(sx, sy + h), at(sx, sy - h));
  return { lineX: dx.line, lineY: dy.line, lnSpeedX: dx.lnV, lnSpeedY: dy.lnV };
}
