import { z } from "zod";
import { plainText } from "./text";
import { idSchema, timestampSchema } from "./common";
import { dateRangeFields, fromNotAfterTo, pageFields, playerIdSchema } from "./sessions";

export const BREAK_TYPES = ["uphill", "downhill", "left-to-right", "right-to-left", "straight"] as const;
export type BreakType = (typeof BREAK_TYPES)[number];
export const MISS_SIDES = ["left", "right"] as const;
export type MissSide = (typeof MISS_SIDES)[number];

export const PUTT_LIMITS = { distanceM: { min: 0.1, max: 60 }, missLengthM: { max: 30 } } as const;

export const distanceMSchema = z
  .number({ message: "distanceM must be a number (metres)" })
  .finite()
  .min(PUTT_LIMITS.distanceM.min, `distanceM must be at least ${PUTT_LIMITS.distanceM.min} m`)
  .max(PUTT_LIMITS.distanceM.max, `distanceM must be at most ${PUTT_LIMITS.distanceM.max} m`);

/** Signed: negative = short of the hole, positive = past it. */
export const missLengthMSchema = z
  .number({ message: "missLengthM must be a number (metres; negative = short)" })
  .finite()
  .min(-PUTT_LIMITS.missLengthM.max, `missLengthM must be at least -${PUTT_LIMITS.missLengthM.max} m`)
  .max(PUTT_LIMITS.missLengthM.max, `missLengthM must be at most ${PUTT_LIMITS.missLengthM.max} m`);

/** The rule shared by the API and the CSV import: a holed putt has no miss fields. */
export function holedHasNoMiss(v: { holed: boolean; missSide?: unknown; missLengthM?: unknown }, ctx: z.RefinementCtx): void {
  if (!v.holed) return;
  if (v.missSide != null) ctx.addIssue({ code: "custom", path: ["missSide"], message: "A holed putt has no miss side" });
  if (v.missLengthM != null) ctx.addIssue({ code: "custom", path: ["missLengthM"], message: "A holed putt has no miss length" });
}

export const puttFieldsSchema = z
  .object({
    distanceM: distanceMSchema,
    holed: z.boolean({ message: "holed must be true or false" }),
    missSide: z.enum(MISS_SIDES, { message: "missSide is left or right" }).nullish(),
    missLengthM: missLengthMSchema.nullish(),
    breakType: z.enum(BREAK_TYPES, { message: `breakType is one of ${BREAK_TYPES.join(", ")}` }).nullish(),
  })
  .strict();

export const puttInputSchema = puttFieldsSchema.extend({ clientId: idSchema.optional() }).strict().superRefine(holedHasNoMiss);
export type PuttInput = z.infer<typeof puttInputSchema>;

export const PUTT_SORTS = ["date", "-date", "distance", "-distance", "createdAt", "-createdAt"] as const;

export const puttListQuerySchema = z
  .object({
    ...pageFields(200, 50),
    ...dateRangeFields,
    sort: z.enum(PUTT_SORTS).default("-date"),
    holed: z
      .enum(["true", "false"])
      .transform((v) => v === "true")
      .optional(),
    breakType: z.enum(BREAK_TYPES).optional(),
    sessionId: idSchema.optional(),
    minM: z.coerce.number().finite().min(0).max(60).optional(),
    maxM: z.coerce.number().finite().min(0).max(60).optional(),
    playerId: playerIdSchema.optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    fromNotAfterTo(v, ctx);
    if (v.minM !== undefined && v.maxM !== undefined && v.minM > v.maxM)
      ctx.addIssue({ code: "custom", path: ["maxM"], message: "maxM must not be below minM" });
  });
export type PuttListQuery = z.infer<typeof puttListQuerySchema>;

export const puttSchema = z.object({
  id: z.string(),
  sessionId: z.string(),
  date: z.string(),
  distanceM: z.number(),
  holed: z.boolean(),
  missSide: z.enum(MISS_SIDES).nullable(),
  missLengthM: z.number().nullable(),
  breakType: z.enum(BREAK_TYPES).nullable(),
  clientId: z.string().nullable(),
  createdAt: timestampSchema,
});
export type Putt = z.output<typeof puttSchema>;
export const puttListSchema = z.object({ items: z.array(puttSchema) });
export type PuttList = z.output<typeof puttListSchema>;
export const puttPageSchema = z.object({
  items: z.array(puttSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});

// ---- CSV import of putts -------------------------------------------------------------------------

export const CSV_DISTANCE_UNITS = ["m", "ft"] as const;
export const CSV_SHORT_UNITS = ["m", "cm", "ft", "in"] as const;
const column = plainText(200, 1, "Name a column");

/**
 * Which CSV column (by its header text) holds what. date, distance and holed are required; distanceUnit
 * says whether distances are in metres or feet; missLength is signed (negative = short) in
 * missLengthUnit (default: the distance unit). Rows are grouped into sessions by date plus the session
 * column (if mapped) or else the green column.
 */
export const csvMappingSchema = z
  .object({
    date: column,
    distance: column,
    distanceUnit: z.enum(CSV_DISTANCE_UNITS),
    holed: column,
    missSide: column.optional(),
    missLength: column.optional(),
    missLengthUnit: z.enum(CSV_SHORT_UNITS).optional(),
    breakType: column.optional(),
    green: column.optional(),
    session: column.optional(),
  })
  .strict();
export type CsvMapping = z.infer<typeof csvMappingSchema>;

/** The multipart text fields beside `file` on import. */
export const csvImportFieldsSchema = z
  .object({
    mapping: z.string({ message: "Send the column mapping as JSON in the mapping field" }).min(2),
    skipInvalid: z.enum(["true", "false"]).default("false"),
  })
  .strict();

export const csvExportQuerySchema = z
  .object({ ...dateRangeFields, playerId: playerIdSchema.optional() })
  .strict()
  .superRefine(fromNotAfterTo);

export const csvRowErrorSchema = z.object({ row: z.number().int(), line: z.number().int(), field: z.string(), message: z.string() });
export type CsvRowError = z.output<typeof csvRowErrorSchema>;
export const csvImportResultSchema = z.object({
  imported: z.number().int(),
  sessionsCreated: z.number().int(),
  greensCreated: z.number().int(),
  skipped: z.number().int(),
  errors: z.array(csvRowErrorSchema),
});
export type CsvImportResult = z.output<typeof csvImportResultSchema>;
/** The 422 of an all-or-nothing import with bad rows: the error shape and the result (nothing imported). */
export const csvImportRefusedSchema = csvImportResultSchema.extend({
  error: z.object({ code: z.string(), message: z.string(), fields: z.record(z.string(), z.string()) }),
});
export const csvImportResponseSchema = z.union([csvImportResultSchema, csvImportRefusedSchema]);
export const csvPreviewSchema = z.object({
  headers: z.array(z.string()),
  rows: z.array(z.array(z.string())),
  rowCount: z.number().int(),
  delimiter: z.string(),
  suggestedMapping: csvMappingSchema.partial(),
});
export type CsvPreview = z.output<typeof csvPreviewSchema>;
