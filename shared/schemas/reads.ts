import { z } from "zod";
import { DEFAULT_ROLL_PAST_M } from "../../physics/constants";
import { plainText } from "./text";

/** Limits of the public read API (issue-agreed ranges; a flat-green Stimp of 4–16 ft covers real greens). */
export const READ_LIMITS = {
  distanceM: { min: 0.3, max: 30 },
  slopePct: { min: 0, max: 8 },
  fallLineDeg: { min: 0, max: 360 },
  stimpFt: { min: 4, max: 16 },
  rollPastM: { min: 0, max: 3 },
  entrySpeedMps: { min: 0, max: 2.5 },
} as const;

const within = (name: keyof typeof READ_LIMITS, unit: string) => {
  const { min, max } = READ_LIMITS[name];
  return z
    .number({ message: `${name} must be a number` })
    .finite()
    .min(min, `${name} must be at least ${min} ${unit}`)
    .max(max, `${name} must be at most ${max} ${unit}`);
};

/** Default pace: about 17 in (0.45 m) past the hole if it missed — common practice (physics/constants.ts, the one source). */
export { DEFAULT_ROLL_PAST_M };

export const paceSchema = z.union([
  z.object({ rollPastM: within("rollPastM", "m") }).strict(),
  z.object({ entrySpeedMps: within("entrySpeedMps", "m/s") }).strict(),
]);
export type Pace = z.infer<typeof paceSchema>;

export const readRequestSchema = z
  .object({
    distanceM: within("distanceM", "m"),
    slopePct: within("slopePct", "%"),
    fallLineDeg: within("fallLineDeg", "°"),
    stimpFt: within("stimpFt", "ft"),
    pace: paceSchema.default({ rollPastM: DEFAULT_ROLL_PAST_M }),
  })
  .strict();
export type ReadRequest = z.infer<typeof readRequestSchema>;

export const BREAK_DIRECTIONS = ["left-to-right", "right-to-left", "none"] as const;

export type ReadResponse = {
  launchSpeedMps: number;
  startLineDeg: number;
  /** D·tan(start line), m (+ = right); null when the start line is wider than 60° (`aimGiven: "start-line"`). */
  aimOffsetM: number | null;
  /** "offset": the aim is given beside the hole; "start-line": only the start line, with `aimNote` in words. */
  aimGiven: "offset" | "start-line";
  aimNote: string | null;
  entrySpeedMps: number;
  rollPastM: number;
  /** Length of a flat putt (same Stimp) needing the same launch speed with the same roll-past, m. */
  flatPuttLengthM: number;
  breaks: (typeof BREAK_DIRECTIONS)[number];
  capture: { holed: boolean; outcome: "holed" | "lip-out" | "miss"; maxCaptureSpeedMps: number; marginMps: number };
  path: [number, number][];
  model: { name: string; v0Mps: number; rollingDecelMps2: number; gravityDecelMps2: number; maxStoppableSlopePct: number };
};

export const saveReadSchema = z
  .object({
    read: readRequestSchema,
    greenId: z.string().uuid().optional(),
    label: plainText(80).optional(),
  })
  .strict();
export type SaveReadInput = z.infer<typeof saveReadSchema>;

export const MAX_CHART_CELLS = 400;

export const chartRequestSchema = z
  .object({
    slopePct: within("slopePct", "%"),
    stimpFt: within("stimpFt", "ft"),
    pace: paceSchema.default({ rollPastM: DEFAULT_ROLL_PAST_M }),
    distances: z.array(within("distanceM", "m")).min(1).max(60),
    fallLineDegs: z.array(within("fallLineDeg", "°")).min(1).max(72),
  })
  .strict()
  .superRefine((v, ctx) => {
    const cells = v.distances.length * v.fallLineDegs.length;
    if (cells > MAX_CHART_CELLS) {
      ctx.addIssue({ code: "custom", path: ["distances"], message: `At most ${MAX_CHART_CELLS} cells (distances × fallLineDegs); asked for ${cells}` });
    }
  });
export type ChartRequest = z.infer<typeof chartRequestSchema>;
