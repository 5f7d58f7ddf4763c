import { z } from "zod";
import { paceSchema, DEFAULT_ROLL_PAST_M, READ_LIMITS, readResponseSchema } from "./reads";

/**
 * Limits of a height map. A green is rarely over 50 m across; 40 000 nodes is 200 × 200 (0.25 m spacing over
 * 50 m). Slopes over 15 % between neighbouring nodes are survey errors on a putting green (hole locations sit on
 * 1–3 %, common practice; docs/sources.md, "Rolling on a slope").
 */
export const HEIGHT_MAP_LIMITS = {
  spacingM: { min: 0.05, max: 5 },
  maxNodesPerSide: 400,
  maxNodes: 40_000,
  minNodesPerSide: 2,
  maxSlopePct: 15,
  maxAbsHeightM: 100,
  spots: { min: 4, max: 5000 },
  originM: { maxAbs: 10_000 },
} as const;

const num = (name: string) => z.number({ message: `${name} must be a number` }).finite(`${name} must be a finite number`);

export const spacingMSchema = num("spacingM")
  .min(HEIGHT_MAP_LIMITS.spacingM.min, `spacingM must be at least ${HEIGHT_MAP_LIMITS.spacingM.min} m`)
  .max(HEIGHT_MAP_LIMITS.spacingM.max, `spacingM must be at most ${HEIGHT_MAP_LIMITS.spacingM.max} m`);

const coordinate = (name: string) =>
  num(name)
    .min(-HEIGHT_MAP_LIMITS.originM.maxAbs, `${name} is too far out`)
    .max(HEIGHT_MAP_LIMITS.originM.maxAbs, `${name} is too far out`);

const point = (name: string) =>
  z.tuple([coordinate(`${name}[0] (x)`), coordinate(`${name}[1] (y)`)], { message: `${name} is [x, y] in metres` });

/**
 * A grid of heights (m), rows north to south as a map is read: `heightsM[0]` is the north edge, the last row the
 * south edge at y = originM[1]; each row runs west to east from x = originM[0]. Rows `spacingM` apart, as are values.
 */
export const heightGridInputSchema = z
  .object({
    kind: z.literal("grid"),
    spacingM: spacingMSchema,
    originM: point("originM").default([0, 0]),
    heightsM: z.array(z.array(num("height")), { message: "heightsM is an array of rows of heights (m)" }),
    /** True when the heights were rebuilt from slopes measured with a phone at every node ("map this green"). */
    walked: z.boolean({ message: "walked is true or false" }).default(false),
  })
  .strict();

/** Spot heights [x, y, z] (m) in the green's frame, interpolated onto a grid of `spacingM` over their extent. */
export const spotHeightsInputSchema = z
  .object({
    kind: z.literal("spots"),
    spacingM: spacingMSchema,
    points: z
      .array(z.tuple([num("x"), num("y"), num("z")], { message: "each point is [x, y, z] in metres" }))
      .min(HEIGHT_MAP_LIMITS.spots.min, `at least ${HEIGHT_MAP_LIMITS.spots.min} spot heights`)
      .max(HEIGHT_MAP_LIMITS.spots.max, `at most ${HEIGHT_MAP_LIMITS.spots.max} spot heights`),
  })
  .strict();

export const heightMapInputSchema = z.discriminatedUnion("kind", [heightGridInputSchema, spotHeightsInputSchema], {
  message: 'kind is "grid" or "spots"',
});
export type HeightMapInput = z.infer<typeof heightMapInputSchema>;

/** The text fields beside a multipart CSV upload (field `file`). */
export const heightMapCsvFieldsSchema = z
  .object({
    format: z.enum(["grid", "spots"], { message: 'format is "grid" (a CSV of heights) or "spots" (x,y,z rows)' }).default("grid"),
    spacingM: z.coerce.number({ message: "spacingM must be a number (metres)" }).pipe(spacingMSchema),
    originXM: z.coerce.number().pipe(coordinate("originXM")).default(0),
    originYM: z.coerce.number().pipe(coordinate("originYM")).default(0),
  })
  .strict();

/** A validated, stored height map (greens.height_map), rows north to south. */
export type StoredHeightMap = {
  spacingM: number;
  originM: [number, number];
  heightsM: number[][];
  /** "walked": rebuilt from phone slope readings at every node (spotCount of them). */
  source: "grid" | "spots" | "walked";
  spotCount: number | null;
};

const xy = z.tuple([z.number(), z.number()]);

/** PUT /api/greens/:id/height-map: what was stored, without the heights. */
export const heightMapSummarySchema = z.object({
  nx: z.number().int(),
  ny: z.number().int(),
  spacingM: z.number(),
  originM: xy,
  widthM: z.number(),
  depthM: z.number(),
  minHeightM: z.number(),
  maxHeightM: z.number(),
  /** Steepest grade between neighbouring nodes, %. */
  maxSlopePct: z.number(),
  /** "walked": rebuilt from phone slope readings at every node (spotCount of them). */
  source: z.enum(["grid", "spots", "walked"]),
  spotCount: z.number().int().nullable(),
});
export type HeightMapSummary = z.output<typeof heightMapSummarySchema>;

/** GET /api/greens/:id/height-map: the summary and the heights, rows north to south. */
export const heightMapResponseSchema = heightMapSummarySchema.extend({ heightsM: z.array(z.array(z.number())) });
export type HeightMapResponse = z.output<typeof heightMapResponseSchema>;

export const surfaceSolveSchema = z
  .object({
    ball: point("ball"),
    hole: point("hole"),
    stimpFt: num("stimpFt")
      .min(READ_LIMITS.stimpFt.min, `stimpFt must be at least ${READ_LIMITS.stimpFt.min} ft`)
      .max(READ_LIMITS.stimpFt.max, `stimpFt must be at most ${READ_LIMITS.stimpFt.max} ft`),
    pace: paceSchema.default({ rollPastM: DEFAULT_ROLL_PAST_M }),
  })
  .strict();
export type SurfaceSolveRequest = z.infer<typeof surfaceSolveSchema>;

/** POST /api/greens/:id/reads/solve: the read API's shape, `path` in the green's frame, plus the surface's own fields. */
export const surfaceReadResponseSchema = readResponseSchema.extend({
  /** The same line in the putt frame (ball at 0,0, hole at 0,D). */
  puttFramePath: z.array(xy),
  restM: xy,
  distanceM: z.number(),
  /** The plane of the mean slope along the putt: what a planar read would assume. */
  meanPlane: z.object({ slopePct: z.number(), fallLineDeg: z.number() }),
  diagnostics: z.object({ method: z.enum(["surface-newton", "surface-bracketed"]), iterations: z.number(), integrations: z.number() }),
});
export type SurfaceReadResponse = z.output<typeof surfaceReadResponseSchema>;
