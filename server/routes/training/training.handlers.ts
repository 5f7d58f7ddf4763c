import type { z } from "zod";
import { and, desc, eq, sql } from "drizzle-orm";
import {
  createAttemptSchema,
  listAttemptsQuerySchema,
  type CreateAttemptResponse,
  type TrainingAttempt,
} from "../../../shared/schemas/training";
import { evaluateAttempt } from "../../../shared/training";
import type { Db } from "../../db/client";
import { user } from "../../db/auth-schema";
import { trainingAttempts } from "../../db/schema";
import { HttpError, unprocessable } from "../../lib/http-error";
import { ERROR_CODES } from "../../../shared/errors";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

type Row = typeof trainingAttempts.$inferSelect;

function toAttempt(row: Row): TrainingAttempt {
  return {
    id: row.id,
    level: row.level as TrainingAttempt["level"],
    putt: row.putt as TrainingAttempt["putt"],
    guess: row.guess as TrainingAttempt["guess"],
    score: row.score,
    aimErrorM: row.aimErrorM,
    paceErrorM: row.paceErrorM,
    createdAt: row.createdAt.toISOString(),
  };
}

/** The 409 of a putt already scored: its line has been seen, so a second read of it is practice, not a score. */
export const ALREADY_SCORED_REASON = "already-scored";

/**
 * Scores the read here with the same code the client runs; a client's own score is never taken. One scored attempt
 * per putt and player: the reveal shows the true line, so a second read of the same putt (whatever its level) is
 * refused with a 409 and nothing is stored. The player's row is locked for the check, so two requests at once
 * cannot both pass it.
 */
export function createAttempt(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof createAttemptSchema>>) => {
    const me = currentUser(req);
    const input = body;
    const result = evaluateAttempt(input.putt, input.guess);
    if (!result.ok) throw unprocessable(result.message, { "putt.slopePct": "too steep to stop a ball at this Stimp" });
    const row = await db.transaction(async (tx) => {
      await tx.select({ id: user.id }).from(user).where(eq(user.id, me.id)).for("update");
      const [seen] = await tx
        .select({ id: trainingAttempts.id })
        .from(trainingAttempts)
        .where(and(eq(trainingAttempts.userId, me.id), sql`${trainingAttempts.putt} = ${JSON.stringify(input.putt)}::jsonb`))
        .limit(1);
      if (seen) {
        throw new HttpError(
          409,
          ERROR_CODES.conflict,
          "You have been scored on this putt already and have seen its line; a second read of it is practice and is not kept.",
          undefined,
          { reason: ALREADY_SCORED_REASON, attemptId: seen.id },
        );
      }
      const [inserted] = await tx
        .insert(trainingAttempts)
        .values({
          userId: me.id,
          level: input.level,
          putt: input.putt,
          guess: input.guess,
          aimErrorM: result.aimErrorM,
          paceErrorM: result.paceErrorM,
          score: result.score,
        })
        .returning();
      return inserted!;
    });
    const { path: _path, ...truth } = result.truth;
    const y = result.yours;
    const response: CreateAttemptResponse = {
      ...toAttempt(row),
      truth,
      yours: {
        startLineDeg: y.startLineDeg,
        launchSpeedMps: y.launchSpeedMps,
        flatPuttLengthM: y.flatPuttLengthM,
        holed: y.holed,
        outcome: y.outcome,
        restM: y.restM,
      },
    };
    return response;
  };
}

export function listAttempts(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof listAttemptsQuerySchema>>) => {
    const me = currentUser(req);
    const { limit } = query;
    const rows = await db
      .select()
      .from(trainingAttempts)
      .where(eq(trainingAttempts.userId, me.id))
      .orderBy(desc(trainingAttempts.createdAt), desc(trainingAttempts.id))
      .limit(limit);
    return { items: rows.map(toAttempt) };
  };
}
