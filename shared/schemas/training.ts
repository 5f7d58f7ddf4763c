import { z } from "zod";
import { timestampSchema } from "./common";
import { READ_LIMITS } from "./reads";
import { TRAINING_LEVEL_IDS, puttFitsLevel, type TrueRead } from "../training";

const num = (name: string, min: number, max: number, unit: string) =>
  z
    .number({ message: `${name} must be a number` })
    .finite()
    .min(min, `${name} must be at least ${min} ${unit}`)
    .max(max, `${name} must be at most ${max} ${unit}`);

/** Aim offsets a player can set on the green, m (+ = right of the hole). */
export const AIM_OFFSET_LIMIT_M = 8;
/** Flat-putt lengths a player can set, m. */
export const FLAT_PUTT_LIMITS = { min: 0.1, max: 40 } as const;

export const trainingLevelSchema = z.enum(TRAINING_LEVEL_IDS, { message: `level must be one of ${TRAINING_LEVEL_IDS.join(", ")}` });

export const trainingPuttSchema = z
  .object({
    distanceM: num("distanceM", READ_LIMITS.distanceM.min, READ_LIMITS.distanceM.max, "m"),
    slopePct: num("slopePct", READ_LIMITS.slopePct.min, READ_LIMITS.slopePct.max, "%"),
    fallLineDeg: num("fallLineDeg", 0, 360, "°"),
    stimpFt: num("stimpFt", READ_LIMITS.stimpFt.min, READ_LIMITS.stimpFt.max, "ft"),
  })
  .strict();

const aimOffsetM = num("aimOffsetM", -AIM_OFFSET_LIMIT_M, AIM_OFFSET_LIMIT_M, "m");

/** The player's read: an aim offset and a pace, as a flat-putt length (the trainer's) or roll-past. */
export const trainingGuessSchema = z.union(
  [
    z.object({ aimOffsetM, flatPuttLengthM: num("flatPuttLengthM", FLAT_PUTT_LIMITS.min, FLAT_PUTT_LIMITS.max, "m") }).strict(),
    z.object({ aimOffsetM, rollPastM: num("rollPastM", READ_LIMITS.rollPastM.min, READ_LIMITS.rollPastM.max, "m") }).strict(),
  ],
  { message: "guess needs aimOffsetM and one of flatPuttLengthM or rollPastM" },
);

/** POST /api/training/attempts. Strict: a score (or anything else) sent by the client is refused. */
export const createAttemptSchema = z
  .object({ level: trainingLevelSchema, putt: trainingPuttSchema, guess: trainingGuessSchema })
  .strict()
  .superRefine((v, ctx) => {
    for (const [key, message] of Object.entries(puttFitsLevel(v.putt, v.level))) {
      ctx.addIssue({ code: "custom", path: ["putt", key], message });
    }
  });
export type CreateAttemptInput = z.infer<typeof createAttemptSchema>;

/** GET /api/training/attempts?limit= (newest first). */
export const listAttemptsQuerySchema = z.object({
  limit: z.coerce
    .number({ message: "limit must be a number" })
    .int("limit must be a whole number")
    .min(1, "limit must be at least 1")
    .max(200, "limit must be at most 200")
    .default(50),
});

export const trainingAttemptSchema = z.object({
  id: z.string(),
  level: trainingLevelSchema,
  putt: trainingPuttSchema,
  guess: trainingGuessSchema,
  score: z.number(),
  aimErrorM: z.number(),
  paceErrorM: z.number(),
  createdAt: timestampSchema,
});
export type TrainingAttempt = z.output<typeof trainingAttemptSchema>;

export const createAttemptResponseSchema = trainingAttemptSchema.extend({
  truth: z.object({
    aimOffsetM: z.number(),
    startLineDeg: z.number(),
    launchSpeedMps: z.number(),
    rollPastM: z.number(),
    flatPuttLengthM: z.number(),
    entrySpeedMps: z.number(),
    breaks: z.enum(["left-to-right", "right-to-left", "none"]),
  }) satisfies z.ZodType<Omit<TrueRead, "path">>,
  yours: z.object({
    startLineDeg: z.number(),
    launchSpeedMps: z.number(),
    flatPuttLengthM: z.number(),
    holed: z.boolean(),
    outcome: z.enum(["holed", "lip-out", "miss"]),
    restM: z.tuple([z.number(), z.number()]),
  }),
});
export type CreateAttemptResponse = z.output<typeof createAttemptResponseSchema>;

export const attemptListSchema = z.object({ items: z.array(trainingAttemptSchema) });
export type AttemptList = z.output<typeof attemptListSchema>;
