// The closed-form forward roll with simulateRoll's input and answer shape (rollPlanarInto wrapped for one roll).
import { captureAtRim, type Capture, type RimCrossing } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { planarRollField } from "./planar-path";
import { newPlanarRollOut, rollPlanarInto } from "./planar-roll";
import { cannotStop, type CannotStop } from "./read-types";
import { describeModel, requireFinite, resolveGreen, stopsInPractice } from "./roll-model";
import type { RollInput } from "./simulate-roll";

/** A closed-form roll in the shape of simulateRoll's answer (without the drawn path and samples). */
export interface PlanarRoll {
  readonly restM: [number, number];
  readonly rollLengthM: number;
  readonly rollTimeS: number;
  readonly closestApproach: {
    readonly distanceM: number;
    readonly offsetM: number;
    readonly speedMps: number;
    readonly pointM: [number, number];
    readonly atRest: boolean;
  };
  readonly capture: Capture;
  /** Where the ball's centre crossed the hole's edge before its closest pass (null if it never did). */
  readonly rim: RimCrossing | null;
}

/**
 * The closed-form forward roll for the same input as simulateRoll (ball at (0, 0), hole at (0, D)): rest point,
 * closest pass and the capture outcome at the rim (Holmes 1991; docs/sources.md) at a hole of radius `holeRadiusM`
 * (default 54 mm). See {@link rollPlanarInto} for the method; agrees with simulateRoll to well under 1 mm.
 * @example rollClosedForm({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, launchSpeedMps: 2, startLineDeg: -4 })
 */
export function rollClosedForm(
  input: RollInput & { readonly holeRadiusM?: number },
): { readonly ok: true; readonly roll: PlanarRoll } | CannotStop {
  requireFinite("launchSpeedMps", input.launchSpeedMps);
  requireFinite("startLineDeg", input.startLineDeg);
  if (!(input.distanceM > 0) || !Number.isFinite(input.distanceM)) throw new RangeError(`distanceM must be > 0 (got ${input.distanceM})`);
  if (input.launchSpeedMps < 0) throw new RangeError(`launchSpeedMps must be ≥ 0 (got ${input.launchSpeedMps})`);
  const green = resolveGreen(input);
  if (!stopsInPractice(green)) return cannotStop(describeModel(green));
  const out = newPlanarRollOut();
  const rh = input.holeRadiusM ?? HOLE_RADIUS_M;
  rollPlanarInto(
    planarRollField(green),
    input.launchSpeedMps,
    (input.startLineDeg * Math.PI) / 180,
    0,
    input.distanceM,
    out,
    Number.POSITIVE_INFINITY,
    rh,
  );
  return {
    ok: true,
    roll: {
      restM: [out.restX, out.restY],
      rollLengthM: out.rollLengthM,
      rollTimeS: out.rollTimeS,
      closestApproach: {
        distanceM: out.passDistanceM,
        offsetM: out.passOffsetM,
        speedMps: out.passSpeedMps,
        pointM: [out.passX, out.passY],
        atRest: out.passAtRest,
      },
      capture: captureAtRim(
        out.passDistanceM,
        Number.isFinite(out.rimSpeedMps) ? { offsetM: out.rimOffsetM, speedMps: out.rimSpeedMps } : null,
        out.passSpeedMps,
        Math.hypot(out.restX, out.restY - input.distanceM) < (input.holeRadiusM ?? HOLE_RADIUS_M),
        input.holeRadiusM ?? HOLE_RADIUS_M,
      ),
      rim: Number.isFinite(out.rimSpeedMps) ? { offsetM: out.rimOffsetM, speedMps: out.rimSpeedMps } : null,
    },
  };
}
