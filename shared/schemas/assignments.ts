import { z } from "zod";
import type { LadderProgress } from "../ladder-engine";
import { idSchema, isoDateSchema } from "./common";
import { holedHasNoMiss, missLengthMSchema, MISS_SIDES } from "./putts";
import type { FailRule, Rung } from "./ladders";
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
export type LadderSnapshot = {
  sourceLadderId: string;
  name: string;
  description: string | null;
  failRule: FailRule;
  rungs: Rung[];
};

export const ASSIGNMENT_STATUSES = ["assigned", "in-progress", "completed"] as const;
export type AssignmentStatus = (typeof ASSIGNMENT_STATUSES)[number];

export type LadderPutt = {
  id: string;
  rungIndex: number;
  distanceM: number;
  holed: boolean;
  missSide: string | null;
  missLengthM: number | null;
  createdAt: string;
};

export type Assignment = {
  id: string;
  ladder: LadderSnapshot;
  player: { id: string; name: string };
  assignedBy: { id: string; name: string };
  squadId: string | null;
  sessionId: string | null;
  dueDate: string | null;
  /** Not completed and the due date has passed (UTC). */
  overdue: boolean;
  status: AssignmentStatus;
  createdAt: string;
  lastActivityAt: string | null;
  completedAt: string | null;
  progress: LadderProgress;
  /** The rung being played, or null once completed. */
  currentRung: Rung | null;
};

/** GET /api/assignments/:id and the answer to a putt: the assignment with its ladder putts. */
export type AssignmentDetail = Assignment & { putts: LadderPutt[] };

/** One line of a coach's view. */
export type AssignmentSummary = {
  id: string;
  ladderName: string;
  player: { id: string; name: string };
  squadId: string | null;
  status: AssignmentStatus;
  overdue: boolean;
  /** Distinct rungs passed at least once (to reach a rung, every one below it was passed). */
  rungsPassed: number;
  /** 1-based: the highest rung reached, out of rungsTotal. */
  rungReached: number;
  rungsTotal: number;
  currentRung: number;
  attempts: number;
  puttsTaken: number;
  dueDate: string | null;
  createdAt: string;
  lastActivityAt: string | null;
  completedAt: string | null;
};
