import type { z } from "zod";
import { and, asc, desc, eq, sql } from "drizzle-orm";
import { stimpFromTwoWays } from "../../../physics";
import {
  greenInputSchema,
  greenPatchSchema,
  greenShareSchema,
  STIMP_LIMITS,
  stimpReadingInputSchema,
  type Green,
  type GreenSummary,
} from "../../../shared/schemas/greens";
import type { Db } from "../../db/client";
import { greens, squads, stimpReadings, user } from "../../db/schema";
import { ownGreenOr403, visibleGreen } from "../../lib/green-access";
import { badRequest, notFound, unprocessable } from "../../lib/http-error";
import { pathId } from "../../lib/path-params";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

// Written out in full: in a single-table select Drizzle leaves column names unqualified, which would
// bind "id" inside the subquery to stimp_readings.id.
const currentStimp = sql<
  number | null
>`(select "stimp_readings"."stimp_ft" from "stimp_readings" where "stimp_readings"."green_id" = "greens"."id" order by "stimp_readings"."measured_on" desc, "stimp_readings"."created_at" desc limit 1)`;

// A column of the row itself: no subquery and no second round trip, for one green or a list of them.
const hasHeightMap = sql<boolean>`("greens"."height_map" is not null)`;

const summaryColumns = {
  id: greens.id,
  name: greens.name,
  locationNote: greens.locationNote,
  currentStimpFt: currentStimp,
  hasHeightMap,
  createdAt: greens.createdAt,
  ownerId: greens.ownerId,
  ownerName: user.name,
  squadId: squads.id,
  squadName: squads.name,
};

type SummaryRow = {
  id: string;
  name: string;
  locationNote: string | null;
  currentStimpFt: number | null;
  hasHeightMap: boolean;
  createdAt: Date;
  ownerId: string;
  ownerName: string;
  squadId: string | null;
  squadName: string | null;
};

function toSummary(row: SummaryRow, meId: string): GreenSummary {
  const { ownerId, squadId, squadName, ...rest } = row;
  return {
    ...rest,
    currentStimpFt: row.currentStimpFt === null ? null : Number(row.currentStimpFt),
    hasHeightMap: Boolean(row.hasHeightMap),
    createdAt: row.createdAt.toISOString(),
    squad: squadId && squadName !== null ? { id: squadId, name: squadName } : null,
    mine: ownerId === meId,
  };
}

/** Greens with their owner's name and the squad they are shared with. */
const selectGreens = (db: Db) =>
  db.select(summaryColumns).from(greens).innerJoin(user, eq(user.id, greens.ownerId)).leftJoin(squads, eq(squads.id, greens.squadId));

/** A green I may see (mine, or shared with a squad of mine) with its readings (newest first), or a 404. */
async function greenOf(db: Db, meId: string, id: string): Promise<Green> {
  const [row] = await selectGreens(db).where(and(eq(greens.id, id), visibleGreen(meId)));
  if (!row) throw notFound("That green");
  const readings = await db
    .select({
      id: stimpReadings.id,
      measuredOn: stimpReadings.measuredOn,
      stimpFt: stimpReadings.stimpFt,
      upFt: stimpReadings.upFt,
      downFt: stimpReadings.downFt,
      note: stimpReadings.note,
    })
    .from(stimpReadings)
    .where(eq(stimpReadings.greenId, id))
    .orderBy(desc(stimpReadings.measuredOn), desc(stimpReadings.createdAt));
  return { ...toSummary(row, meId), readings };
}

const greenId = (req: { params: Record<string, string | string[] | undefined> }) => pathId(req);

export function listGreens(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const rows = await selectGreens(db).where(visibleGreen(me.id)).orderBy(asc(greens.name), asc(greens.createdAt));
    return { items: rows.map((r) => toSummary(r, me.id)) };
  };
}

export function createGreen(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof greenInputSchema>>) => {
    const me = currentUser(req);
    const input = body;
    const [row] = await db
      .insert(greens)
      .values({ ownerId: me.id, name: input.name, locationNote: input.locationNote ?? null })
      .returning({ id: greens.id });
    return await greenOf(db, me.id, row!.id);
  };
}

