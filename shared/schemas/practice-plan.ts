// The practice plan (issue 17): request and response of /api/practice-plan, as zod schemas; the types are inferred
// from them. The plan itself is worked out by the pure `buildPracticePlan` in shared/practice-plan.ts.
import { z } from "zod";
import { TRAINING_LEVEL_IDS } from "../training";
import { UNIT_SYSTEMS } from "../units";
import { idSchema, isoDateSchema } from "./common";
import { ladderInputSchema } from "./ladders";
import { playerIdSchema } from "./sessions";

const interval = z.tuple([z.number(), z.number()]);
const rate = z.number().min(0).max(1);

/** GET /api/practice-plan?playerId= — a coach or an admin names the player; a player reads their own. */
export const practicePlanQuerySchema = z.object({ playerId: playerIdSchema.optional() }).strict();
export type PracticePlanQuery = z.infer<typeof practicePlanQuerySchema>;

/** POST /api/practice-plan/start — the signed-in player starts their own proposed plan; nothing to send. */
export const startPlanInputSchema = z.object({}).strict();
export type StartPlanInput = z.infer<typeof startPlanInputSchema>;

/** POST /api/practice-plan/adopt — a coach takes a player's proposed plan into their ladder library. */
export const adoptPlanInputSchema = z.object({ playerId: playerIdSchema }).strict();
export type AdoptPlanInput = z.infer<typeof adoptPlanInputSchema>;

/** Where the weights (how often a putt of each length is faced on the course) came from. */
export const FREQUENCY_SOURCES = ["rounds", "published"] as const;

/** One distance band of the analysis: the player's make rate against the baseline, and what it costs a round. */
export const planBandSchema = z.object({
  fromM: z.number(),
  toM: z.number().nullable(),
  attempts: z.number().int(),
  made: z.number().int(),
  rate: rate.nullable(),
  ci95: interval.nullable(),
  /** The tour's one-putt rate over the same lengths (the mean over the band's putts; the band's middle when empty). */
  baselineRate: rate,
  /** Strokes lost per putt against the baseline (a miss costs one more putt): baselineRate − rate; null when empty. */
  lossPerPutt: z.number().nullable(),
  /** The same from the Wilson interval's two ends: [baseline − hi, baseline − lo]. */
  lossCi95: interval.nullable(),
  /** Share of the putts faced on the course that fall in this band (0–1). */
  courseShare: z.number().min(0).max(1),
  /** Putts of this length faced in a round of 18 holes. */
  facedPerRound: z.number().min(0),
  /** lossPerPutt × facedPerRound: strokes a round lost at this length (null when empty). */
  strokesPerRound: z.number().nullable(),
  /** Enough putts to judge (at least MIN_BAND_ATTEMPTS). */
  judged: z.boolean(),
  /** Judged and the whole loss interval above zero: the loss is clear of its interval. */
  clearLoss: z.boolean(),
  /** The band is one the plan works on. */
  target: z.boolean(),
});
export type PlanBand = z.infer<typeof planBandSchema>;

export const weeklyVolumeSchema = z.object({
  sessions: z.number().int().min(1),
  puttsPerSession: z.number().int().min(1),
  puttsPerWeek: z.number().int().min(1),
  /** Putts a week in each target band: enough to see a change within a few weeks. */
  puttsPerTargetBand: z.number().int().min(1),
});
export type WeeklyVolume = z.infer<typeof weeklyVolumeSchema>;

const analysis = {
  puttsLogged: z.number().int(),
  bands: z.array(planBandSchema),
  frequency: z.object({ source: z.enum(FREQUENCY_SOURCES), coursePutts: z.number().int(), rounds: z.number().int(), note: z.string() }),
};

export const planProposalSchema = z.discriminatedUnion("status", [
  z.object({ status: z.literal("log-more"), puttsNeeded: z.number().int(), message: z.string(), ...analysis }),
  z.object({ status: z.literal("no-clear-loss"), message: z.string(), ...analysis }),
  z.object({
    status: z.literal("plan"),
    message: z.string(),
    ...analysis,
    /** The target bands, the costliest first: indices into `bands`. */
    targets: z.array(z.number().int()).min(1),
    ladder: ladderInputSchema,
    weekly: weeklyVolumeSchema,
    trainingLevel: z.enum(TRAINING_LEVEL_IDS),
    units: z.enum(UNIT_SYSTEMS),
  }),
]);
export type PlanProposal = z.infer<typeof planProposalSchema>;
export type PlanReady = Extract<PlanProposal, { status: "plan" }>;

export const BAND_MOVES = ["better", "worse", "not-clear", "no-putts"] as const;
export type BandMove = (typeof BAND_MOVES)[number];

/** One target band in one week of a running plan, against the weeks before it started. */
export const weekBandSchema = z.object({
  fromM: z.number(),
  toM: z.number().nullable(),
  attempts: z.number().int(),
  made: z.number().int(),
  rate: rate.nullable(),
  ci95: interval.nullable(),
  /** Two-proportion z-test against `before` (null when either side has no putts). */
  difference: z.number().nullable(),
  pValue: z.number().nullable(),
  move: z.enum(BAND_MOVES),
});
export type WeekBand = z.infer<typeof weekBandSchema>;

export const planWeekSchema = z.object({
  week: z.number().int().min(1),
  from: isoDateSchema,
  to: isoDateSchema,
  bands: z.array(weekBandSchema),
});
export type PlanWeek = z.infer<typeof planWeekSchema>;

/** A plan someone started (the player) or adopted (a coach), with the check of every week since. */
export const activePlanSchema = z.object({
  id: idSchema,
  startedOn: isoDateSchema,
  startedBy: z.object({ id: z.string(), name: z.string(), role: z.enum(["player", "coach", "admin"]) }),
  /** The runnable ladder the player started (their own assignment), or null when a coach adopted it. */
  assignmentId: idSchema.nullable(),
  /** The ladder a coach adopted into their library, or null. */
  ladderId: idSchema.nullable(),
  plan: planProposalSchema.options[2],
  /** The target bands over the weeks before the start (the same window as the proposal). */
  before: z.array(weekBandSchema.omit({ difference: true, pValue: true, move: true })),
  weeks: z.array(planWeekSchema),
});
export type ActivePlan = z.infer<typeof activePlanSchema>;

/** GET /api/practice-plan: what the log proposes now, and the plan under way (if any). */
export const practicePlanResponseSchema = z.object({
  playerId: z.string(),
  playerName: z.string(),
  window: z.object({ from: isoDateSchema, to: isoDateSchema }),
  proposal: planProposalSchema,
  active: activePlanSchema.nullable(),
});
export type PracticePlanResponse = z.infer<typeof practicePlanResponseSchema>;

/** POST /api/practice-plan/start → 201. */
export const startPlanResponseSchema = z.object({ assignmentId: idSchema, active: activePlanSchema });
export type StartPlanResponse = z.infer<typeof startPlanResponseSchema>;

/** POST /api/practice-plan/adopt → 201: the new ladder in the coach's library (edit and assign it from there). */
export const adoptPlanResponseSchema = z.object({ ladderId: idSchema, active: activePlanSchema });
export type AdoptPlanResponse = z.infer<typeof adoptPlanResponseSchema>;
