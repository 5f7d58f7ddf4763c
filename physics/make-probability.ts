// A player's make probability for a read (Monte Carlo over their start-line and pace dispersion), and the pace
// that makes the most putts while keeping long second putts rare: "your best pace".
// Over 300 lines on purpose: the Monte Carlo loop, the best-pace search and their tallies share private types and
// helpers (Sim, Tally, simulatePace); split apart they would have to be exported for one caller each.
import { HOLE_RADIUS_M } from "./constants";
import { standardNormals, type UniformRandom } from "./normal-deviates";
import { planarRollField, type PlanarRollField } from "./planar-path";
import { newPlanarRollOut, rollPlanarInto } from "./planar-roll";
import { describeModel, resolveGreen, stopsInPractice } from "./roll-model";
import { cannotStop, validateReadInput, type CannotStop, type ReadInput } from "./read-types";
import { solveRead } from "./solve-read";

/**
 * A player's dispersion, one standard deviation each:
 * - `angleDeg`: start-line error, degrees (the ball starts on the read's line + N(0, σ²)).
 * - `pace`: the natural log of (actual ÷ intended) total roll length, i.e. the length of the whole roll with the hole
 *   covered, from the ball to where it would stop. 0.10 ≈ "rolls 10 % longer or shorter than meant, one σ". On a
 *   planar green the path scales with the launch speed squared (homogeneity), so this is v = v_read·exp(ε/2),
 *   ε ~ N(0, σ²); a log scale keeps lengths positive. A fraction of the whole roll rather than of the roll-past, so
 *   that a long lag is looser than a short putt, as distance control is (common practice).
 * @example const club: PuttDispersion = { angleDeg: 1.2, pace: 0.12 };
 */
export interface PuttDispersion {
  readonly angleDeg: number;
  readonly pace: number;
  /**
   * The read error: σ of the player's misjudgement of the slope, percent of grade, independently along and across
   * the putt (the player then solves the read of the green they think they see). Default
   * {@link DEFAULT_READ_ERROR_SLOPE_PCT}; 0 for a perfect read.
   */
  readonly readSlopePct?: number;
  /**
   * The green's imperfection: σ of the random sideways deviation, m, of a roll 1 m long; it grows as √(L/1 m) with
   * the length L rolled to the hole (independent small deflections). Default {@link DEFAULT_GREEN_LATERAL_M};
   * 0 for a perfect surface.
   */
  readonly greenLateralM?: number;
}

/**
 * Default read error: σ 0.5 % of slope in each direction [from memory / common practice: golfers reading by eye are
 * commonly said to misjudge a green's grade by around half a percent; no published survey]. Set, with
 * {@link DEFAULT_GREEN_LATERAL_M}, so that the club-golfer prior's flat-green make rates sit below the tour's and
 * inside the published amateur rates (docs/sources.md, "Make probability").
 * @example DEFAULT_READ_ERROR_SLOPE_PCT // 0.5
 */
export const DEFAULT_READ_ERROR_SLOPE_PCT = 0.5;

/**
 * Default green imperfection: σ 20 mm sideways after 1 m, growing as √L (independent small deflections along the
 * way: 28 mm at 2 m, 35 mm at 3 m, 49 mm at 6 m) [from memory: the putting-machine experiments attributed to
 * D. Pelz, in which perfect putts of about 3.5 m on real greens holed only about half the time; this value holds
 * about four in five of them: docs/sources.md, "Make probability"].
 * @example DEFAULT_GREEN_LATERAL_M // 0.02
 */
export const DEFAULT_GREEN_LATERAL_M = 0.02;

/** σ of the green's sideways deviation (m) after rolling `lengthM` (m): greenLateralM·√(L/1 m). */
export function greenLateralSigmaM(lengthM: number, greenLateralM: number = DEFAULT_GREEN_LATERAL_M): number {
  return greenLateralM * Math.sqrt(Math.max(0, lengthM));
}

