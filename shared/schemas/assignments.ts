import { z } from "zod";
import type { LadderProgress } from "../ladder-engine";
import { idSchema, isoDateSchema, timestampSchema } from "./common";
import { holedHasNoMiss, missLengthMSchema, MISS_SIDES } from "./putts";
import { FAIL_RULES, rungSchema } from "./ladders";
import { userIdSchema } from "./squads";

/** POST /api/ladders/:id/assignments: to listed players or to every member of a squad, not both. */
export const assignInputSchema = z
  .object({
    playerIds: z.array(userIdSchema).min(1, "Name at least one player").max(200).optional(),
    squadId: idSchema.optional(),
    dueDate: isoDateSchema.optional(),
  })
  .strict()
  .superRefine((a, ctx) => {
    if ((a.playerIds === undefined) === (a.squadId === undefined)) {
      ctx.addIssue({ code: "custom", path: ["playerIds"], message: "Send either playerIds or squadId" });
    }
  });
export type AssignInput = z.infer<typeof assignInputSchema>;

/** One ladder putt; its distance is the current rung's. A holed putt carries no miss fields. */
export const ladderPuttInputSchema = z
  .object({
    holed: z.boolean(),
    missSide: z.enum(MISS_SIDES).optional(),
    /** Signed, metres: negative = short of the hole, positive = past it. */
    missLengthM: missLengthMSchema.optional(),
    /** Made by the client so a retried request is stored once. */
    clientId: idSchema.optional(),
  })
  .strict()
  .superRefine(holedHasNoMiss);
export type LadderPuttInput = z.infer<typeof ladderPuttInputSchema>;

/** The copy of the ladder an assignment keeps, as it was when assigned. */
export const ladderSnapshotSchema = z.object({
  sourceLadderId: z.string(),
  name: z.string(),
  description: z.string().nullable(),
  failRule: z.enum(FAIL_RULES),
  rungs: z.array(rungSchema),
});
export type LadderSnapshot = z.output<typeof ladderSnapshotSchema>;

export const ASSIGNMENT_STATUSES = ["assigned", "in-progress", "completed"] as const;
export type AssignmentStatus = (typeof ASSIGNMENT_STATUSES)[number];

export const ladderPuttSchema = z.object({
  id: z.string(),
  rungIndex: z.number().int(),
  distanceM: z.number(),
  holed: z.boolean(),
  missSide: z.string().nullable(),
  missLengthM: z.number().nullable(),
  createdAt: timestampSchema,
});
export type LadderPutt = z.output<typeof ladderPuttSchema>;

const verdict = z.enum(["passed", "failed"]);
/** shared/ladder-engine.ts's LadderProgress, on the wire. */
export const ladderProgressSchema = z.object({
  rungIndex: z.number().int(),
  ballsTaken: z.number().int(),
  holed: z.number().int(),
  streak: z.number().int(),
  ballsLeft: z.number().int(),
  lastResult: verdict.nullable(),
  completed: z.boolean(),
  attempts: z.number().int(),
  puttsTaken: z.number().int(),
  bestRungIndex: z.number().int(),
  history: z.array(
    z.object({
      rungIndex: z.number().int(),
      ballsTaken: z.number().int(),
      holed: z.number().int(),
      result: verdict,
      nextRungIndex: z.number().int(),
    }),
  ),
}) satisfies z.ZodType<LadderProgress>;

const person = z.object({ id: z.string(), name: z.string() });
export const assignmentSchema = z.object({
  id: z.string(),
  ladder: ladderSnapshotSchema,
  player: person,
  assignedBy: person,
  squadId: z.string().nullable(),
  sessionId: z.string().nullable(),
  dueDate: z.string().nullable(),
  /** Not completed and the due date has passed (UTC). */
  overdue: z.boolean(),
  status: z.enum(ASSIGNMENT_STATUSES),
  createdAt: timestampSchema,
  lastActivityAt: timestampSchema.nullable(),
  completedAt: timestampSchema.nullable(),
  progress: ladderProgressSchema,
  /** The rung being played, or null once completed. */
  currentRung: rungSchema.nullable(),
});
export type Assignment = z.output<typeof assignmentSchema>;
export const assignmentListSchema = z.object({ assignments: z.array(assignmentSchema) });

/** GET /api/assignments/:id and the answer to a putt: the assignment with its ladder putts. */
export const assignmentDetailSchema = assignmentSchema.extend({ putts: z.array(ladderPuttSchema) });
export type AssignmentDetail = z.output<typeof assignmentDetailSchema>;

/** One line of a coach's view. */
export const assignmentSummarySchema = z.object({
  id: z.string(),
  ladderName: z.string(),
  player: person,
  squadId: z.string().nullable(),
  status: z.enum(ASSIGNMENT_STATUSES),
  overdue: z.boolean(),
  /** Distinct rungs passed at least once (to reach a rung, every one below it was passed). */
  rungsPassed: z.number().int(),
  /** 1-based: the highest rung reached, out of rungsTotal. */
  rungReached: z.number().int(),
  rungsTotal: z.number().int(),
  currentRung: z.number().int(),
  attempts: z.number().int(),
  puttsTaken: z.number().int(),
  dueDate: z.string().nullable(),
  createdAt: timestampSchema,
  lastActivityAt: timestampSchema.nullable(),
  completedAt: timestampSchema.nullable(),
});
export type AssignmentSummary = z.output<typeof assignmentSummarySchema>;

/** GET /api/coach/players: the players of the coach's squads with their ladders from this coach. */
export const coachedPlayersSchema = z.object({
  players: z.array(
    z.object({
      id: z.string(),
      name: z.string(),
      email: z.string(),
      squads: z.array(z.object({ id: z.string(), name: z.string() })),
      assignments: z.array(assignmentSummarySchema),
    }),
  ),
});
/** GET /api/coach/players/:playerId. */
export const coachedPlayerSchema = z.object({
  player: z.object({ id: z.string(), name: z.string(), email: z.string() }),
  squads: z.array(z.object({ id: z.string(), name: z.string(), joinedAt: timestampSchema })),
  assignments: z.array(assignmentSchema),
});
export type CoachedPlayers = z.output<typeof coachedPlayersSchema>;
export type CoachedPlayer = CoachedPlayers["players"][number];
export type CoachedPlayerDetail = z.output<typeof coachedPlayerSchema>;
/** GET /api/coach/squads/:id/assignments. */
export const squadAssignmentsSchema = z.object({
  squad: z.object({ id: z.string(), name: z.string() }),
  assignments: z.array(assignmentSummarySchema),
});
