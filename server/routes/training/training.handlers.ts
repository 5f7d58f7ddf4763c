import type { RequestHandler } from "express";
import { desc, eq } from "drizzle-orm";
import {
  createAttemptSchema,
  listAttemptsQuerySchema,
  type CreateAttemptResponse,
  type TrainingAttempt,
} from "../../../shared/schemas/training";
import { evaluateAttempt } from "../../../shared/training";
import type { Db } from "../../db/client";
import { trainingAttempts } from "../../db/schema";
import { unprocessable } from "../../lib/http-error";
import { currentUser } from "../../middleware/session";
import { body, query } from "../../middleware/validate";

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

/** Scores the read here with the same code the client runs; a client's own score is never taken. */
export function createAttempt(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const input = body(req, createAttemptSchema);
    const result = evaluateAttempt(input.putt, input.guess);
    if (!result.ok) throw unprocessable(result.message, { "putt.slopePct": "too steep to stop a ball at this Stimp" });
    const [row] = await db
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
    const { path: _path, ...truth } = result.truth;
    const y = result.yours;
    const response: CreateAttemptResponse = {
      ...toAttempt(row!),
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
    res.status(201).json(response);
  };
}

export function listAttempts(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const { limit } = query(req, listAttemptsQuerySchema);
    const rows = await db
      .select()
      .from(trainingAttempts)
      .where(eq(trainingAttempts.userId, me.id))
      .orderBy(desc(trainingAttempts.createdAt), desc(trainingAttempts.id))
      .limit(limit);
    res.json({ items: rows.map(toAttempt) });
  };
}
