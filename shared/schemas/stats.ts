import { z } from "zod";
import { MAX_BAND_EDGE_M, MAX_BAND_EDGES } from "../stats/bands";
import { isoDateSchema } from "./common";
import { dateRangeFields, fromNotAfterTo, pageFields, playerIdSchema } from "./sessions";

/** `bands=0.6,1.2,1.8` — band edges in metres, strictly increasing, positive (a leading 0 is dropped). */
export const bandsParamSchema = z
  .string()
  .trim()
  .min(1, "bands lists band edges in metres, e.g. 1,2,3,5")
  .transform((s, ctx) => {
    const parts = s.split(",").map((p) => p.trim());
    const edges = parts.map(Number);
    if (parts.some((p) => p === "") || edges.some((e) => !Number.isFinite(e))) {
      ctx.addIssue({ code: "custom", message: "bands must be numbers in metres separated by commas" });
      return z.NEVER;
    }
    const inner = edges[0] === 0 ? edges.slice(1) : edges;
    if (inner.length === 0 || inner.length > MAX_BAND_EDGES) {
      ctx.addIssue({ code: "custom", message: `bands needs 1 to ${MAX_BAND_EDGES} edges above 0` });
      return z.NEVER;
    }
    if (inner.some((e, i) => e <= 0 || e > MAX_BAND_EDGE_M || (i > 0 && e <= inner[i - 1]!))) {
      ctx.addIssue({ code: "custom", message: `band edges must be above 0, at most ${MAX_BAND_EDGE_M} m, and strictly increasing` });
      return z.NEVER;
    }
    return inner;
  });

export const STAT_SOURCES = ["practice", "rounds", "all"] as const;
export type StatSource = (typeof STAT_SOURCES)[number];

const common = {
  bands: bandsParamSchema.optional(),
  playerId: playerIdSchema.optional(),
  source: z.enum(STAT_SOURCES).default("practice"),
};

export const makeRatesQuerySchema = z
  .object({ ...dateRangeFields, ...common })
  .strict()
  .superRefine(fromNotAfterTo);
export type MakeRatesQuery = z.infer<typeof makeRatesQuerySchema>;

export const trendQuerySchema = z
  .object({
    ...dateRangeFields,
    ...common,
    window: z.enum(["week", "rolling"]).default("week"),
    /** Weeks in the rolling window (the week itself and the weeks before it). */
    windowWeeks: z.coerce.number().int().min(2).max(12).default(4),
  })
  .strict()
  .superRefine(fromNotAfterTo);
export type TrendQuery = z.infer<typeof trendQuerySchema>;

export const compareQuerySchema = z
  .object({ aFrom: isoDateSchema, aTo: isoDateSchema, bFrom: isoDateSchema, bTo: isoDateSchema, ...common })
  .strict()
  .superRefine((v, ctx) => {
    if (v.aFrom > v.aTo) ctx.addIssue({ code: "custom", path: ["aTo"], message: "aTo must not be before aFrom" });
    if (v.bFrom > v.bTo) ctx.addIssue({ code: "custom", path: ["bTo"], message: "bTo must not be before bFrom" });
  });
export type CompareQuery = z.infer<typeof compareQuerySchema>;

export const sessionStatsQuerySchema = z
  .object({ ...pageFields(100, 50), ...dateRangeFields, playerId: playerIdSchema.optional() })
  .strict()
  .superRefine(fromNotAfterTo);

const bandEdges = { fromM: z.number(), toM: z.number().nullable() };
const rateFields = {
  attempts: z.number().int(),
  made: z.number().int(),
  rate: z.number().nullable(),
  ci95: z.tuple([z.number(), z.number()]).nullable(),
};
/** A make rate with its Wilson 95 % interval (shared/stats/wilson.ts); rate and ci95 are null for an empty band. */
export const rateSchema = z.object(rateFields);
export const bandRateSchema = z.object({ ...bandEdges, ...rateFields });
export type BandRate = z.output<typeof bandRateSchema>;
const range = { playerId: z.string(), from: z.string().nullable(), to: z.string().nullable() };
export const makeRatesSchema = z.object({ ...range, source: z.enum(STAT_SOURCES), bands: z.array(bandRateSchema) });
export type MakeRates = z.output<typeof makeRatesSchema>;

