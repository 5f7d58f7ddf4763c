import { z } from "zod";
import { DEFAULT_ROLL_PAST_M } from "../../physics/constants";
import { timestampSchema } from "./common";
import { plainText } from "./text";

import { READ_LIMITS } from "../read-limits";

export { READ_LIMITS };

const within = (name: keyof typeof READ_LIMITS, unit: string) => {
  const { min, max } = READ_LIMITS[name];
  return z
    .number({ message: `${name} must be a number` })
    .finite()
    .min(min, `${name} must be at least ${min} ${unit}`)
    .max(max, `${name} must be at most ${max} ${unit}`);
};

/** Default pace: about 17 in (0.45 m) past the hole if it missed — common practice (physics/constants.ts, the one source). */
export { DEFAULT_ROLL_PAST_M };

export const paceSchema = z.union([
  z.object({ rollPastM: within("rollPastM", "m") }).strict(),
  z.object({ entrySpeedMps: within("entrySpeedMps", "m/s") }).strict(),
]);
export type Pace = z.infer<typeof paceSchema>;

export const readRequestSchema = z
  .object({
    distanceM: within("distanceM", "m"),
    slopePct: within("slopePct", "%"),
    fallLineDeg: within("fallLineDeg", "°"),
    stimpFt: within("stimpFt", "ft"),
    pace: paceSchema.default({ rollPastM: DEFAULT_ROLL_PAST_M }),
  })
  .strict();
export type ReadRequest = z.infer<typeof readRequestSchema>;

export const BREAK_DIRECTIONS = ["left-to-right", "right-to-left", "none"] as const;

const pointSchema = z.tuple([z.number(), z.number()]);
export const readModelSchema = z.object({
  name: z.string(),
  v0Mps: z.number(),
  rollingDecelMps2: z.number(),
  gravityDecelMps2: z.number(),
  maxStoppableSlopePct: z.number(),
});

/** POST /api/reads/solve (and the browser's offline answer, shared/read-answers.ts). */
export const readResponseSchema = z.object({
  launchSpeedMps: z.number(),
  startLineDeg: z.number(),
  /** D·tan(start line), m (+ = right); null when the start line is wider than 60° (`aimGiven: "start-line"`). */
  aimOffsetM: z.number().nullable(),
  /** "offset": the aim is given beside the hole; "start-line": only the start line, with `aimNote` in words. */
  aimGiven: z.enum(["offset", "start-line"]),
  aimNote: z.string().nullable(),
  entrySpeedMps: z.number(),
  rollPastM: z.number(),
  /** Length of a flat putt (same Stimp) needing the same launch speed with the same roll-past, m. */
  flatPuttLengthM: z.number(),
  breaks: z.enum(BREAK_DIRECTIONS),
  capture: z.object({
    holed: z.boolean(),
    outcome: z.enum(["holed", "lip-out", "miss"]),
    maxCaptureSpeedMps: z.number(),
    marginMps: z.number(),
  }),
  path: z.array(pointSchema),
  model: readModelSchema,
});
export type ReadResponse = z.output<typeof readResponseSchema>;

/** A saved read as the API answers it (never the database row: no owner id). */
export const savedReadSchema = z.object({
  id: z.string(),
  label: z.string().nullable(),
  greenId: z.string().nullable(),
  greenName: z.string().nullable(),
  input: readRequestSchema,
  /** The answer without its drawn path. */
  result: readResponseSchema.omit({ path: true }),
  createdAt: timestampSchema,
});
export type SavedRead = z.output<typeof savedReadSchema>;
export const savedReadListSchema = z.object({ items: z.array(savedReadSchema) });
export type SavedReadList = z.output<typeof savedReadListSchema>;

export const saveReadSchema = z
  .object({
    read: readRequestSchema,
    greenId: z.string().uuid().optional(),
    label: plainText(80).optional(),
  })
  .strict();
export type SaveReadInput = z.infer<typeof saveReadSchema>;

export const MAX_CHART_CELLS = 400;

export const chartRequestSchema = z
  .object({
    slopePct: within("slopePct", "%"),
    stimpFt: within("stimpFt", "ft"),
    pace: paceSchema.default({ rollPastM: DEFAULT_ROLL_PAST_M }),
    distances: z.array(within("distanceM", "m")).min(1).max(60),
    fallLineDegs: z.array(within("fallLineDeg", "°")).min(1).max(72),
  })
  .strict()
  .superRefine((v, ctx) => {
    const cells = v.distances.length * v.fallLineDegs.length;
    if (cells > MAX_CHART_CELLS) {
      ctx.addIssue({
        code: "custom",
        path: ["distances"],
        message: `At most ${MAX_CHART_CELLS} cells (distances × fallLineDegs); asked for ${cells}`,
      });
    }
  });
export type ChartRequest = z.infer<typeof chartRequestSchema>;

const chartCellSchema = z.discriminatedUnion("ok", [
  z.object({
    ok: z.literal(true),
    distanceM: z.number(),
    fallLineDeg: z.number(),
    /** Null beyond a 60° start line: the cell then gives the start line only. */
    aimOffsetM: z.number().nullable(),
    aimGiven: z.enum(["offset", "start-line"]),
    startLineDeg: z.number(),
    launchSpeedMps: z.number(),
    entrySpeedMps: z.number(),
  }),
  z.object({ ok: z.literal(false), distanceM: z.number(), fallLineDeg: z.number(), reason: z.literal("cannot-stop") }),
]);
export type ChartCellAnswer = z.output<typeof chartCellSchema>;

/** POST /api/reads/chart: `cells[i][j]` is distance i, fall line j. */
export const chartResponseSchema = z.object({
  slopePct: z.number(),
  stimpFt: z.number(),
  pace: paceSchema,
  distances: z.array(z.number()),
  fallLineDegs: z.array(z.number()),
  canStop: z.boolean(),
  cells: z.array(z.array(chartCellSchema)),
  model: z.object({ name: z.string(), maxStoppableSlopePct: z.number(), rollingDecelMps2: z.number() }),
});
export type ChartResponse = z.output<typeof chartResponseSchema>;
