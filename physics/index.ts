// Borrowline's physics engine: the one public entry. Pure TypeScript, SI units, no I/O.
export {
  BALL_DIAMETER_M,
  BALL_MASS_KG,
  BALL_RADIUS_M,
  DEFAULT_ROLL_PAST_M,
  FOOT_M,
  GRAVITY_MPS2,
  HOLE_DIAMETER_M,
  HOLE_RADIUS_M,
  SOLID_SPHERE_INERTIA_RATIO,
  STIMP_EXIT_SPEED_MPS,
} from "./constants";
export {
  DEFAULT_ROLL_MODEL,
  PRACTICAL_STOP_MARGIN,
  canStop,
  stopsInPractice,
  describeModel,
  gravityDecelFromSlope,
  maxStoppableSlopePct,
  playsLikeM,
  resolveGreen,
  rollingDecelFromStimp,
  stimpFromTwoWays,
  type Green,
  type GreenInput,
  type ModelSummary,
  type RollModel,
} from "./roll-model";
export { ballDropTimeS, captureOutcome, effectiveHoleWidthM, maxCaptureSpeedMps, type Capture } from "./capture";
export { solveRead } from "./solve-read";
export { solveReadDirect } from "./solve-read-direct";
export type { BreakDirection, CannotStop, Pace, Read, ReadDiagnostics, ReadInput, ReadResult } from "./read-types";
export { simulateRoll, type HolePass, type Roll, type RollInput, type RollResult } from "./simulate-roll";
export {
  DEFAULT_ROLL_PAST_SWEEP_M,
  breakChart,
  breakVsPace,
  type BreakChart,
  type BreakChartInput,
  type ChartCell,
  type PaceRow,
  type PaceSweepInput,
} from "./break-chart";
export { rollRhs, STATE } from "./roll";
