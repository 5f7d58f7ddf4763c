import { z } from "zod";
import { readRequestSchema } from "./reads";

/** Limits of the make-probability API. σ caps are far beyond any golfer (a 15° start-line σ misses a 1 m putt). */
export const MAKE_PROBABILITY_LIMITS = {
  samples: { min: 100, max: 20_000, default: 10_000 },
  angleDeg: { min: 0, max: 15 },
  pace: { min: 0, max: 1 },
  readSlopePct: { min: 0, max: 3 },
  greenLateralM: { min: 0, max: 0.2 },
  seed: { min: 0, max: 2 ** 31 - 1 },
  secondPuttRiskMax: { min: 0, max: 1, default: 0.1 },
} as const;

const bounded = (name: string, { min, max }: { min: number; max: number }, unit: string) =>
  z
    .number({ message: `${name} must be a number` })
    .finite()
    .min(min, `${name} must be at least ${min}${unit}`)
    .max(max, `${name} must be at most ${max}${unit}`);

/**
 * A dispersion, one σ each: `angleDeg` the start line (degrees), `pace` the σ of ln(actual ÷ intended roll length)
 * (0.10 ≈ the whole roll 10 % long or short); beyond the stroke, `readSlopePct` the read error (slope misjudged, %)
 * and `greenLateralM` the green's sideways deviation after 1 m (m, growing as √L). The last two default to the
 * model's (physics DEFAULT_READ_ERROR_SLOPE_PCT, DEFAULT_GREEN_LATERAL_M); all four 0 is a perfect putt.
 */
export const dispersionSchema = z
  .object({
    angleDeg: bounded("angleDeg", MAKE_PROBABILITY_LIMITS.angleDeg, "°"),
    pace: bounded("pace", MAKE_PROBABILITY_LIMITS.pace, " (fraction of the roll length)"),
    readSlopePct: bounded("readSlopePct", MAKE_PROBABILITY_LIMITS.readSlopePct, " %").optional(),
    greenLateralM: bounded("greenLateralM", MAKE_PROBABILITY_LIMITS.greenLateralM, " m").optional(),
  })
  .strict();
export type Dispersion = z.infer<typeof dispersionSchema>;

export const makeProbabilityRequestSchema = z
  .object({
    read: readRequestSchema,
    /** Default: the signed-in player's own, estimated from their logged putts. */
    dispersion: dispersionSchema.optional(),
    samples: z
      .number({ message: "samples must be a whole number" })
      .int("samples must be a whole number")
      .min(MAKE_PROBABILITY_LIMITS.samples.min, `samples must be at least ${MAKE_PROBABILITY_LIMITS.samples.min}`)
      .max(MAKE_PROBABILITY_LIMITS.samples.max, `samples must be at most ${MAKE_PROBABILITY_LIMITS.samples.max}`)
      .default(MAKE_PROBABILITY_LIMITS.samples.default),
    /** Default: a fresh seed, returned in the answer so the same result can be asked for again. */
    seed: z
      .number({ message: "seed must be a whole number" })
      .int("seed must be a whole number")
      .min(MAKE_PROBABILITY_LIMITS.seed.min, "seed must be ≥ 0")
      .max(MAKE_PROBABILITY_LIMITS.seed.max, `seed must be at most ${MAKE_PROBABILITY_LIMITS.seed.max}`)
      .optional(),
    secondPuttRiskMax: bounded("secondPuttRiskMax", MAKE_PROBABILITY_LIMITS.secondPuttRiskMax, "").default(
      MAKE_PROBABILITY_LIMITS.secondPuttRiskMax.default,
    ),
  })
  .strict();
export type MakeProbabilityRequest = z.infer<typeof makeProbabilityRequestSchema>;

/** The read at one pace, and how it plays for this player. Probabilities in [0, 1]. */
const paceResultFields = {
  rollPastM: z.number(),
  makeProbability: z.number(),
  /** Monte Carlo standard error of makeProbability, √(p(1 − p)/samples). */
  makeProbabilityStandardError: z.number(),
  /** A miss that leaves more than 1 m to the hole centre. */
  secondPuttOver1mProbability: z.number(),
  /** aimOffsetM is null beyond a 60° start line (the start line is the answer then). */
  read: z.object({ aimOffsetM: z.number().nullable(), startLineDeg: z.number(), launchSpeedMps: z.number(), entrySpeedMps: z.number() }),
};
export const paceResultSchema = z.object(paceResultFields);
export type PaceResult = z.output<typeof paceResultSchema>;

