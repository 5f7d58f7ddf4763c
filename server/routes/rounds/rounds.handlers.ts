import type { z } from "zod";
import { and, asc, desc, eq, gte, inArray, lte, sql, type SQL } from "drizzle-orm";
import {
  holeBodySchema,
  holeNumberSchema,
  roundInputSchema,
  roundListQuerySchema,
  type Round,
  type RoundSummary,
} from "../../../shared/schemas/rounds";
import type { Page } from "../../../shared/schemas/sessions";
import { roundTotals, valueHole, type HoleRow } from "../../../shared/stats/rounds";
import type { Db } from "../../db/client";
import { roundHoles, rounds } from "../../db/schema";
import { notFound } from "../../lib/http-error";
import { readableBy, targetPlayerId } from "../../lib/player-access";
import { pathId, pathParam } from "../../lib/path-params";
import { currentUser, type SessionUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

const roundId = (req: { params: Record<string, string | string[] | undefined> }) => pathId(req);

/** Holes store 0 as firstPuttM for a hole with no putt (the column is NOT NULL); the API says null. */
function holeRow(r: typeof roundHoles.$inferSelect): HoleRow {
  return { holeNumber: r.holeNumber, firstPuttM: r.putts === 0 ? null : r.firstPuttM, putts: r.putts, leftAfterFirstM: r.leftAfterFirstM };
}

async function holesOf(db: Db, ids: string[]): Promise<Map<string, HoleRow[]>> {
  const out = new Map<string, HoleRow[]>(ids.map((id) => [id, []]));
  if (ids.length === 0) return out;
  const rows = await db.select().from(roundHoles).where(inArray(roundHoles.roundId, ids)).orderBy(asc(roundHoles.holeNumber));
  for (const r of rows) out.get(r.roundId)!.push(holeRow(r));
  return out;
}

async function roundOf(db: Db, viewer: SessionUser, id: string): Promise<Round> {
  const [r] = await db
    .select()
    .from(rounds)
    .where(and(eq(rounds.id, id), readableBy(viewer, rounds.playerId)));
  if (!r) throw notFound("That round");
  const holes = (await holesOf(db, [id])).get(id)!;
  return { id: r.id, date: r.date, course: r.course, notes: r.notes, totals: roundTotals(holes), holes: holes.map(valueHole) };
}

export function createRound(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof roundInputSchema>>) => {
    const me = currentUser(req);
    const input = body;
    const id = await db.transaction(async (tx) => {
      const [r] = await tx
        .insert(rounds)
        .values({ playerId: me.id, date: input.date, course: input.course ?? null, notes: input.notes ?? null })
        .returning({ id: rounds.id });
      if (input.holes.length > 0) {
        await tx.insert(roundHoles).values(
          input.holes.map((h) => ({
            roundId: r!.id,
            holeNumber: h.holeNumber,
            firstPuttM: h.firstPuttM ?? 0,
            putts: h.putts,
            leftAfterFirstM: h.leftAfterFirstM ?? null,
          })),
        );
      }
      return r!.id;
    });
    return await roundOf(db, me, id);
  };
}

export function putHole(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof holeBodySchema>>) => {
    const me = currentUser(req);
    const id = roundId(req);
    const holeNumber = pathParam(req, "n", holeNumberSchema);
    const h = body;
    const [own] = await db
      .select({ id: rounds.id })
      .from(rounds)
      .where(and(eq(rounds.id, id), eq(rounds.playerId, me.id)));
    if (!own) throw notFound("That round");
    const values = { firstPuttM: h.firstPuttM ?? 0, putts: h.putts, leftAfterFirstM: h.leftAfterFirstM ?? null };
    await db
      .insert(roundHoles)
      .values({ roundId: id, holeNumber, ...values })
      .onConflictDoUpdate({ target: [roundHoles.roundId, roundHoles.holeNumber], set: values });
    return await roundOf(db, me, id);
  };
}

export function getRound(db: Db) {
  return async ({ req }: Ctx) => {
    return await roundOf(db, currentUser(req), roundId(req));
  };
}

export function deleteRound(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const gone = await db
      .delete(rounds)
      .where(and(eq(rounds.id, roundId(req)), eq(rounds.playerId, me.id)))
      .returning({ id: rounds.id });
    if (gone.length === 0) throw notFound("That round");
  };
}

export function listRounds(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof roundListQuerySchema>>) => {
    const viewer = currentUser(req);
    const qs = query;
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const where: SQL[] = [eq(rounds.playerId, playerId)];
    if (qs.from) where.push(gte(rounds.date, qs.from));
    if (qs.to) where.push(lte(rounds.date, qs.to));
    const cond = and(...where)!;
    const [rows, [total]] = await Promise.all([
      db
        .select()
        .from(rounds)
        .where(cond)
        .orderBy(desc(rounds.date), desc(rounds.createdAt), asc(rounds.id))
        .limit(qs.pageSize)
        .offset((qs.page - 1) * qs.pageSize),
      db
        .select({ n: sql<number>`count(*)::int` })
        .from(rounds)
        .where(cond),
    ]);
    const holes = await holesOf(
      db,
      rows.map((r) => r.id),
    );
    const page: Page<RoundSummary> = {
      items: rows.map((r) => ({ id: r.id, date: r.date, course: r.course, notes: r.notes, totals: roundTotals(holes.get(r.id)!) })),
      total: Number(total?.n ?? 0),
      page: qs.page,
      pageSize: qs.pageSize,
    };
    return page;
  };
}
