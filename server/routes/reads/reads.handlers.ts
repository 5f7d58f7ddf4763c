import type { z } from "zod";
import { and, desc, eq } from "drizzle-orm";
import { answerChart, answerRead, toReadResponse } from "../../../shared/read-answers";
import type {
  ChartRequest,
  ReadRequest,
  ReadResponse,
  SaveReadInput,
  savedReadListSchema,
  savedReadSchema,
} from "../../../shared/schemas/reads";
import type { Db } from "../../db/client";
import { visibleGreen } from "../../lib/green-access";
import { greens, savedReads } from "../../db/schema";
import { httpErrorOf, notFound } from "../../lib/http-error";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

type SavedReadAnswer = z.input<typeof savedReadSchema>;

/** The read in the API's shape (shared with the browser, which builds the same answer offline). */
export const toResponse = toReadResponse;

/** Solves a read or throws the 422 a golfer can act on ("this ball cannot stop here"). */
export function solveOrThrow(input: ReadRequest): ReadResponse {
  const answer = answerRead(input);
  if (!answer.ok) throw httpErrorOf(422, answer.error);
  return answer.response;
}

export const solve = ({ body }: Ctx<ReadRequest>): ReadResponse => solveOrThrow(body);

export const chart = ({ body }: Ctx<ChartRequest>) => answerChart(body);

export function saveRead(db: Db) {
  return async ({ req, body: input }: Ctx<SaveReadInput>): Promise<SavedReadAnswer> => {
    const me = currentUser(req);
    let greenName: string | null = null;
    if (input.greenId) {
      const [green] = await db
        .select({ name: greens.name })
        .from(greens)
        .where(and(eq(greens.id, input.greenId), visibleGreen(me.id)));
      if (!green) throw notFound("That green");
      greenName = green.name;
    }
    const result = solveOrThrow(input.read);
    const [row] = await db
      .insert(savedReads)
      .values({ userId: me.id, greenId: input.greenId ?? null, label: input.label ?? null, input: input.read, result: summary(result) })
      .returning();
    // The stored row carries its owner's id: the answer names only what savedReadSchema describes.
    return {
      id: row!.id,
      label: row!.label,
      greenId: row!.greenId,
      greenName,
      input: row!.input as ReadRequest,
      result: row!.result as SavedReadAnswer["result"],
      createdAt: row!.createdAt,
    };
  };
}

/** What a saved read keeps of its answer: the numbers, not the drawn path (recomputed on demand). */
function summary(r: ReadResponse) {
  const { path: _path, ...rest } = r;
  return rest;
}

export function listReads(db: Db) {
  return async ({ req }: Ctx): Promise<z.input<typeof savedReadListSchema>> => {
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
    return { items: rows.map((r) => ({ ...r, input: r.input as ReadRequest, result: r.result as SavedReadAnswer["result"] })) };
  };
}

export function deleteRead(db: Db) {
  return async ({ req, params: { id } }: Ctx<undefined, undefined, { id: string }>) => {
    const me = currentUser(req);
    const gone = await db
      .delete(savedReads)
      .where(and(eq(savedReads.id, id), eq(savedReads.userId, me.id)))
      .returning({ id: savedReads.id });
    if (gone.length === 0) throw notFound("That saved read");
  };
}
