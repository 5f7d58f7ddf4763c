import { z } from "zod";
import { multilineText, plainText } from "./text";
import { BREAK_TYPES } from "./putts";

export const FAIL_RULES = ["repeat", "drop-one", "restart"] as const;
export type FailRule = (typeof FAIL_RULES)[number];

export const passRuleSchema = z.discriminatedUnion("kind", [
  /** Hole at least `made` of the rung's balls. */
  z.object({ kind: z.literal("make"), made: z.number().int().min(1).max(50) }).strict(),
  /** Hole `count` in a row within the rung's balls. */
  z.object({ kind: z.literal("in-a-row"), count: z.number().int().min(1).max(50) }).strict(),
]);
export type PassRule = z.infer<typeof passRuleSchema>;

/** Holed balls a pass rule asks for. Every use of a rule's kind switches exhaustively: a new kind fails to compile. */
export function holedToPass(rule: PassRule): number {
  switch (rule.kind) {
    case "make":
      return rule.made;
    case "in-a-row":
      return rule.count;
    default:
      return unknownRule(rule);
  }
}

/** The `default` of an exhaustive switch over pass rules: unreachable while every kind has its case. */
export function unknownRule(rule: never): never {
  throw new Error(`Unknown pass rule ${JSON.stringify(rule)}`);
}

export const rungSchema = z
  .object({
    distanceM: z.number().finite().min(0.3).max(30),
    balls: z.number().int().min(1).max(50),
    passRule: passRuleSchema,
    breakType: z.enum(BREAK_TYPES).optional(),
    note: plainText(200).optional(),
  })
  .strict()
  .superRefine((rung, ctx) => {
    const need = holedToPass(rung.passRule);
    if (need > rung.balls) {
      ctx.addIssue({ code: "custom", path: ["passRule"], message: `Needs ${need} holed but the rung has only ${rung.balls} balls` });
    }
  });
export type Rung = z.infer<typeof rungSchema>;

export const ladderInputSchema = z
  .object({
    name: plainText(80, 1, "Give the ladder a name"),
    description: multilineText(500).optional(),
    failRule: z.enum(FAIL_RULES),
    rungs: z.array(rungSchema).min(1, "A ladder needs at least one rung").max(20),
  })
  .strict();
export type LadderInput = z.infer<typeof ladderInputSchema>;

/** A ladder as the API answers it: the coach's own (ownerId set) or one of Borrowline's built-in ones. */
/** A ladder as the API answers it: the coach's own (ownerId set) or one of Borrowline's built-in ones. */
export const ladderSchema = z.object({
  id: z.string(),
  builtIn: z.boolean(),
  ownerId: z.string().nullable(),
  /** In a library list: the owner's name (an admin sees every coach's ladders). */
  ownerName: z.string().optional(),
  name: z.string(),
  description: z.string().optional(),
  failRule: z.enum(FAIL_RULES),
  rungs: z.array(rungSchema),
  createdAt: z.string().nullable(),
  updatedAt: z.string().nullable(),
});
export type Ladder = z.output<typeof ladderSchema>;
export const ladderListSchema = z.object({ ladders: z.array(ladderSchema) });

/** POST /api/ladders/:id/copy: an optional new name (default: the original's, with " (copy)" for one's own). */
export const ladderCopySchema = z.object({ name: plainText(80, 1, "Give the ladder a name").optional() }).strict();
