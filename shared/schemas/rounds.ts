import { z } from "zod";
import { multilineText, plainText } from "./text";
import { isoDateSchema } from "./common";
import { distanceMSchema } from "./putts";
import { dateRangeFields, fromNotAfterTo, pageFields, pageOf, playerIdSchema } from "./sessions";

export const MAX_PUTTS_PER_HOLE = 6;

export const holeNumberSchema = z.coerce
  .number({ message: "holeNumber must be a number" })
  .int("holeNumber is a whole number")
  .min(1, "holeNumber is 1 to 18")
  .max(18, "holeNumber is 1 to 18");

/**
 * One hole's putting: the first putt's length, the putts taken (0 = holed from off the green: then no
 * firstPuttM), and optionally how far the first putt finished from the hole.
 */
const holeFields = {
  firstPuttM: distanceMSchema.optional(),
  putts: z
    .number({ message: "putts must be a number" })
    .int("putts is a whole number")
    .min(0)
    .max(MAX_PUTTS_PER_HOLE, `putts is at most ${MAX_PUTTS_PER_HOLE}`),
  leftAfterFirstM: z.number({ message: "leftAfterFirstM must be a number (metres)" }).finite().min(0).max(30).nullish(),
};

function holeRules(v: { firstPuttM?: number; putts: number; leftAfterFirstM?: number | null }, ctx: z.RefinementCtx): void {
  if (v.putts > 0 && v.firstPuttM === undefined)
    ctx.addIssue({ code: "custom", path: ["firstPuttM"], message: "A hole with putts needs the first putt's length" });
  if (v.putts === 0 && v.firstPuttM !== undefined)
    ctx.addIssue({ code: "custom", path: ["firstPuttM"], message: "A hole with no putt has no first putt" });
  if (v.leftAfterFirstM != null) {
    if (v.putts <= 1 && v.leftAfterFirstM > 0)
      ctx.addIssue({ code: "custom", path: ["leftAfterFirstM"], message: "The first putt was holed: nothing was left" });
    if (v.putts >= 2 && v.leftAfterFirstM === 0)
      ctx.addIssue({ code: "custom", path: ["leftAfterFirstM"], message: "With two or more putts the first one left a distance above 0" });
  }
}

export const holeBodySchema = z.object(holeFields).strict().superRefine(holeRules);
export type HoleBody = z.infer<typeof holeBodySchema>;

export const roundHoleInputSchema = z
  .object({ holeNumber: holeNumberSchema, ...holeFields })
  .strict()
  .superRefine(holeRules);

export const roundInputSchema = z
  .object({
    date: isoDateSchema,
    course: plainText(120).nullish(),
    notes: multilineText(2000).nullish(),
    holes: z.array(roundHoleInputSchema).max(18, "A round has at most 18 holes").default([]),
  })
  .strict()
  .superRefine((v, ctx) => {
    const seen = new Set<number>();
    v.holes.forEach((h, i) => {
      if (seen.has(h.holeNumber))
        ctx.addIssue({ code: "custom", path: ["holes", i, "holeNumber"], message: `Hole ${h.holeNumber} appears twice` });
      seen.add(h.holeNumber);
    });
  });
export type RoundInput = z.infer<typeof roundInputSchema>;

export const roundListQuerySchema = z
  .object({ ...pageFields(), ...dateRangeFields, playerId: playerIdSchema.optional() })
  .strict()
  .superRefine(fromNotAfterTo);

export const roundHoleSchema = z.object({
  holeNumber: z.number().int(),
  firstPuttM: z.number().nullable(),
  putts: z.number().int(),
  leftAfterFirstM: z.number().nullable(),
  /** Tour average putts from firstPuttM; null for a hole with no putt. */
  expectedPutts: z.number().nullable(),
  strokesGained: z.number().nullable(),
});
export type RoundHole = z.output<typeof roundHoleSchema>;

export const roundTotalsSchema = z.object({
  holes: z.number().int(),
  putts: z.number().int(),
  onePutts: z.number().int(),
  threePutts: z.number().int(),
  expectedPutts: z.number(),
  strokesGained: z.number(),
  /** First putts from 6 m or more, and those of them whose leave is known and above 1 m. */
  longFirstPutts: z.number().int(),
  longLagsOutside1m: z.number().int(),
});
export type RoundTotals = z.output<typeof roundTotalsSchema>;

export const roundSummarySchema = z.object({
  id: z.string(),
  date: z.string(),
  course: z.string().nullable(),
  notes: z.string().nullable(),
  totals: roundTotalsSchema,
});
export type RoundSummary = z.output<typeof roundSummarySchema>;
export const roundPageSchema = pageOf(roundSummarySchema);
export const roundSchema = roundSummarySchema.extend({ holes: z.array(roundHoleSchema) });
export type Round = z.output<typeof roundSchema>;
