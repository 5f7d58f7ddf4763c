import { z } from "zod";
import { multilineText, plainText } from "./text";
import { idSchema, isoDateSchema, timestampSchema } from "./common";

/** Stimp readings accepted, ft: the USGA survey's slowest category is 4′6″; tournament greens reach 14+. */
export const STIMP_LIMITS = { minFt: 3, maxFt: 16 } as const;
/** One direction of a two-way reading on a slope may roll far longer (Brede's example: 981 cm ≈ 32 ft). */
export const ONE_WAY_LIMITS = { minFt: 1, maxFt: 40 } as const;

export const stimpFtSchema = z
  .number({ message: "stimpFt must be a number (feet)" })
  .finite()
  .min(STIMP_LIMITS.minFt, `stimpFt must be at least ${STIMP_LIMITS.minFt} ft`)
  .max(STIMP_LIMITS.maxFt, `stimpFt must be at most ${STIMP_LIMITS.maxFt} ft`);

const oneWayFt = (name: string) =>
  z
    .number({ message: `${name} must be a number (feet)` })
    .finite()
    .min(ONE_WAY_LIMITS.minFt, `${name} must be at least ${ONE_WAY_LIMITS.minFt} ft`)
    .max(ONE_WAY_LIMITS.maxFt, `${name} must be at most ${ONE_WAY_LIMITS.maxFt} ft`);

const name = plainText(80, 1, "Give the green a name");
const locationNote = multilineText(500);

export const greenInputSchema = z.object({ name, locationNote: locationNote.nullish() }).strict();
export type GreenInput = z.infer<typeof greenInputSchema>;

export const greenPatchSchema = z
  .object({ name: name.optional(), locationNote: locationNote.nullable().optional() })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one of name, locationNote", path: ["body"] });
export type GreenPatch = z.infer<typeof greenPatchSchema>;

/**
 * A reading: either the Stimp itself, or the two directions of a reading on a slope (upFt rolled uphill,
 * downFt downhill), which the server corrects with Brede's formula (A. D. Brede, USGA Green Section Record
 * 28(6), 1990).
 */
export const stimpReadingInputSchema = z
  .object({
    measuredOn: isoDateSchema,
    stimpFt: stimpFtSchema.optional(),
    upFt: oneWayFt("upFt").optional(),
    downFt: oneWayFt("downFt").optional(),
    note: plainText(200).nullish(),
  })
  .strict()
  .superRefine((v, ctx) => {
    const twoWay = v.upFt !== undefined || v.downFt !== undefined;
    if (v.stimpFt !== undefined && twoWay) {
      ctx.addIssue({ code: "custom", path: ["stimpFt"], message: "Send either stimpFt or upFt and downFt, not both" });
    } else if (v.stimpFt === undefined && !twoWay) {
      ctx.addIssue({ code: "custom", path: ["stimpFt"], message: "Send stimpFt, or upFt and downFt for a reading on a slope" });
    } else if (twoWay) {
      if (v.upFt === undefined) ctx.addIssue({ code: "custom", path: ["upFt"], message: "A two-way reading needs upFt as well" });
      if (v.downFt === undefined) ctx.addIssue({ code: "custom", path: ["downFt"], message: "A two-way reading needs downFt as well" });
    }
  });
export type StimpReadingInput = z.infer<typeof stimpReadingInputSchema>;

export const stimpReadingSchema = z.object({
  id: z.string(),
  measuredOn: z.string(),
  stimpFt: z.number(),
  upFt: z.number().nullable(),
  downFt: z.number().nullable(),
  note: z.string().nullable(),
});
export type StimpReading = z.output<typeof stimpReadingSchema>;

/** PUT /api/greens/:id/squad: share the green with one of the coach's squads, or (null) keep it to oneself. */
export const greenShareSchema = z.object({ squadId: idSchema.nullable() }).strict();
export type GreenShare = z.infer<typeof greenShareSchema>;

export const greenSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  locationNote: z.string().nullable(),
  /** The squad it is shared with (its players see it, log sessions on it and read on its map); null: the owner's alone. */
  squad: z.object({ id: z.string(), name: z.string() }).nullable(),
  /** Who keeps it (edits it, adds Stimp readings, shares it). */
  ownerName: z.string(),
  /** True for the owner: the only one who edits it, adds readings, uploads its map or shares it. */
  mine: z.boolean(),
  /** The latest reading's Stimp (by measuredOn, then by when it was entered); null without readings. */
  currentStimpFt: z.number().nullable(),
  /** True once a height map is uploaded or walked: GET /api/greens/:id/height-map answers it (a 404 before). */
  hasHeightMap: z.boolean(),
  createdAt: timestampSchema,
});
export type GreenSummary = z.output<typeof greenSummarySchema>;
export const greenSchema = greenSummarySchema.extend({ readings: z.array(stimpReadingSchema) });
export type Green = z.output<typeof greenSchema>;
export const greenListSchema = z.object({ items: z.array(greenSummarySchema) });
export type GreenList = z.output<typeof greenListSchema>;
