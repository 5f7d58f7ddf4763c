import { tourExpectedPutts } from "./baseline";

/**
 * When a missed practice putt has no recorded leave, we assume it finished max(0.45 m, 10 % of the putt's
 * length) from the hole. 0.45 m is the makeable-pace roll-past (common practice); 10 % of the length for
 * long putts is our own assumption, not a sourced figure. Such putts are counted (leavesAssumed) so a
 * reader can discount them.
 */
export const ASSUMED_LEAVE_MIN_M = 0.45;
export const ASSUMED_LEAVE_FRACTION = 0.1;

/** A lag is a putt from at least 6 m (≈ 20 ft); finishing more than 1 m away leaves three-putt range. */
export const LONG_PUTT_M = 6;
export const THREE_PUTT_RANGE_M = 1;

export type PracticePutt = { distanceM: number; holed: boolean; missLengthM: number | null };
export type PuttValue = { expectedPutts: number; puttsTaken: number; strokesGained: number; leaveM: number | null; leaveAssumed: boolean };

export function assumedLeaveM(distanceM: number): number {
  return Math.max(ASSUMED_LEAVE_MIN_M, ASSUMED_LEAVE_FRACTION * distanceM);
}

/**
 * Strokes gained of one practice putt against the tour baseline (M. Broadie, "Assessing Golfer Performance
 * on the PGA TOUR", Interfaces 42(2):146–155, 2012): SG = E(d) − putts taken, where a holed putt took 1 and
 * a missed one 1 + E(leave), leave = |missLengthM| (its signed length along the line), or the assumed leave.
 * @example practicePuttValue({ distanceM: 2.4384, holed: true, missLengthM: null }).strokesGained // 0.5
 */
export function practicePuttValue(putt: PracticePutt): PuttValue {
  const expectedPutts = tourExpectedPutts(putt.distanceM);
  if (putt.holed) return { expectedPutts, puttsTaken: 1, strokesGained: expectedPutts - 1, leaveM: 0, leaveAssumed: false };
  const known = putt.missLengthM !== null && Number.isFinite(putt.missLengthM);
  const leaveM = known ? Math.abs(putt.missLengthM!) : assumedLeaveM(putt.distanceM);
  const puttsTaken = 1 + tourExpectedPutts(leaveM);
  return { expectedPutts, puttsTaken, strokesGained: expectedPutts - puttsTaken, leaveM, leaveAssumed: !known };
}

/**
 * Strokes gained of a hole on the course from the first putt's length and the putts taken:
 * SG = E(firstPuttM) − putts. Null for a hole with no putt (holed from off the green).
 */
export function holeStrokesGained(firstPuttM: number, putts: number): number | null {
  if (putts === 0) return null;
  return tourExpectedPutts(firstPuttM) - putts;
}

/** Whether a lag (≥ LONG_PUTT_M) finished outside three-putt range; null when not a lag or the leave is unknown. */
export function lagOutsideRange(distanceM: number, holed: boolean, leaveM: number | null): boolean | null {
  if (distanceM < LONG_PUTT_M) return null;
  if (holed) return false;
  if (leaveM === null) return null;
  return Math.abs(leaveM) > THREE_PUTT_RANGE_M;
}

export type SessionValue = {
  putts: number;
  holed: number;
  expectedPutts: number;
  puttsTaken: number;
  strokesGained: number;
  leavesAssumed: number;
  longPutts: number;
  /** Lags whose finish is known (holed or leave recorded): the denominator of the share. */
  longPuttsKnown: number;
  longLagsOutside1m: number;
  longLagOutsideShare: number | null;
};

/** Sums the per-putt values of a session (or any set of practice putts). */
export function summarisePutts(putts: readonly PracticePutt[]): SessionValue {
  const out: SessionValue = {
    putts: 0,
    holed: 0,
    expectedPutts: 0,
    puttsTaken: 0,
    strokesGained: 0,
    leavesAssumed: 0,
    longPutts: 0,
    longPuttsKnown: 0,
    longLagsOutside1m: 0,
    longLagOutsideShare: null,
  };
  for (const p of putts) {
    const v = practicePuttValue(p);
    out.putts += 1;
    out.holed += p.holed ? 1 : 0;
    out.expectedPutts += v.expectedPutts;
    out.puttsTaken += v.puttsTaken;
    out.strokesGained += v.strokesGained;
    out.leavesAssumed += v.leaveAssumed ? 1 : 0;
    if (p.distanceM >= LONG_PUTT_M) {
      out.longPutts += 1;
      const outside = lagOutsideRange(p.distanceM, p.holed, p.holed ? 0 : p.missLengthM);
      if (outside !== null) {
        out.longPuttsKnown += 1;
        out.longLagsOutside1m += outside ? 1 : 0;
      }
    }
  }
  out.longLagOutsideShare = out.longPuttsKnown === 0 ? null : out.longLagsOutside1m / out.longPuttsKnown;
  return out;
}
