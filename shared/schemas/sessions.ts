import { z } from "zod";
import { multilineText, plainText } from "./text";
import { idSchema, isoDateSchema } from "./common";
import { stimpFtSchema } from "./greens";

/** page / pageSize of every paginated list (query strings, so coerced). */
export const pageFields = (maxPageSize = 100, defaultPageSize = 20) => ({
  page: z.coerce.number().int().min(1, "page starts at 1").max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(maxPageSize, `pageSize is at most ${maxPageSize}`).default(defaultPageSize),
});

/** from/to (inclusive, YYYY-MM-DD) with from ≤ to. */
export const dateRangeFields = { from: isoDateSchema.optional(), to: isoDateSchema.optional() };
export function fromNotAfterTo(v: { from?: string; to?: string }, ctx: z.RefinementCtx): void {
  if (v.from && v.to && v.from > v.to) ctx.addIssue({ code: "custom", path: ["to"], message: "to must not be before from" });
}

/** A coach (own squads only) or an admin may read another player's data. */
export const playerIdSchema = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/, "Not a player id");

const tag = plainText(30, 1, "A tag cannot be empty");
const sessionFields = {
  date: isoDateSchema,
  greenId: idSchema.nullish(),
  stimpFt: stimpFtSchema.nullish(),
  conditions: plainText(200).nullish(),
  tags: z.array(tag).max(10, "At most 10 tags"),
  notes: multilineText(2000).nullish(),
};

export const sessionInputSchema = z.object({ ...sessionFields, tags: sessionFields.tags.default([]) }).strict();
export type SessionInput = z.infer<typeof sessionInputSchema>;

export const sessionPatchSchema = z
  .object({
    date: sessionFields.date.optional(),
    greenId: sessionFields.greenId,
    stimpFt: sessionFields.stimpFt,
    conditions: sessionFields.conditions,
    tags: sessionFields.tags.optional(),
    notes: sessionFields.notes,
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change", path: ["body"] });
export type SessionPatch = z.infer<typeof sessionPatchSchema>;

export const SESSION_SORTS = ["date", "-date", "putts", "-putts", "makeRate", "-makeRate"] as const;

export const sessionListQuerySchema = z
  .object({
    ...pageFields(),
    ...dateRangeFields,
    sort: z.enum(SESSION_SORTS).default("-date"),
    greenId: idSchema.optional(),
    playerId: playerIdSchema.optional(),
  })
  .strict()
  .superRefine(fromNotAfterTo);
export type SessionListQuery = z.infer<typeof sessionListQuerySchema>;

export const sessionItemSchema = z.object({
  id: z.string(),
  playerId: z.string(),
  date: z.string(),
  greenId: z.string().nullable(),
  greenName: z.string().nullable(),
  stimpFt: z.number().nullable(),
  conditions: z.string().nullable(),
  tags: z.array(z.string()),
  notes: z.string().nullable(),
  putts: z.number().int(),
  holed: z.number().int(),
  /** holed / putts; null for a session without putts. */
  makeRate: z.number().nullable(),
});
export type SessionItem = z.output<typeof sessionItemSchema>;

/** A page of a list: `items` and where it sits in the whole. */
export const pageOf = <T extends z.ZodType>(item: T) =>
  z.object({ items: z.array(item), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() });
export type Page<T> = { items: T[]; total: number; page: number; pageSize: number };
export const sessionPageSchema = pageOf(sessionItemSchema);
