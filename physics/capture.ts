// Capture at the hole: Holmes's centre-of-ball criterion, applied where the ball's centre crosses the hole's edge.
// The model, its source and what it leaves out are in docs/sources.md ("Capture at the hole").
import { BALL_RADIUS_M, GRAVITY_MPS2, HOLE_RADIUS_M } from "./constants";

/**
 * Time for the ball to fall one ball radius, s: t_R = √(2R/g) ≈ 0.066 s (B. W. Holmes, "Putting: How a golf
 * ball and hole interact", Am. J. Phys. 59(2), 1991).
 * @example ballDropTimeS() // ≈ 0.06596
 */
export function ballDropTimeS(ballRadiusM: number = BALL_RADIUS_M, gravityMps2: number = GRAVITY_MPS2): number {
  return Math.sqrt((2 * ballRadiusM) / gravityMps2);
}

/**
 * Highest speed at which a ball crossing the hole with its centre at offset b from the hole centre is still
 * holed, m/s: v_c(b) = 2·√(r_h² − b²)/t_R (Holmes 1991, centre criterion; rim bounce and flagstick ignored).
 * 0 when |b| ≥ r_h. 1.636 m/s at b = 0, 1.52 at 20 mm, 1.10 at 40 mm, 0.62 at 50 mm.
 * @example maxCaptureSpeedMps(0.02) // ≈ 1.520
 */
export function maxCaptureSpeedMps(offsetM: number, holeRadiusM: number = HOLE_RADIUS_M): number {
  const b = Math.abs(offsetM);
  if (!(b < holeRadiusM)) return 0;
  return (2 * Math.sqrt(holeRadiusM * holeRadiusM - b * b)) / ballDropTimeS();
}

/**
 * Effective hole width at a speed, m: the offsets that still capture, W(v) = 2·r_h·√(1 − (v/v_c(0))²)
 * (Holmes 1991 centre criterion, derived). About 105 mm at 0.4 m/s, 94 mm at 0.8, 73 mm at 1.2.
 * @example effectiveHoleWidthM(0.8) // ≈ 0.094
 */
export function effectiveHoleWidthM(speedMps: number, holeRadiusM: number = HOLE_RADIUS_M): number {
  const ratio = Math.abs(speedMps) / maxCaptureSpeedMps(0, holeRadiusM);
  return ratio >= 1 ? 0 : 2 * holeRadiusM * Math.sqrt(1 - ratio * ratio);
}

/** Result of the capture test: holed, lip-out (crossed the hole too fast) or miss (never over the hole). */
export interface Capture {
  readonly outcome: "holed" | "lip-out" | "miss";
  readonly holed: boolean;
  /** v_c at the ball's offset, m/s (0 if the ball never passes over the hole). */
  readonly maxCaptureSpeedMps: number;
  /** v_c − v, m/s: positive when holed. */
  readonly marginMps: number;
}

/**
 * Classify a ball passing the hole with its centre `offsetM` from the hole centre at `speedMps` (Holmes 1991):
 * holed if |b| < r_h and v < v_c(b); lip-out if |b| < r_h but too fast; miss otherwise.
 * @example captureOutcome(0, 1.0).outcome // "holed"
 */
export function captureOutcome(offsetM: number, speedMps: number, holeRadiusM: number = HOLE_RADIUS_M): Capture {
  const vc = maxCaptureSpeedMps(offsetM, holeRadiusM);
  const overHole = Math.abs(offsetM) < holeRadiusM;
  const holed = overHole && speedMps < vc;
  return {
    outcome: holed ? "holed" : overHole ? "lip-out" : "miss",
    holed,
    maxCaptureSpeedMps: vc,
    marginMps: vc - speedMps,
  };
}

/** Where and how fast the ball's centre crossed the hole's edge: offset of its line of travel from the centre (m). */
export interface RimCrossing {
  readonly offsetM: number;
  readonly speedMps: number;
}

/**
 * Capture judged at the rim: a ball whose closest pass comes within the hole's radius is holed if, where its centre
 * crossed the edge, its speed was below v_c(b) for the offset b of its line of travel there (Holmes 1991's criterion,
 * applied at the edge rather than at the centre: the ball decelerates across the hole, so the edge speed is the
 * higher and stricter one). A ball that comes to rest over the hole drops. Rim bounce and the flagstick are ignored.
 * @example captureAtRim(0.01, { offsetM: 0.012, speedMps: 1.2 }, 0, false).holed // true
 */
export function captureAtRim(
  passDistanceM: number,
  rim: RimCrossing | null,
  passSpeedMps: number,
  restsOverHole: boolean,
  holeRadiusM: number = HOLE_RADIUS_M,
): Capture {
  if (!(passDistanceM < holeRadiusM)) {
    return restsOverHole
      ? { outcome: "holed", holed: true, maxCaptureSpeedMps: maxCaptureSpeedMps(passDistanceM, holeRadiusM), marginMps: 0 }
      : { outcome: "miss", holed: false, maxCaptureSpeedMps: 0, marginMps: -passSpeedMps };
  }
  if (rim === null) return captureOutcome(passDistanceM, passSpeedMps, holeRadiusM);
  const vc = maxCaptureSpeedMps(rim.offsetM, holeRadiusM);
  const holed = rim.speedMps < vc || restsOverHole;
  return { outcome: holed ? "holed" : "lip-out", holed, maxCaptureSpeedMps: vc, marginMps: vc - rim.speedMps };
}
