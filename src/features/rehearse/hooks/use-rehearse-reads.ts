import { useMemo } from "react";
import { simulateRoll, solveRead, type Read, type ReadResult } from "../../../../physics";
import type { Replay } from "../../../components/green-3d/scene-types";
import { ROLL_PAST_RANGE_M, type RehearsePutt } from "../utils/rehearse-putt";

type Green = Omit<RehearsePutt, "rollPastM">;

/**
 * The read at the chosen pace, and the dying and firm reads for comparison. solveRead is pure and takes about a
 * millisecond, so the browser calls it directly on every move of the pace control (scrubbing at 60 fps needs no
 * server round trip); each read is memoised on its inputs.
 */
export function useRehearseReads(green: Green, rollPastM: number): { current: ReadResult; dying: ReadResult; firm: ReadResult } {
  const { distanceM, slopePct, fallLineDeg, stimpFt } = green;
  const current = useMemo(
    () => solveRead({ distanceM, slopePct, fallLineDeg, stimpFt, pace: { rollPastM } }),
    [distanceM, slopePct, fallLineDeg, stimpFt, rollPastM],
  );
  const dying = useMemo(
    () => solveRead({ distanceM, slopePct, fallLineDeg, stimpFt, pace: { rollPastM: ROLL_PAST_RANGE_M.min } }),
    [distanceM, slopePct, fallLineDeg, stimpFt],
  );
  const firm = useMemo(
    () => solveRead({ distanceM, slopePct, fallLineDeg, stimpFt, pace: { rollPastM: ROLL_PAST_RANGE_M.max } }),
    [distanceM, slopePct, fallLineDeg, stimpFt],
  );
  return { current, dying, firm };
}

/**
 * A read's roll with its timing, for the replay: the read's path has no times, so the ball is rolled forward again
 * from the read's launch speed and start line (simulateRoll gives timed samples). Computed once per replay press;
 * the scene only samples it per frame.
 */
export function replayOf(green: Green, read: Read, rate: number, key: number): Replay | null {
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