export const makeProbabilityResponseSchema = z.object({
  /** At the read's own pace (= defaultPace.makeProbability). */
  makeProbability: z.number(),
  makeProbabilityStandardError: z.number(),
  secondPuttOver1mProbability: z.number(),
  /** Rest points [x, y] (m, putt frame: ball at 0,0, hole at 0,D) of the first 100 simulated putts; holed → the hole. */
  finishes: z.array(z.tuple([z.number(), z.number()])),
  finishHoled: z.array(z.boolean()),
  /** Where misses finished: fractions of all simulated putts, and distances (m) left to the hole centre. */
  misses: z.object({
    missProbability: z.number(),
    shortProbability: z.number(),
    longProbability: z.number(),
    leftProbability: z.number(),
    rightProbability: z.number(),
    lipOutProbability: z.number(),
    meanLeaveM: z.number(),
    medianLeaveM: z.number(),
    p90LeaveM: z.number(),
  }),
  /** The most makes with P(second putt > 1 m) ≤ secondPuttRiskMax; if no pace meets it, the safest (meetsRiskLimit false). */
  bestPace: z.object({ ...paceResultFields, meetsRiskLimit: z.boolean() }),
  defaultPace: paceResultSchema,
  /** The scan behind bestPace (fewer samples per pace): for a chart of make and risk against roll-past. */
  paceCurve: z.array(z.object({ rollPastM: z.number(), makeProbability: z.number(), secondPuttOver1mProbability: z.number() })),
  dispersion: z.object({
    angleDeg: z.number(),
    pace: z.number(),
    readSlopePct: z.number(),
    greenLateralM: z.number(),
    source: z.enum(["request", "my-putts"]),
    putts: z.number().int().nullable(),
    usedPrior: z.boolean().nullable(),
  }),
  /**
   * The player's own logged make rate at about this length (0.8–1.25 × the distance), with its Wilson 95 % interval,
   * and whether these odds fall outside it; null without a signed-in player's log. `why` says why odds and log may
   * differ (the odds are for this read's slope and pace; the log has no slopes).
   */
  logged: z
    .object({
      fromM: z.number(),
      toM: z.number(),
      attempts: z.number().int(),
      made: z.number().int(),
      rate: z.number().nullable(),
      ci95: z.tuple([z.number(), z.number()]).nullable(),
      oddsOutside: z.boolean(),
      why: z.string(),
    })
    .nullable(),
  seed: z.number(),
  samples: z.number().int(),
  secondPuttRiskMax: z.number(),
});
export type MakeProbabilityResponse = z.output<typeof makeProbabilityResponseSchema>;

export const dispersionQuerySchema = z.object({ playerId: z.string().trim().min(1).max(64).optional() }).strict();

const intervalSchema = z.object({ estimate: z.number(), lo: z.number(), hi: z.number() });
export type Interval = z.output<typeof intervalSchema>;

export const dispersionResponseSchema = z.object({
  /** Start-line σ, degrees: posterior median and 95 % credible interval. */
  angleDeg: intervalSchema,
  /** Pace σ: of ln(actual ÷ intended roll length). */
  pace: intervalSchema,
  /** The habitual roll-past your misses imply, m. */
  rollPastM: intervalSchema,
  putts: z.number().int(),
  prior: z.object({
    angleDeg: z.number(),
    pace: z.number(),
    angleDegRange: z.tuple([z.number(), z.number()]),
    paceRange: z.tuple([z.number(), z.number()]),
    why: z.string(),
  }),
  /** Share of the information that is still the prior's, per σ (0 … 1). */
  priorWeight: z.object({ angleDeg: z.number(), pace: z.number() }),
  usedPrior: z.boolean(),
});
export type DispersionResponse = z.output<typeof dispersionResponseSchema>;