export function getGreen(db: Db) {
  return async ({ req }: Ctx) => {
    return await greenOf(db, currentUser(req).id, greenId(req));
  };
}

export function updateGreen(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof greenPatchSchema>>) => {
    const me = currentUser(req);
    const id = greenId(req);
    const patch = body;
    await ownGreenOr403(db, me.id, id);
    const updated = await db
      .update(greens)
      .set({
        ...(patch.name !== undefined ? { name: patch.name } : {}),
        ...(patch.locationNote !== undefined ? { locationNote: patch.locationNote } : {}),
      })
      .where(and(eq(greens.id, id), eq(greens.ownerId, me.id)))
      .returning({ id: greens.id });
    if (updated.length === 0) throw notFound("That green");
    return await greenOf(db, me.id, id);
  };
}

export function deleteGreen(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    await ownGreenOr403(db, me.id, greenId(req));
    // Sessions on this green keep their putts; their greenId becomes null (ON DELETE SET NULL).
    const gone = await db
      .delete(greens)
      .where(and(eq(greens.id, greenId(req)), eq(greens.ownerId, me.id)))
      .returning({ id: greens.id });
    if (gone.length === 0) throw notFound("That green");
  };
}

export function addStimpReading(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof stimpReadingInputSchema>>) => {
    const me = currentUser(req);
    const id = greenId(req);
    const input = body;
    // The owner keeps the green's record; a player notes the day's Stimp on their own session instead.
    await ownGreenOr403(db, me.id, id);
    let stimpFt = input.stimpFt;
    if (stimpFt === undefined) {
      // Two-way reading on a slope: Brede's harmonic-mean correction (physics owns the formula).
      stimpFt = stimpFromTwoWays(input.upFt!, input.downFt!);
      if (stimpFt < STIMP_LIMITS.minFt || stimpFt > STIMP_LIMITS.maxFt) {
        throw unprocessable(
          `These two rolls give a Stimp of ${stimpFt.toFixed(1)} ft, outside ${STIMP_LIMITS.minFt}–${STIMP_LIMITS.maxFt} ft.`,
          {
            upFt: "check both rolls",
            downFt: "check both rolls",
          },
        );
      }
    }
    await db.insert(stimpReadings).values({
      greenId: id,
      measuredOn: input.measuredOn,
      stimpFt,
      upFt: input.upFt ?? null,
      downFt: input.downFt ?? null,
      note: input.note ?? null,
    });
    return await greenOf(db, me.id, id);
  };
}

export function deleteStimpReading(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = greenId(req);
    const readingId = pathId(req, "readingId");
    await ownGreenOr403(db, me.id, id);
    const gone = await db
      .delete(stimpReadings)
      .where(and(eq(stimpReadings.id, readingId), eq(stimpReadings.greenId, id)))
      .returning({ id: stimpReadings.id });
    if (gone.length === 0) throw notFound("That reading");
  };
}

/**
 * PUT /api/greens/:id/squad: the owner shares the green with one of the squads they coach, or takes it back
 * (squadId null). A squad that is not theirs is a 400 naming squadId (as a green that is not theirs is for a session).
 */
export function shareGreen(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof greenShareSchema>>) => {
    const me = currentUser(req);
    const id = greenId(req);
    const { squadId } = body;
    await ownGreenOr403(db, me.id, id);
    if (squadId !== null) {
      const [squad] = await db
        .select({ id: squads.id })
        .from(squads)
        .where(and(eq(squads.id, squadId), eq(squads.coachId, me.id)));
      if (!squad) throw badRequest("The request body is not valid.", { squadId: "No squad you coach has this id" });
    }
    await db
      .update(greens)
      .set({ squadId })
      .where(and(eq(greens.id, id), eq(greens.ownerId, me.id)));
    return await greenOf(db, me.id, id);
  };
}