/** Inputs of {@link makeProbability}: a read (distance, green, pace), the dispersion and the sampling. */
export interface MakeProbabilityInput extends ReadInput {
  readonly dispersion: PuttDispersion;
  /** Number of simulated putts (1 … 200 000). */
  readonly samples: number;
  /** Seeded uniform generator on [0, 1); the same seed gives the same result. */
  readonly random: UniformRandom;
  /** Hole radius for the capture test, m (default 54 mm, Rules of Golf); a test parameter. */
  readonly holeRadiusM?: number;
  /** A second putt "longer than" this counts as a risk, m (default 1 m). */
  readonly secondPuttM?: number;
  /** How many rest points to return, from the first samples (default 100). */
  readonly finishesKept?: number;
}

/** The nominal read at one pace: start line (°, + = right), aim offset (m) and launch and entry speeds (m/s). */
/** How a read's start line (rad) and ln launch speed change per 1 % of slope misjudged across (x) and along (y). */
export interface ReadSensitivity {
  readonly lineX: number;
  readonly lineY: number;
  readonly lnSpeedX: number;
  readonly lnSpeedY: number;
}

export interface PaceRead {
  /** Null beyond a 60° start line (see Read.aimGiven). */
  readonly aimOffsetM: number | null;
  readonly startLineDeg: number;
  readonly launchSpeedMps: number;
  readonly entrySpeedMps: number;
}

/** Outcome of the simulated putts at one pace. Probabilities in [0, 1]; their Monte Carlo standard errors beside. */
export interface PaceOutcome {
  readonly rollPastM: number;
  readonly makeProbability: number;
  readonly makeProbabilityStandardError: number;
  /** Probability of a miss that leaves the ball more than `secondPuttM` from the hole centre. */
  readonly secondPuttOverProbability: number;
  readonly read: PaceRead;
}

/** Where the misses finished: fractions of all samples, and distances (m) from the hole centre. */
export interface MissSummary {
  readonly missProbability: number;
  /** Misses that stopped short of the hole (rest point before the hole along the ball→hole line). */
  readonly shortProbability: number;
  readonly longProbability: number;
  /** Misses finishing left / right of the hole, seen by the golfer. */
  readonly leftProbability: number;
  readonly rightProbability: number;
  /** Lip-outs: over the hole, too fast to drop (Holmes's criterion). */
  readonly lipOutProbability: number;
  readonly meanLeaveM: number;
  readonly medianLeaveM: number;
  readonly p90LeaveM: number;
}

/** Result of {@link makeProbability}. `finishes` are rest points [x, y] (m, putt frame; a holed ball at the hole). */
export interface MakeProbability extends PaceOutcome {
  readonly finishes: [number, number][];
  readonly finishHoled: boolean[];
  readonly misses: MissSummary;
  readonly samples: number;
  readonly dispersion: PuttDispersion;
  readonly holeRadiusM: number;
  readonly secondPuttM: number;
}

/** `{ ok: true, result }` or the cannot-stop value of the green. */
export type MakeProbabilityResult = { readonly ok: true; readonly result: MakeProbability } | CannotStop;

/** Standard normal deviates per simulated putt: start line, pace, green, read error across and along. */
const NORMALS_PER_PUTT = 5;

/** Hard cap on samples per call (the API allows 20 000); a product limit, not physics. @example MAX_MONTE_CARLO_SAMPLES // 200000 */
export const MAX_MONTE_CARLO_SAMPLES = 200_000;

/**
 * Make probability of a read for a player with the given dispersion, by Monte Carlo: each simulated putt starts on
 * the read's start line + N(0, σ_angle²) with launch speed v·exp(ε/2), ε ~ N(0, σ_pace²) (see {@link PuttDispersion}),
 * rolls to rest on the planar green in closed form ({@link rollPlanarInto}; the same model as simulateRoll) and is
 * holed by Holmes's capture criterion at its closest pass (Am. J. Phys. 59(2), 1991; the ball stopping within a
 * hole radius of the centre counts as holed, as in simulateRoll). Deviates come from Box–Muller on the caller's
 * seeded generator, two per sample, in order (common random numbers across calls with the same seed).
 * @example makeProbability({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, dispersion: { angleDeg: 1.2, pace: 0.12 }, samples: 10000, random })
 */
