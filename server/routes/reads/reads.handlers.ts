import type { RequestHandler } from "express";
import { and, desc, eq } from "drizzle-orm";
import { answerChart, answerRead, toReadResponse } from "../../../shared/read-answers";
import { idSchema } from "../../../shared/schemas/common";
import { chartRequestSchema, readRequestSchema, saveReadSchema, type ReadResponse } from "../../../shared/schemas/reads";
import type { Db } from "../../db/client";
import { visibleGreen } from "../../lib/green-access";
import { greens, savedReads } from "../../db/schema";
import { httpErrorOf, notFound } from "../../lib/http-error";
import { currentUser } from "../../middleware/session";
import { body, parseOrThrow } from "../../middleware/validate";

/** The read in the API's shape (shared with the browser, which builds the same answer offline). */
export const toResponse = toReadResponse;

/** Solves a read or throws the 422 a golfer can act on ("this ball cannot stop here"). */
export function solveOrThrow(input: ReturnType<typeof readRequestSchema.parse>): ReadResponse {
  const answer = answerRead(input);
  if (!answer.ok) throw httpErrorOf(422, answer.error);
  return answer.response;
}

export const solve: RequestHandler = (req, res) => {
  res.json(solveOrThrow(body(req, readRequestSchema)));
};

export const chart: RequestHandler = (req, res) => {
  res.json(answerChart(body(req, chartRequestSchema)));
};

export function saveRead(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const input = body(req, saveReadSchema);
    if (input.greenId) {
      const [green] = await db.select({ id: greens.id }).from(greens).where(and(eq(greens.id, input.greenId), visibleGreen(me.id)));
      if (!green) throw notFound("That green");
    }
    const result = solveOrThrow(input.read);
    const [row] = await db
      .insert(savedReads)
      .values({ userId: me.id, greenId: input.greenId ?? null, label: input.label ?? null, input: input.read, result: summary(result) })
      .returning();
    res.status(201).json(row);
  };
}

/** What a saved read keeps of its answer: the numbers, not the drawn path (recomputed on demand). */
function summary(r: ReadResponse) {
  const { path: _path, ...rest } = r;
  return rest;
}

export function listReads(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const rows = await db
      .select({
        id: savedReads.id,
        label: savedReads.label,
        greenId: savedReads.greenId,
        greenName: greens.name,
        input: savedReads.input,
        result: savedReads.result,
        createdAt: savedReads.createdAt,
      })
      .from(savedReads)
      .leftJoin(greens, eq(greens.id, savedReads.greenId))
      .where(eq(savedReads.userId, me.id))
      .orderBy(desc(savedReads.createdAt))
      .limit(200);
    res.json({ items: rows });
  };
}

export function deleteRead(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const id = parseOrThrow(idSchema, req.params.id, "id");
    const gone = await db.delete(savedReads).where(and(eq(savedReads.id, id), eq(savedReads.userId, me.id))).returning({ id: savedReads.id });
    if (gone.length === 0) throw notFound("That saved read");
    res.status(204).end();
  };
}
