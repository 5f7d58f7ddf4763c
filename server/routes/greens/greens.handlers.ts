import type { RequestHandler } from "express";
import { and, asc, desc, eq, sql } from "drizzle-orm";
import { stimpFromTwoWays } from "../../../physics";
import {
  greenInputSchema,
  greenPatchSchema,
  STIMP_LIMITS,
  stimpReadingInputSchema,
  type Green,
  type GreenSummary,
} from "../../../shared/schemas/greens";
import type { Db } from "../../db/client";
import { greens, stimpReadings } from "../../db/schema";
import { notFound, unprocessable } from "../../lib/http-error";
import { pathId } from "../../lib/path-params";
import { currentUser } from "../../middleware/session";
import { body } from "../../middleware/validate";

// Written out in full: in a single-table select Drizzle leaves column names unqualified, which would
// bind "id" inside the subquery to stimp_readings.id.
const currentStimp = sql<number | null>`(select "stimp_readings"."stimp_ft" from "stimp_readings" where "stimp_readings"."green_id" = "greens"."id" order by "stimp_readings"."measured_on" desc, "stimp_readings"."created_at" desc limit 1)`;

const summaryColumns = {
  id: greens.id,
  name: greens.name,
  locationNote: greens.locationNote,
  currentStimpFt: currentStimp,
  createdAt: greens.createdAt,
};

function toSummary(row: { id: string; name: string; locationNote: string | null; currentStimpFt: number | null; createdAt: Date }): GreenSummary {
  return { ...row, currentStimpFt: row.currentStimpFt === null ? null : Number(row.currentStimpFt), createdAt: row.createdAt.toISOString() };
}

/** The owner's green with its readings (newest first), or a 404. */
async function greenOf(db: Db, ownerId: string, id: string): Promise<Green> {
  const [row] = await db.select(summaryColumns).from(greens).where(and(eq(greens.id, id), eq(greens.ownerId, ownerId)));
  if (!row) throw notFound("That green");
  const readings = await db
    .select({ id: stimpReadings.id, measuredOn: stimpReadings.measuredOn, stimpFt: stimpReadings.stimpFt, upFt: stimpReadings.upFt, downFt: stimpReadings.downFt, note: stimpReadings.note })
    .from(stimpReadings)
    .where(eq(stimpReadings.greenId, id))
    .orderBy(desc(stimpReadings.measuredOn), desc(stimpReadings.createdAt));
  return { ...toSummary(row), readings };
}

const greenId = (req: { params: Record<string, string | string[] | undefined> }) => pathId(req);

export function listGreens(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const rows = await db.select(summaryColumns).from(greens).where(eq(greens.ownerId, me.id)).orderBy(asc(greens.name), asc(greens.createdAt));
    res.json({ items: rows.map(toSummary) });
  };
}

export function createGreen(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const input = body(req, greenInputSchema);
    const [row] = await db.insert(greens).values({ ownerId: me.id, name: input.name, locationNote: input.locationNote ?? null }).returning({ id: greens.id });
    res.status(201).json(await greenOf(db, me.id, row!.id));
  };
}

export function getGreen(db: Db): RequestHandler {
  return async (req, res) => {
    res.json(await greenOf(db, currentUser(req).id, greenId(req)));
  };
}

export function updateGreen(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const id = greenId(req);
    const patch = body(req, greenPatchSchema);
    const updated = await db
      .update(greens)
      .set({ ...(patch.name !== undefined ? { name: patch.name } : {}), ...(patch.locationNote !== undefined ? { locationNote: patch.locationNote } : {}) })
      .where(and(eq(greens.id, id), eq(greens.ownerId, me.id)))
      .returning({ id: greens.id });
    if (updated.length === 0) throw notFound("That green");
    res.json(await greenOf(db, me.id, id));
  };
}

export function deleteGreen(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    // Sessions on this green keep their putts; their greenId becomes null (ON DELETE SET NULL).
    const gone = await db.delete(greens).where(and(eq(greens.id, greenId(req)), eq(greens.ownerId, me.id))).returning({ id: greens.id });
    if (gone.length === 0) throw notFound("That green");
    res.status(204).end();
  };
}

export function addStimpReading(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const id = greenId(req);
    const input = body(req, stimpReadingInputSchema);
    await greenOf(db, me.id, id);
    let stimpFt = input.stimpFt;
    if (stimpFt === undefined) {
      // Two-way reading on a slope: Brede's harmonic-mean correction (physics owns the formula).
      stimpFt = stimpFromTwoWays(input.upFt!, input.downFt!);
      if (stimpFt < STIMP_LIMITS.minFt || stimpFt > STIMP_LIMITS.maxFt) {
        throw unprocessable(`These two rolls give a Stimp of ${stimpFt.toFixed(1)} ft, outside ${STIMP_LIMITS.minFt}–${STIMP_LIMITS.maxFt} ft.`, {
          upFt: "check both rolls",
          downFt: "check both rolls",
        });
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
    res.status(201).json(await greenOf(db, me.id, id));
  };
}

export function deleteStimpReading(db: Db): RequestHandler {
  return async (req, res) => {
    const me = currentUser(req);
    const id = greenId(req);
    const readingId = pathId(req, "readingId");
    await greenOf(db, me.id, id);
    const gone = await db.delete(stimpReadings).where(and(eq(stimpReadings.id, readingId), eq(stimpReadings.greenId, id))).returning({ id: stimpReadings.id });
    if (gone.length === 0) throw notFound("That reading");
    res.status(204).end();
  };
}