export function makeProbability(input: MakeProbabilityInput): MakeProbabilityResult {
  const setup = prepare(input);
  if (!setup.ok) return setup;
  const normals = standardNormals(input.random, NORMALS_PER_PUTT * input.samples);
  const read = solvedRead(input, setup.readError);
  if (!read.ok) return read;
  const tally = simulatePace(setup.sim, read.read, read.rollPastM, normals, 0, input.samples, setup.keep);
  return { ok: true, result: describe(setup.sim, tally, input.samples) };
}

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
export const DEFAULT_BEST_PACE_GRID_M: readonly number[] = Object.freeze(Array.from({ length: 30 }, (_, i) => Math.round((i + 1) * 5) / 100));

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
  if (grid.length === 0 || grid.some((p) => !(p >= 0) || !Number.isFinite(p))) throw new RangeError("rollPastGridM must be finite values ≥ 0");
  const scanSamples = Math.min(input.samples, input.scanSamples ?? 1000);
  const normals = standardNormals(input.random, NORMALS_PER_PUTT * input.samples);
  const requestedRead = solvedRead(input, setup.readError);
  if (!requestedRead.ok) return requestedRead;
  // The requested pace in two runs, the first on the scan's samples: when it is one of the grid's paces the scan reuses it.
  const requestedScan = simulatePace(setup.sim, requestedRead.read, requestedRead.rollPastM, normals, 0, scanSamples, setup.keep);
  const requestedTally = addTallies(requestedScan, simulatePace(setup.sim, requestedRead.read, requestedRead.rollPastM, normals, scanSamples, input.samples, setup.keep));
  const requested = describe(setup.sim, requestedTally, input.samples);

  // Coarse then fine on the grid (common random numbers throughout): every COARSE_STRIDE-th pace first.
  const scanned = new Map<number, ScanPoint>();
  const scanAt = (i: number): ScanPoint | CannotStop => {
    const hit = scanned.get(i);
    if (hit !== undefined) return hit;
    const rollPastM = grid[i]!;
    const r = solvedRead({ ...input, pace: { rollPastM } }, setup.readError);
    if (!r.ok) return r;
    const tally = sameRead(r.read, requestedRead.read) ? { ...requestedScan, rollPastM } : simulatePace(setup.sim, r.read, rollPastM, normals, 0, scanSamples, 0);
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
  const full =
    sameRead(requestedRead.read, pick.tally.read)
      ? outcomeOf({ ...requestedTally, rollPastM: pick.outcome.rollPastM }, input.samples)
      : outcomeOf(addTallies(pick.tally, simulatePace(setup.sim, pick.tally.read, pick.outcome.rollPastM, normals, scanSamples, input.samples, 0)), input.samples);
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

interface Sim {
  readonly field: PlanarRollField;
  readonly distanceM: number;
  readonly dispersion: Required<PuttDispersion>;
  readonly holeRadiusM: number;
  readonly secondPuttM: number;
}

interface SimRead extends PaceRead {
  readonly startLineRad: number;
  readonly sensitivity: ReadSensitivity;
}

function prepare(input: MakeProbabilityInput): ({ ok: true; field: PlanarRollField; sim: Sim; keep: number; readError: boolean }) | CannotStop {
  validateReadInput(input);
  const { angleDeg, pace } = input.dispersion;
  const readSlopePct = input.dispersion.readSlopePct ?? DEFAULT_READ_ERROR_SLOPE_PCT;
  const greenLateralM = input.dispersion.greenLateralM ?? DEFAULT_GREEN_LATERAL_M;
  if (!(readSlopePct >= 0) || !Number.isFinite(readSlopePct)) throw new RangeError(`dispersion.readSlopePct must be finite and ≥ 0 (got ${readSlopePct})`);
  if (!(greenLateralM >= 0) || !Number.isFinite(greenLateralM)) throw new RangeError(`dispersion.greenLateralM must be finite and ≥ 0 (got ${greenLateralM})`);
  if (!(angleDeg >= 0) || !Number.isFinite(angleDeg)) throw new RangeError(`dispersion.angleDeg must be finite and ≥ 0 (got ${angleDeg})`);
  if (!(pace >= 0) || !Number.isFinite(pace)) throw new RangeError(`dispersion.pace must be finite and ≥ 0 (got ${pace})`);
  if (!Number.isInteger(input.samples) || input.samples < 1 || input.samples > MAX_MONTE_CARLO_SAMPLES) {
    throw new RangeError(`samples must be an integer in 1…${MAX_MONTE_CARLO_SAMPLES} (got ${input.samples})`);
  }
  const holeRadiusM = input.holeRadiusM ?? HOLE_RADIUS_M;
  if (!(holeRadiusM > 0) || !Number.isFinite(holeRadiusM)) throw new RangeError(`holeRadiusM must be > 0 (got ${holeRadiusM})`);
  const secondPuttM = input.secondPuttM ?? 1;
  if (!(secondPuttM >= 0) || !Number.isFinite(secondPuttM)) throw new RangeError(`secondPuttM must be ≥ 0 (got ${secondPuttM})`);
  const green = resolveGreen(input);
  if (!stopsInPractice(green)) return cannotStop(describeModel(green));
  // The Monte Carlo rolls in closed form: only the forces the closed form models exactly (physics/forces/).
  if (!green.closedForm) throw new RangeError("makeProbability needs the constant-resistance model (closed-form rolls)");
  const field = planarRollField(green);
  const keep = Math.min(input.samples, Math.max(0, Math.floor(input.finishesKept ?? 100)));
  const dispersion = { angleDeg, pace, readSlopePct, greenLateralM };
  return { ok: true, field, keep, readError: readSlopePct > 0, sim: { field, distanceM: input.distanceM, dispersion, holeRadiusM, secondPuttM } };
}

function solvedRead(input: ReadInput, withReadError: boolean): ({ ok: true; read: SimRead; rollPastM: number }) | CannotStop {
  const r = solveRead(input);
  if (!r.ok) return r;
  const { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps, rollPastM } = r.read;
  const sensitivity = withReadError ? readSensitivity(input) : { lineX: 0, lineY: 0, lnSpeedX: 0, lnSpeedY: 0 };
  return { ok: true, rollPastM, read: { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps, startLineRad: (startLineDeg * Math.PI) / 180, sensitivity } };
}

const SENSITIVITY_STEP_PCT = 0.05;

/**
 * The read's start line and launch speed as functions of the slope the player believes in, linearised: central
 * differences of solveRead over ±0.05 % of grade across and along the putt (one-sided, or 0, where a neighbour cannot
 * stop). The slope vector in the putt frame is slopePct·(sin φ, cos φ), φ the fall line.
 */
export function readSensitivity(input: ReadInput): ReadSensitivity {
  const phi = (input.fallLineDeg * Math.PI) / 180;
  const sx = input.slopePct * Math.sin(phi);
  const sy = input.slopePct * Math.cos(phi);
  const h = SENSITIVITY_STEP_PCT;
  const at = (x: number, y: number) => {
    const r = solveRead({ ...input, slopePct: Math.hypot(x, y), fallLineDeg: (Math.atan2(x, y) * 180) / Math.PI });
    return r.ok ? { line: (r.read.startLineDeg * Math.PI) / 180, lnV: Math.log(r.read.launchSpeedMps) } : null;
  };
  const mid = at(sx, sy);
  const diff = (plus: ReturnType<typeof at>, minus: ReturnType<typeof at>) => {
    if (plus && minus) return { line: (plus.line - minus.line) / (2 * h), lnV: (plus.lnV - minus.lnV) / (2 * h) };
    const one = plus ?? minus;
    if (!one || !mid) return { line: 0, lnV: 0 };
    const sign = plus ? 1 : -1;
    return { line: (sign * (one.line - mid.line)) / h, lnV: (sign * (one.lnV - mid.lnV)) / h };
  };
  const dx = diff(at(sx + h, sy), at(sx - h, sy));
  const dy = diff(at(sx, sy + h), at(sx, sy - h));
  return { lineX: dx.line, lineY: dy.line, lnSpeedX: dx.lnV, lnSpeedY: dy.lnV };
}

interface Tally {
  readonly rollPastM: number;
  readonly read: SimRead;
  holed: number;
  lipOut: number;
  over: number;
  short: number;
  left: number;
  right: number;
  leaves: Float64Array;
  misses: number;
  finishes: [number, number][];
  finishHoled: boolean[];
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
  return a.startLineRad === b.startLineRad && a.launchSpeedMps === b.launchSpeedMps && sa.lineX === sb.lineX && sa.lineY === sb.lineY && sa.lnSpeedX === sb.lnSpeedX && sa.lnSpeedY === sb.lnSpeedY;
}

/** One run of a pace from two runs of it on consecutive samples (the first one's first). */
function addTallies(a: Tally, b: Tally): Tally {
  const leaves = new Float64Array(a.misses + b.misses);
  leaves.set(a.leaves.subarray(0, a.misses));
  leaves.set(b.leaves.subarray(0, b.misses), a.misses);
  return {
    rollPastM: a.rollPastM,
    read: a.read,
    holed: a.holed + b.holed,
    lipOut: a.lipOut + b.lipOut,
    over: a.over + b.over,
    short: a.short + b.short,
    left: a.left + b.left,
    right: a.right + b.right,
    leaves,
    misses: a.misses + b.misses,
    finishes: [...a.finishes, ...b.finishes],
    finishHoled: [...a.finishHoled, ...b.finishHoled],
  };
}

/** Simulate samples [from, to) of one pace (deviates by sample index, so runs over consecutive ranges add up). */
function simulatePace(sim: Sim, read: SimRead, rollPastM: number, normals: Float64Array, from: number, to: number, keep: number): Tally {
  const { field, distanceM: D, holeRadiusM: rh, secondPuttM } = sim;
  const sigmaA = (sim.dispersion.angleDeg * Math.PI) / 180;
  const halfSigmaP = sim.dispersion.pace / 2;
  const sigmaG = greenLateralSigmaM(D, sim.dispersion.greenLateralM) / D;
  const sr = sim.dispersion.readSlopePct;
  const sens = read.sensitivity;
  const out = newPlanarRollOut();
  const t: Tally = {
    rollPastM,
    read,
    holed: 0,
    lipOut: 0,
    over: 0,
    short: 0,
    left: 0,
    right: 0,
    leaves: new Float64Array(to - from),
    misses: 0,
    finishes: [],
    finishHoled: [],
  };
  for (let i = from; i < to; i++) {
    const { line, speed } = perturb(read, normals, i, sigmaA, halfSigmaP, sigmaG, sr, sens);
    rollPlanarInto(field, speed, line, 0, D, out, rh, rh);
    const b = out.passDistanceM;
    const holed = out.holed;
    if (i < keep) {
      t.finishes.push(holed ? [0, D] : [out.restX, out.restY]);
      t.finishHoled.push(holed);
    }
    if (holed) {
      t.holed++;
      continue;
    }
    if (b < rh) t.lipOut++;
    const leave = Math.sqrt(out.restX * out.restX + (out.restY - D) * (out.restY - D));
    t.leaves[t.misses++] = leave;
    if (leave > secondPuttM) t.over++;
    if (out.restY < D) t.short++;
    if (out.restX < 0) t.left++;
    else t.right++;
  }
  return t;
}

/**
 * One simulated putt's start line and launch speed: the read's, plus the stroke (N(0, σ_a²) on the line, e^(ε/2) on
 * the speed), the green (its sideways deviation at the hole as an angle) and the read error (the slope misjudged by
 * N(0, σ_r²) across and along, through the read's sensitivity).
 */
function perturb(
  read: SimRead,
  normals: Float64Array,
  i: number,
  sigmaA: number,
  halfSigmaP: number,
  sigmaG: number,
  sr: number,
  sens: ReadSensitivity,
): { line: number; speed: number } {
  const k = NORMALS_PER_PUTT * i;
  const ex = sr * normals[k + 3]!;
  const ey = sr * normals[k + 4]!;
  return {
    line: read.startLineRad + sigmaA * normals[k]! + sigmaG * normals[k + 2]! + sens.lineX * ex + sens.lineY * ey,
    speed: read.launchSpeedMps * Math.exp(halfSigmaP * normals[k + 1]! + sens.lnSpeedX * ex + sens.lnSpeedY * ey),
  };
}

function outcomeOf(t: Tally, samples: number): PaceOutcome {
  const p = t.holed / samples;
  const { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps } = t.read;
  return {
    rollPastM: t.rollPastM,
    makeProbability: p,
    makeProbabilityStandardError: Math.sqrt((p * (1 - p)) / samples),
    secondPuttOverProbability: t.over / samples,
    read: { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps },
  };
}

function describe(sim: Sim, t: Tally, samples: number): MakeProbability {
  const leaves = t.leaves.subarray(0, t.misses).slice().sort();
  const quantile = (q: number) => (leaves.length === 0 ? 0 : leaves[Math.min(leaves.length - 1, Math.floor(q * leaves.length))]!);
  let sum = 0;
  for (const x of leaves) sum += x;
  return {
    ...outcomeOf(t, samples),
    finishes: t.finishes,
    finishHoled: t.finishHoled,
    misses: {
      missProbability: t.misses / samples,
      shortProbability: t.short / samples,
      longProbability: (t.misses - t.short) / samples,
      leftProbability: t.left / samples,
      rightProbability: t.right / samples,
      lipOutProbability: t.lipOut / samples,
      meanLeaveM: leaves.length === 0 ? 0 : sum / leaves.length,
      medianLeaveM: quantile(0.5),
      p90LeaveM: quantile(0.9),
    },
    samples,
    dispersion: sim.dispersion,
    holeRadiusM: sim.holeRadiusM,
    secondPuttM: sim.secondPuttM,
  };
}

/** One simulated putt as a practice log would record it (see {@link simulatePuttOutcomes}). */
export interface SimulatedPutt {
  readonly holed: boolean;
  readonly restM: [number, number];
  readonly missSide: "left" | "right" | null;
  /** Signed along the ball→hole line: − short, + past (null when holed). */
  readonly missLengthM: number | null;
}

/**
 * The individual simulated putts of {@link makeProbability} (same deviates, same capture rule), recorded as a
 * practice log records a putt: holed, or the side and signed length of the miss (rest point − hole along the line).
 * For synthetic logs (tests of the dispersion estimator) and demonstrations.
 * @example simulatePuttOutcomes({ ...read, dispersion, samples: 20, random }).putts[0] // { holed: false, missSide: "left", missLengthM: 0.31, … }
 */
export function simulatePuttOutcomes(input: MakeProbabilityInput): { readonly ok: true; readonly putts: SimulatedPutt[] } | CannotStop {
  const setup = prepare(input);
  if (!setup.ok) return setup;
  const normals = standardNormals(input.random, NORMALS_PER_PUTT * input.samples);
  const read = solvedRead(input, setup.readError);
  if (!read.ok) return read;
  const { field, distanceM: D, holeRadiusM: rh, dispersion } = setup.sim;
  const sigmaA = (dispersion.angleDeg * Math.PI) / 180;
  const sigmaG = greenLateralSigmaM(D, dispersion.greenLateralM) / D;
  const out = newPlanarRollOut();
  const putts: SimulatedPutt[] = [];
  for (let i = 0; i < input.samples; i++) {
    const { line, speed } = perturb(read.read, normals, i, sigmaA, dispersion.pace / 2, sigmaG, dispersion.readSlopePct, read.read.sensitivity);
    rollPlanarInto(field, speed, line, 0, D, out, rh, rh);
    const holed = out.holed;
    putts.push(
      holed
        ? { holed, restM: [0, D], missSide: null, missLengthM: null }
        : { holed, restM: [out.restX, out.restY], missSide: out.restX < 0 ? "left" : "right", missLengthM: out.restY - D },
    );
  }
  return { ok: true, putts };
}
