// "Your best pace": the roll-past that holes the most simulated putts while keeping long second putts rare, found
// on common random numbers by a coarse-then-fine scan of a grid of paces.
import type { MakeProbabilityInput, PaceOutcome, MakeProbability } from "./make-probability-types";
import {
  addTallies,
  describe,
  NORMALS_PER_PUTT,
  outcomeOf,
  prepare,
  simulatePace,
  solvedRead,
  type SimRead,
  type Tally,
} from "./monte-carlo";
import { standardNormals } from "./normal-deviates";
import type { CannotStop } from "./read-types";

/** Inputs of {@link bestPace}: those of makeProbability plus the second-putt risk limit and the paces to try. */
export interface BestPaceInput extends MakeProbabilityInput {
  /** Largest acceptable probability of a second putt longer than `secondPuttM` (default 0.10). */
  readonly secondPuttRiskMax?: number;
  /** Roll-past values to try, m (default 0.05 … 1.50 in 0.05 m steps). A rising grid of 12 or more is searched coarse then fine. */
  readonly rollPastGridM?: readonly number[];
  /** Samples per pace while scanning (default min(samples, 1000), on common random numbers); the two reported paces use all `samples`. */
  readonly scanSamples?: number;
}

/** Result of {@link bestPace}. `curve` is the paces the search tried, in grid order; `requested` is the input's own pace. */
export interface BestPace {
  readonly best: PaceOutcome & { readonly meetsRiskLimit: boolean };
  readonly requested: MakeProbability;
  readonly curve: PaceOutcome[];
  readonly secondPuttRiskMax: number;
}

/** `{ ok: true, result }` or the cannot-stop value. */
export type BestPaceResult = { readonly ok: true; readonly result: BestPace } | CannotStop;

/** Default paces scanned by {@link bestPace}: 0.05 … 1.50 m past in 5 cm steps (m). @example DEFAULT_BEST_PACE_GRID_M[0] // 0.05 */
export const DEFAULT_BEST_PACE_GRID_M: readonly number[] = Object.freeze(
  Array.from({ length: 30 }, (_, i) => Math.round((i + 1) * 5) / 100),
);

/**
 * "Your best pace": the roll-past (from `rollPastGridM`) whose read holes the most simulated putts while the chance
 * of leaving a second putt longer than `secondPuttM` stays at or under `secondPuttRiskMax` (default 10 %). Every
 * pace is simulated with the same deviates (common random numbers), so the comparison is not blurred by sampling
 * noise between paces; the scan uses `scanSamples`, the winner and the requested pace are run with all samples (the
 * scan's putts counted once). A rising grid of 12 paces or more is searched coarse then fine: every 4th pace, then a
 * hill-climb over the fine grid from the coarse winner (through plateaus and paces just over the limit); it finds
 * the exhaustive scan's winner within one step, or a pace level with it on a flat top (property-tested). When no
 * coarse pace meets the limit every pace is tried, and when none does the one with the lowest risk is returned with
 * `meetsRiskLimit: false`.
 * @example bestPace({ ...input, secondPuttRiskMax: 0.1 }).result.best.rollPastM // e.g. 0.35
 */
export function bestPace(input: BestPaceInput): BestPaceResult {
  const setup = prepare(input);
  if (!setup.ok) return setup;
  const riskMax = input.secondPuttRiskMax ?? 0.1;
  if (!(riskMax >= 0 && riskMax <= 1)) throw new RangeError(`secondPuttRiskMax must be in [0, 1] (got ${riskMax})`);
  const grid = input.rollPastGridM ?? DEFAULT_BEST_PACE_GRID_M;
  if (grid.length === 0 || grid.some((p) => !(p >= 0) || !Number.isFinite(p)))
    throw new RangeError("rollPastGridM must be finite values ≥ 0");
  const scanSamples = Math.min(input.samples, input.scanSamples ?? 1000);
  const normals = standardNormals(input.random, NORMALS_PER_PUTT * input.samples);
  const requestedRead = solvedRead(input, setup.readError);
  if (!requestedRead.ok) return requestedRead;
  // The requested pace in two runs, the first on the scan's samples: when it is one of the grid's paces the scan reuses it.
  const requestedScan = simulatePace(setup.sim, requestedRead.read, requestedRead.rollPastM, normals, 0, scanSamples, setup.keep);
  const requestedTally = addTallies(
    requestedScan,
    simulatePace(setup.sim, requestedRead.read, requestedRead.rollPastM, normals, scanSamples, input.samples, setup.keep),
  );
  const requested = describe(setup.sim, requestedTally, input.samples);

  // Coarse then fine on the grid (common random numbers throughout): every COARSE_STRIDE-th pace first.
  const scanned = new Map<number, ScanPoint>();
  const scanAt = (i: number): ScanPoint | CannotStop => {
    const hit = scanned.get(i);
    if (hit !== undefined) return hit;
    const rollPastM = grid[i]!;
    const r = solvedRead({ ...input, pace: { rollPastM } }, setup.readError);
    if (!r.ok) return r;
    const tally = sameRead(r.read, requestedRead.read)
      ? { ...requestedScan, rollPastM }
      : simulatePace(setup.sim, r.read, rollPastM, normals, 0, scanSamples, 0);
    const point: ScanPoint = { index: i, tally, outcome: outcomeOf(tally, scanSamples) };
    scanned.set(i, point);
    return point;
  };
  const coarse = scanIndices(grid);
  for (const i of coarse.first) {
    const p = scanAt(i);
    if ("ok" in p) return p;
  }
  // When no coarse pace meets the limit (rare: a limit too tight for the player), every pace is tried: the risk
  // is not smooth in the pace, and a pace between the coarse ones may still meet it.
  if (![...scanned.values()].some((c) => c.outcome.secondPuttOverProbability <= riskMax)) {
    for (let i = 0; i < grid.length; i++) {
      const p = scanAt(i);
      if ("ok" in p) return p;
    }
  }
  // Hill-climb on the fine grid from the coarse winner: try the untried neighbours of every pace level with the
  // winner (within one putt of the scan: a plateau is walked to its end) and of every pace that holes at least as
  // many while missing the limit by under two standard errors of the risk (the risk is noisy near the limit, so the
  // paces within it need not be contiguous), until all of theirs have been tried. The winner is then at least a
  // local best of the whole grid.
  const riskSlack = 2 * Math.sqrt((Math.max(riskMax, 1 / scanSamples) * (1 - Math.min(riskMax, 0.5))) / scanSamples);
  let pick = pickPace([...scanned.values()], riskMax);
  for (;;) {
    const level = [...scanned.values()].filter((c) => isLevel(c.outcome, pick.outcome, riskMax, 1 / scanSamples, riskSlack));
    const untried = new Set<number>();
    for (const c of level) for (const i of [c.index - 1, c.index + 1]) if (i >= 0 && i < grid.length && !scanned.has(i)) untried.add(i);
    if (untried.size === 0) break;
    for (const i of untried) {
      const p = scanAt(i);
      if ("ok" in p) return p;
    }
    pick = pickPace([...scanned.values()], riskMax);
  }
  const curve = [...scanned.values()].sort((a, b) => a.index - b.index);
  // The winner's full figures: all `samples` putts, the first `scanSamples` of them already rolled in the scan (the
  // same deviates, so the counts add up to exactly those of one full run); the requested pace's run when it is that pace.
  const full = sameRead(requestedRead.read, pick.tally.read)
    ? outcomeOf({ ...requestedTally, rollPastM: pick.outcome.rollPastM }, input.samples)
    : outcomeOf(
        addTallies(pick.tally, simulatePace(setup.sim, pick.tally.read, pick.outcome.rollPastM, normals, scanSamples, input.samples, 0)),
        input.samples,
      );
  return {
    ok: true,
    result: {
      best: { ...full, meetsRiskLimit: full.secondPuttOverProbability <= riskMax },
      requested,
      curve: curve.map((c) => c.outcome),
      secondPuttRiskMax: riskMax,
    },
  };
}

