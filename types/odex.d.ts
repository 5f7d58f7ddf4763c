// odex ships TypeScript source but no declarations; this is the part we use.
// Resolved through package.json "imports" (#odex) so tsc, tsx, vitest and esbuild agree.
export type Derivative = (x: number, y: number[]) => number[];
export type OutputFunction = (nr: number, xold: number, x: number, y: number[], dense?: (c: number, x: number) => number) => boolean | void;
export interface SolverResult {
  y: number[];
  outcome: number;
  nStep: number;
  xEnd: number;
  nAccept: number;
  nReject: number;
  nEval: number;
}
export class Solver {
  constructor(n: number);
  n: number;
  uRound: number;
  maxSteps: number;
  initialStepSize: number;
  maxStepSize: number;
  maxExtrapolationColumns: number;
  stepSizeSequence: number;
  stabilityCheckCount: number;
  stabilityCheckTableLines: number;
  denseOutput: boolean;
  denseOutputErrorEstimator: boolean;
  denseComponents: number[] | undefined;
  interpolationFormulaDegree: number;
  stepSizeReductionFactor: number;
  stepSizeFac1: number;
  stepSizeFac2: number;
  stepSizeFac3: number;
  stepSizeFac4: number;
  stepSafetyFactor1: number;
  stepSafetyFactor2: number;
  relativeTolerance: number | number[];
  absoluteTolerance: number | number[];
  debug: boolean;
  /** Observer for `solve` that calls `out` on a uniform grid of spacing dt (needs denseOutput). */
  grid(dt: number, out: (xOut: number, yOut: number[]) => boolean | void): OutputFunction;
  /** The first solOut call (nr = 1, at x0) has no `dense`; later calls get it when denseOutput is true. */
  solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): SolverResult;
}
/** odex's enum Outcome: Converged = 0, MaxStepsExceeded = 1, EarlyReturn = 2 (SolverResult.outcome). */
export declare const Outcome: { readonly Converged: 0; readonly MaxStepsExceeded: 1; readonly EarlyReturn: 2 };
