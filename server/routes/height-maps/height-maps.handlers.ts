import type { RequestHandler } from "express";
import { and, eq, sql } from "drizzle-orm";
import { maxStoppableSlopePct, solveReadOnSurface, surfaceFromGrid } from "../../../physics";
import {
  gridFromSpotHeights,
  parseHeightGridCsv,
  parseSpotHeightsCsv,
  summarizeHeightMap,
  validateHeightMap,
  type Checked,
} from "../../../shared/height-map";
import { idSchema } from "../../../shared/schemas/common";
import {
  heightMapCsvFieldsSchema,
  heightMapInputSchema,
  type HeightMapResponse,
  type HeightMapSummary,
  type SurfaceReadResponse,
  type SurfaceSolveRequest,
  type StoredHeightMap,
} from "../../../shared/schemas/height-map";
import type { Db } from "../../db/client";
import { greens } from "../../db/schema";
import { ownGreenOr403, visibleGreen } from "../../lib/green-access";
import { csvText } from "../../lib/csv";
import { badRequest, cannotStopError, notFound, unprocessable } from "../../lib/http-error";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";
import { parseOrThrow } from "../../middleware/validate";

/** 404 unless I may see the green, 403 unless it is mine: only its owner changes its map (lib/green-access.ts). */
export function requireOwnGreen(db: Db): RequestHandler {
  return async (req, _res, next) => {
    const me = currentUser(req);
    await ownGreenOr403(db, me.id, parseOrThrow(idSchema, req.params.id, "id"));
    next();
  };
}

function orThrow<T>(checked: Checked<T>): T {
  if (!checked.ok) throw badRequest(checked.message, checked.errors);
  return checked.value;
}

/** The upload, from a multipart CSV (field `file`, with spacingM, originXM, originYM, format) or a JSON body. */
function uploadedMap(req: Parameters<RequestHandler>[0]): StoredHeightMap {
  if (req.file !== undefined || req.is("multipart/form-data")) {
    const fields = parseOrThrow(heightMapCsvFieldsSchema, req.body ?? {}, "form fields");
    const text = csvText(req.file);
    if (fields.format === "spots") return orThrow(gridFromSpotHeights(orThrow(parseSpotHeightsCsv(text)), fields.spacingM));
    const heightsM = orThrow(parseHeightGridCsv(text));
    return orThrow(
      validateHeightMap({
        spacingM: fields.spacingM,
        originM: [fields.originXM, fields.originYM],
        heightsM,
        source: "grid",
        spotCount: null,
      }),
    );
  }
  const input = parseOrThrow(heightMapInputSchema, req.body ?? {}, "request body");
  if (input.kind === "spots") return orThrow(gridFromSpotHeights(input.points, input.spacingM));
  const walked = input.walked
    ? { source: "walked" as const, spotCount: input.heightsM.reduce((n, row) => n + row.length, 0) }
    : { source: "grid" as const, spotCount: null };
  return orThrow(validateHeightMap({ spacingM: input.spacingM, originM: input.originM, heightsM: input.heightsM, ...walked }));
}

export function putHeightMap(db: Db) {
  return async ({ req }: Ctx): Promise<HeightMapSummary> => {
    const me = currentUser(req);
    const id = parseOrThrow(idSchema, req.params.id, "id");
    const map = uploadedMap(req);
    await db
      .update(greens)
      .set({ heightMap: map })
      .where(and(eq(greens.id, id), eq(greens.ownerId, me.id)));
    return summarizeHeightMap(map);
  };
}

async function storedMap(db: Db, meId: string, rawId: unknown): Promise<StoredHeightMap> {
  const id = parseOrThrow(idSchema, rawId, "id");
  const [row] = await db
    .select({ heightMap: greens.heightMap })
    .from(greens)
    .where(and(eq(greens.id, id), visibleGreen(meId)));
  if (!row) throw notFound("That green");
  if (row.heightMap == null) throw notFound("That green's height map");
  return row.heightMap as StoredHeightMap;
}

export function getHeightMap(db: Db) {
  return async ({ req }: Ctx): Promise<HeightMapResponse> => {
    const map = await storedMap(db, currentUser(req).id, req.params.id);
    return { ...summarizeHeightMap(map), heightsM: map.heightsM };
  };
}

export function deleteHeightMap(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = parseOrThrow(idSchema, req.params.id, "id");
    const gone = await db
      .update(greens)
      .set({ heightMap: null })
      .where(and(eq(greens.id, id), eq(greens.ownerId, me.id), sql`${greens.heightMap} is not null`))
      .returning({ id: greens.id });
    if (gone.length === 0) throw notFound("That green's height map");
  };
}

export function solveOnSurface(db: Db) {
  return async ({ req, body: input }: Ctx<SurfaceSolveRequest>): Promise<SurfaceReadResponse> => {
    const me = currentUser(req);
    const map = await storedMap(db, me.id, req.params.id);
    const surface = surfaceFromGrid(map);
    const fields: Record<string, string> = {};
    const b = surface.bounds;
    const where = `inside the map: x ${b.minX}…${b.maxX} m, y ${b.minY}…${b.maxY} m`;
    if (!surface.contains(input.ball[0], input.ball[1])) fields.ball = `must lie ${where}`;
    if (!surface.contains(input.hole[0], input.hole[1])) fields.hole = `must lie ${where}`;
    if (Math.hypot(input.hole[0] - input.ball[0], input.hole[1] - input.ball[1]) < 0.3)
      fields.hole = "must be at least 0.3 m from the ball";
    if (Object.keys(fields).length > 0) throw badRequest("The ball and the hole must be on the height map.", fields);
    const result = solveReadOnSurface({ surface, stimpFt: input.stimpFt, ballM: input.ball, holeM: input.hole, pace: input.pace });
    if (!result.ok && result.reason === "cannot-stop") {
      throw cannotStopError(result.message, "stimpFt", input.stimpFt, result.maxStoppableSlopePct ?? maxStoppableSlopePct(input.stimpFt));
    }
    if (!result.ok) throw unprocessable(result.message, { pace: result.reason });
    const r = result.read;
    return {
      launchSpeedMps: r.launchSpeedMps,
      startLineDeg: r.startLineDeg,
      aimOffsetM: r.aimOffsetM,
      aimGiven: r.aimGiven,
      aimNote: r.aimNote,
      entrySpeedMps: r.entrySpeedMps,
      rollPastM: r.rollPastM,
      flatPuttLengthM: r.flatPuttLengthM,
      breaks: r.breaks,
      capture: {
        holed: r.capture.holed,
        outcome: r.capture.outcome,
        maxCaptureSpeedMps: r.capture.maxCaptureSpeedMps,
        marginMps: r.capture.marginMps,
      },
      path: r.path,
      puttFramePath: r.puttFramePath,
      restM: r.restM,
      distanceM: r.distanceM,
      meanPlane: r.meanPlane,
      model: {
        name: r.model.name,
        v0Mps: r.model.v0Mps,
        rollingDecelMps2: r.model.rollingDecelMps2,
        gravityDecelMps2: r.model.gravityDecelMps2,
        maxStoppableSlopePct: r.model.maxStoppableSlopePct,
      },
      diagnostics: r.diagnostics,
    };
  };
}