/** One pace tried by the best-pace scan: its index on the grid, its counts and its outcome on the scan's samples. */
interface ScanPoint {
  readonly index: number;
  readonly tally: Tally;
  readonly outcome: PaceOutcome;
}

/** Grids longer than this that rise strictly are scanned coarse then fine; shorter or unordered ones, every pace. */
const COARSE_SCAN_MIN_PACES = 12;
/** Every fourth pace first (20 cm on the default grid), then a hill-climb on the fine grid from the coarse winner. */
const COARSE_STRIDE = 4;

/** The grid indices of the coarse pass (always the first and last pace) and its stride (1: the whole grid). */
function scanIndices(grid: readonly number[]): { first: number[]; stride: number } {
  const rising = grid.every((p, i) => i === 0 || p > grid[i - 1]!);
  const stride = rising && grid.length >= COARSE_SCAN_MIN_PACES ? COARSE_STRIDE : 1;
  const first: number[] = [];
  for (let i = 0; i < grid.length; i += stride) first.push(i);
  if (first[first.length - 1] !== grid.length - 1) first.push(grid.length - 1);
  return { first, stride };
}

/**
 * The best of the paces tried: the most makes among those within the risk limit (the lowest pace on a tie), or,
 * when none is, the lowest risk.
 */
function pickPace(points: readonly ScanPoint[], riskMax: number): ScanPoint {
  const sorted = [...points].sort((a, b) => a.index - b.index);
  const feasible = sorted.filter((c) => c.outcome.secondPuttOverProbability <= riskMax);
  return feasible.length > 0
    ? feasible.reduce((a, b) => (b.outcome.makeProbability > a.outcome.makeProbability ? b : a))
    : sorted.reduce((a, b) => (b.outcome.secondPuttOverProbability < a.outcome.secondPuttOverProbability ? b : a));
}

/**
 * A pace whose neighbours the hill-climb tries: within the limit and as many makes as the winner to within `slack`,
 * or over the limit by at most `riskSlack` and at least as many makes; when nothing meets the limit, as little risk
 * to within `slack`.
 */
function isLevel(c: PaceOutcome, pick: PaceOutcome, riskMax: number, slack: number, riskSlack: number): boolean {
  const eps = 1e-12;
  if (pick.secondPuttOverProbability <= riskMax) {
    if (c.secondPuttOverProbability <= riskMax) return c.makeProbability >= pick.makeProbability - slack - eps;
    return c.secondPuttOverProbability <= riskMax + riskSlack + eps && c.makeProbability >= pick.makeProbability - eps;
  }
  return c.secondPuttOverProbability <= pick.secondPuttOverProbability + slack + eps;
}

/** The same simulated read: start line, launch speed and slope sensitivity (then every putt rolls the same). */
function sameRead(a: SimRead, b: SimRead): boolean {
  const sa = a.sensitivity;
  const sb = b.sensitivity;
  return (
    a.startLineRad === b.startLineRad &&
    a.launchSpeedMps === b.launchSpeedMps &&
    sa.lineX === sb.lineX &&
    sa.lineY === sb.lineY &&
    sa.lnSpeedX === sb.lnSpeedX &&
    sa.lnSpeedY === sb.lnSpeedY
  );
}
