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
  resolveGreen,
  rollingDecelFromStimp,
  stimpFromTwoWays,
  type Green,
  type GreenInput,
  type ModelSummary,
  type RollModel,
} from "./roll-model";
export {
  ballDropTimeS,
  captureAtRim,
  captureOutcome,
  effectiveHoleWidthM,
  maxCaptureSpeedMps,
  type Capture,
  type RimCrossing,
} from "./capture";
export { solveRead } from "./solve-read";
export { solveReadDirect } from "./solve-read-direct";
export {
  MAX_AIM_OFFSET_START_LINE_DEG,
  aimOf,
  flatPuttLengthM,
  type AimAnswer,
  type AimGiven,
  type BreakDirection,
  type CannotStop,
  type Pace,
  type Read,
  type ReadDiagnostics,
  type ReadInput,
  type ReadResult,
} from "./read-types";
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
export { PlanarPath, planarRollField, type PlanarRollField } from "./planar-path";
export { newPlanarRollOut, rollPlanarInto, type PlanarRollOut } from "./planar-roll";
export { rollClosedForm, type PlanarRoll } from "./closed-form-roll";
export { standardNormals, type UniformRandom } from "./normal-deviates";
export {
  DEFAULT_GREEN_LATERAL_M,
  DEFAULT_READ_ERROR_SLOPE_PCT,
  greenLateralSigmaM,
  MAX_MONTE_CARLO_SAMPLES,
  type MakeProbability,
  type MakeProbabilityInput,
  type MakeProbabilityResult,
  type MissSummary,
  type PaceOutcome,
  type PaceRead,
  type PuttDispersion,
} from "./make-probability-types";
export { readSensitivity, type ReadSensitivity } from "./read-sensitivity";
export { makeProbability, simulatePuttOutcomes, type SimulatedPutt } from "./make-probability";
export { DEFAULT_BEST_PACE_GRID_M, bestPace, type BestPace, type BestPaceInput, type BestPaceResult } from "./best-pace";
export { estimateDispersion, type DispersionEstimate, type EstimateOptions, type Interval } from "./dispersion";
export { CLUB_GOLFER_PRIOR, type DispersionPrior } from "./dispersion-prior";
export type { LoggedPutt } from "./dispersion-data";
export { surfaceFromGrid, type HeightGrid, type HeightSurface } from "./height-surface";
export { simulateRollOnSurface, type SurfaceNoRest, type SurfaceRoll, type SurfaceRollInput, type SurfaceRollResult } from "./surface-roll";
export { solveReadOnSurface, type NoSurfaceRead, type SurfaceRead, type SurfaceReadInput, type SurfaceReadResult } from "./surface-read";
export {
  accelerationInto,
  closedFormApplies,
  forceRhs,
  forcesFor,
  gravityAlongSurface,
  gravityDecelOnGrade,
  newBallState,
  planeGround,
  rollingResistance,
  type BallState,
  type Force,
  type ForceInputs,
  type Ground,
} from "./forces";
