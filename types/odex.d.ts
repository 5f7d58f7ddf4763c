// odex ships TypeScript source but no declarations; this is the part we use.
// Resolved through package.json "imports" (#odex) so tsc, tsx, vitest and esbuild agree.
export type Derivative = (x: number, y: number[]) => number[];
export type OutputFunction = (
  nr: number,
  xold: number,
  x: number,
  y: number[],
  dense?: (c: number, x: number) => number,
) => boolean | void;
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
  solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): SolverResult;
}
export declare const Outcome: { Converged: number; MaxStepsExceeded: number; EarlyReturn: number };
