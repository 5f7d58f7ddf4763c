// The make-probability model's vocabulary: a player's dispersion (and the read error and green imperfection added
// to it, with their defaults), and the inputs and results of makeProbability (make-probability.ts).
import type { CannotStop, ReadInput } from "./read-types";
import type { UniformRandom } from "./normal-deviates";

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

/** Hard cap on samples per call (the API allows 20 000); a product limit, not physics. @example MAX_MONTE_CARLO_SAMPLES // 200000 */
export const MAX_MONTE_CARLO_SAMPLES = 200_000;
