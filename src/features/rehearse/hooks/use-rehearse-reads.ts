import { useMemo } from "react";
import { simulateRoll, solveRead, type Read, type ReadResult } from "#physics";
import type { ReadRequest } from "#shared/schemas/reads";
import type { Replay } from "../../../components/green-3d/scene-types";
import { ROLL_PAST_RANGE_M } from "../utils/rehearse-putt";

/**
 * The putt being rehearsed, without its pace: every field of the shared read schema but `pace`. A field added to the
 * schema (a wind, a grain) is part of this type at once, and the object is passed on whole (to the physics and to the
 * 3D view), never rebuilt field by field, so it cannot be dropped on the way.
 */
export type RehearseGreen = Omit<ReadRequest, "pace">;

/**
 * The rehearsed putt's read input without its pace, as one object: the roll-past is the pace control's, everything
 * else travels on unchanged (extra fields included).
 * @example greenOf({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, rollPastM: 0.45 }) // { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }
 */
export function greenOf<P extends RehearseGreen & { rollPastM: number }>(putt: P): Omit<P, "rollPastM"> {
  const { rollPastM: _pace, ...green } = putt;
  return green;
}

/**
 * The read at the chosen pace, and the dying and firm reads for comparison. solveRead is pure and takes about a
 * millisecond, so the browser calls it directly on every move of the pace control (scrubbing at 60 fps needs no
 * server round trip); each read is memoised on the green (one object, passed to solveRead whole) and the pace.
 */
export function useRehearseReads(green: RehearseGreen, rollPastM: number): { current: ReadResult; dying: ReadResult; firm: ReadResult } {
  const current = useMemo(() => solveRead({ ...green, pace: { rollPastM } }), [green, rollPastM]);
  const dying = useMemo(() => solveRead({ ...green, pace: { rollPastM: ROLL_PAST_RANGE_M.min } }), [green]);
  const firm = useMemo(() => solveRead({ ...green, pace: { rollPastM: ROLL_PAST_RANGE_M.max } }), [green]);
  return { current, dying, firm };
}

/**
 * A read's roll with its timing, for the replay: the read's path has no times, so the ball is rolled forward again
 * from the read's launch speed and start line (simulateRoll gives timed samples). Computed once per replay press;
 * the scene only samples it per frame.
 */
export function replayOf(green: RehearseGreen, read: Read, rate: number, key: number): Replay | null {
  const rolled = simulateRoll({ ...green, launchSpeedMps: read.launchSpeedMps, startLineDeg: read.startLineDeg });
  if (!rolled.ok) return null;
  const r = rolled.roll;
  return {
    key,
    rate,
    timeS: r.samples.timeS,
    xM: r.samples.xM,
    yM: r.samples.yM,
    holeTimeS: r.capture.holed ? r.closestApproach.timeS : null,
  };
}
