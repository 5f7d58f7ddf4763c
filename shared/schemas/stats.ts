import { z } from "zod";
import { MAX_BAND_EDGE_M, MAX_BAND_EDGES } from "../stats/bands";
import type { Interval } from "../stats/wilson";
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

export type BandRate = { fromM: number; toM: number | null; attempts: number; made: number; rate: number | null; ci95: Interval | null };
export type MakeRates = { playerId: string; from: string | null; to: string | null; source: StatSource; bands: BandRate[] };

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
export type MissBand = {
  fromM: number;
  toM: number | null;
  attempts: number;
  made: number;
  missed: number;
  left: number;
  right: number;
  short: number;
  long: number;
  strokesGained: number;
  leavesAssumed: number;
};
export type Misses = { playerId: string; from: string | null; to: string | null; bands: MissBand[] };
