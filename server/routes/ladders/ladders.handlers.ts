import type { z } from "zod";
import { and, desc, eq } from "drizzle-orm";
import { idSchema } from "../../../shared/schemas/common";
import {
  ladderCopySchema,
  ladderInputSchema,
  type FailRule,
  type Ladder,
  type LadderInput,
  type Rung,
} from "../../../shared/schemas/ladders";
import type { Db } from "../../db/client";
import { ladders, user } from "../../db/schema";
import { forbidden, notFound } from "../../lib/http-error";
import { currentUser, type SessionUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import type { Ctx } from "../../lib/route";
import { ownedBy } from "../squads/squad-access";
import { BUILT_IN_LADDERS, findBuiltInLadder } from "./built-in-ladders";

type LadderRow = typeof ladders.$inferSelect;

export function ladderView(row: LadderRow): Ladder {
  return {
    id: row.id,
    builtIn: false,
    ownerId: row.ownerId,
    name: row.name,
    ...(row.description ? { description: row.description } : {}),
    failRule: row.failRule as FailRule,
    rungs: row.rungs as Rung[],
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** A built-in ladder, or one of the user's own (any for an admin); another coach's ladder is a 404. */
export async function findLadder(db: Db, me: SessionUser, id: string): Promise<Ladder> {
  const builtIn = findBuiltInLadder(id);
  if (builtIn) return builtIn;
  const [row] = await db
    .select()
    .from(ladders)
    .where(and(eq(ladders.id, id), ownedBy(ladders.ownerId, me)));
  if (!row) throw notFound("Ladder");
  return ladderView(row);
}

async function findOwnEditable(db: Db, me: SessionUser, rawId: unknown): Promise<Ladder> {
  const ladder = await findLadder(db, me, parseOrThrow(idSchema, rawId, "id"));
  if (ladder.builtIn) throw forbidden("Built-in ladders cannot be changed; copy one to make it your own.");
  return ladder;
}

function columns(input: LadderInput) {
  return { name: input.name, description: input.description ?? null, failRule: input.failRule, rungs: input.rungs };
}

export function createLadder(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof ladderInputSchema>>) => {
    const me = currentUser(req);
    const [row] = await db
      .insert(ladders)
      .values({ ownerId: me.id, ...columns(body) })
      .returning();
    return ladderView(row!);
  };
}

/** The user's own library (newest first), then the built-in ladders. */
export function listLadders(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const rows = await db
      .select({ ladder: ladders, ownerName: user.name })
      .from(ladders)
      .innerJoin(user, eq(user.id, ladders.ownerId))
      .where(ownedBy(ladders.ownerId, me))
      .orderBy(desc(ladders.createdAt), ladders.id);
    // The owner's name goes with each ladder so an admin's list says whose it is.
    return { ladders: [...rows.map((r) => ({ ...ladderView(r.ladder), ownerName: r.ownerName })), ...BUILT_IN_LADDERS] };
  };
}

export function getLadder(db: Db) {
  return async ({ req }: Ctx) => {
    return await findLadder(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
  };
}

/** Replaces the ladder. Assignments already made keep the copy they were given. */
export function updateLadder(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof ladderInputSchema>>) => {
    const ladder = await findOwnEditable(db, currentUser(req), req.params.id);
    const [row] = await db
      .update(ladders)
      .set({ ...columns(body), updatedAt: new Date() })
      .where(eq(ladders.id, ladder.id))
      .returning();
    return ladderView(row!);
  };
}

export function deleteLadder(db: Db) {
  return async ({ req }: Ctx) => {
    const ladder = await findOwnEditable(db, currentUser(req), req.params.id);
    await db.delete(ladders).where(eq(ladders.id, ladder.id));
  };
}

/** A copy in the user's own library: of a built-in ladder (same name) or of their own (" (copy)"). */
export function copyLadder(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof ladderCopySchema>>) => {
    const me = currentUser(req);
    const source = await findLadder(db, me, parseOrThrow(idSchema, req.params.id, "id"));
    const { name } = body;
    const copyName = name ?? (source.builtIn ? source.name : `${source.name.slice(0, 73)} (copy)`);
    const [row] = await db
      .insert(ladders)
      .values({ ownerId: me.id, ...columns({ ...source, name: copyName }) })
      .returning();
    return ladderView(row!);
  };
}