/** GET /api/stats/misses: practice putts only (a round's holes record no miss side or leave). */
export const missesQuerySchema = z
  .object({ ...dateRangeFields, bands: bandsParamSchema.optional(), playerId: playerIdSchema.optional() })
  .strict()
  .superRefine(fromNotAfterTo);
export type MissesQuery = z.infer<typeof missesQuerySchema>;

/**
 * One band's misses and strokes: `left`/`right` count misses with a side logged; `short`/`long` misses with
 * a leave logged (negative leave = short). `strokesGained` sums the band's putts against the tour baseline.
 */
export const missBandSchema = z.object({
  ...bandEdges,
  attempts: z.number().int(),
  made: z.number().int(),
  missed: z.number().int(),
  left: z.number().int(),
  right: z.number().int(),
  short: z.number().int(),
  long: z.number().int(),
  strokesGained: z.number(),
  leavesAssumed: z.number().int(),
});
export type MissBand = z.output<typeof missBandSchema>;
export const missesSchema = z.object({ ...range, bands: z.array(missBandSchema) });
export type Misses = z.output<typeof missesSchema>;

/** GET /api/stats/trend: per week (or rolling window), each band's rate. */
export const trendSchema = z.object({
  ...range,
  source: z.enum(STAT_SOURCES),
  window: z.enum(["week", "rolling"]),
  windowWeeks: z.number().int(),
  bands: z.array(z.object(bandEdges)),
  weeks: z.array(z.object({ weekStart: z.string(), bands: z.array(rateSchema) })),
});
export type Trend = z.output<typeof trendSchema>;

const compareSide = {
  a: rateSchema,
  b: rateSchema,
  difference: z.number().nullable(),
  z: z.number().nullable(),
  pValue: z.number().nullable(),
};
export const compareSideSchema = z.object(compareSide);
export type CompareSide = z.output<typeof compareSideSchema>;
/** GET /api/stats/compare: two periods, per band and overall, with a two-proportion z-test. */
export const compareSchema = z.object({
  playerId: z.string(),
  source: z.enum(STAT_SOURCES),
  a: z.object({ from: z.string(), to: z.string() }),
  b: z.object({ from: z.string(), to: z.string() }),
  /** Overlapping periods count a putt in both; the z-test then overstates the evidence. */
  overlap: z.boolean(),
  bands: z.array(z.object({ ...bandEdges, ...compareSide })),
  overall: compareSideSchema,
});
export type Compare = z.output<typeof compareSchema>;

const baselineSeriesSchema = z.object({
  label: z.string(),
  source: z.string(),
  firmness: z.string(),
  points: z.array(z.object({ distanceFt: z.number(), distanceM: z.number(), value: z.number() })),
});
export type BaselineSeriesOut = z.output<typeof baselineSeriesSchema>;
/** GET /api/stats/baseline: the tour baseline behind strokes gained, with its sources. */
export const baselineSchema = z.object({
  onePuttRate: baselineSeriesSchema,
  expectedPutts: baselineSeriesSchema,
  interpolation: z.string(),
  strokesGained: z.object({ definition: z.string(), unknownLeave: z.string(), longPuttM: z.number(), threePuttRangeM: z.number() }),
});
export type Baseline = z.output<typeof baselineSchema>;

export const sessionStatSchema = z.object({
  sessionId: z.string(),
  date: z.string(),
  greenName: z.string().nullable(),
  stimpFt: z.number().nullable(),
  putts: z.number().int(),
  holed: z.number().int(),
  expectedPutts: z.number(),
  puttsTaken: z.number(),
  strokesGained: z.number(),
  leavesAssumed: z.number().int(),
  longPutts: z.number().int(),
  /** Lags whose finish is known (holed or leave recorded). */
  longPuttsKnown: z.number().int(),
  longLagsOutside1m: z.number().int(),
  longLagOutsideShare: z.number().nullable(),
});
export type SessionStat = z.output<typeof sessionStatSchema>;
/** GET /api/stats/sessions: strokes gained per session, a page at a time. */
export const sessionStatsSchema = z.object({
  playerId: z.string(),
  items: z.array(sessionStatSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type SessionStats = z.output<typeof sessionStatsSchema>;
