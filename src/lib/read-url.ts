// The one URL codec for a read (issue 14): /read, /rehearse, /chart (and any page that links to them) write and
// read the same query, always in SI, so a link means the same putt whatever units its reader uses:
//   ?d=3.048&s=2&f=90&st=10&rp=0.4318   distance m, slope %, fall line °, Stimp ft, roll-past m
//   ?d=3&s=2&f=90&st=10&es=0.8           entry speed m/s instead of roll-past
// Numbers go through shared/units.ts parseDecimal (never Number(), which reads "0x1A" as 26).
// Only types from the schemas: this module is on /read's first load, which must not wait for zod's full API. The
// range check below is the API schema's (shared/schemas/reads.ts, built from the same READ_LIMITS); a property test
// holds the two to the same verdict.
import { READ_LIMITS } from "../../shared/read-limits";
import type { ReadRequest } from "../../shared/schemas/reads";
import { feetToMetres, inchesToMetres, parseDecimal, type UnitSystem } from "../../shared/units";

export type PaceMode = "rollPast" | "entrySpeed";

/** A read as numbers in SI, possibly out of range (a form says so); the pace mode decides which speed counts. */
export type ReadValues = {
  distanceM: number;
  slopePct: number;
  fallLineDeg: number;
  stimpFt: number;
  paceMode: PaceMode;
  rollPastM: number;
  entrySpeedMps: number;
};

export type ReadKey = Exclude<keyof ReadValues, "paceMode">;

export const READ_URL_KEYS: Record<ReadKey, string> = {
  distanceM: "d",
  slopePct: "s",
  fallLineDeg: "f",
  stimpFt: "st",
  rollPastM: "rp",
  entrySpeedMps: "es",
};
const ORDER: ReadKey[] = ["distanceM", "slopePct", "fallLineDeg", "stimpFt"];

/** Six decimals are far below anything a golfer can judge, and keep links short. */
function short(n: number): string {
  return String(Number.parseFloat(n.toFixed(6)));
}

/**
 * The one set of defaults, a putt a golfer would recognise: 10 ft (3 m), 2 %, falls right, Stimp 10, 17 in (45 cm)
 * past — each exactly as a link carries it (17 in is 0.4318 m, not 0.43179999999999996), so the read a bare /read
 * shows is the read of the link the page then writes into its address: one answer, asked for once.
 */
export function defaultReadValues(units: UnitSystem): ReadValues {
  const asLinked = (n: number) => Number(short(n));
  return {
    distanceM: asLinked(units === "imperial" ? feetToMetres(10) : 3),
    slopePct: 2,
    fallLineDeg: 90,
    stimpFt: 10,
    paceMode: "rollPast",
    rollPastM: asLinked(units === "imperial" ? inchesToMetres(17) : 0.45),
    entrySpeedMps: 0.8,
  };
}

function num(params: URLSearchParams, key: ReadKey): number | undefined {
  return parseDecimal(params.get(READ_URL_KEYS[key])) ?? undefined;
}

/** True when the query names every part of a read (distance, slope, fall line, Stimp and a pace). */
export function isCompleteReadQuery(params: URLSearchParams): boolean {
  const hasPace = num(params, "rollPastM") !== undefined || num(params, "entrySpeedMps") !== undefined;
  return hasPace && ORDER.every((k) => num(params, k) !== undefined);
}

/** URL query → values; anything missing or not a number takes the default for these units. */
export function decodeReadQuery(params: URLSearchParams, units: UnitSystem): ReadValues {
  const base = defaultReadValues(units);
  const es = num(params, "entrySpeedMps");
  const rp = num(params, "rollPastM");
  return {
    distanceM: num(params, "distanceM") ?? base.distanceM,
    slopePct: num(params, "slopePct") ?? base.slopePct,
    fallLineDeg: num(params, "fallLineDeg") ?? base.fallLineDeg,
    stimpFt: num(params, "stimpFt") ?? base.stimpFt,
    // Entry speed only when the link asks for it and names no roll-past.
    paceMode: es !== undefined && rp === undefined ? "entrySpeed" : "rollPast",
    rollPastM: rp ?? base.rollPastM,
    entrySpeedMps: es ?? base.entrySpeedMps,
  };
}

/** Inside the API's limits (NaN is not). */
const within = (key: ReadKey, value: number) => value >= READ_LIMITS[key].min && value <= READ_LIMITS[key].max;

/**
 * For pages that cannot show an out-of-range value in a form (rehearse, the chart): values that are not numbers
 * or lie outside the API's limits take the default and are named in `replaced`.
 */
export function decodeReadQueryChecked(params: URLSearchParams, units: UnitSystem): { values: ReadValues; replaced: ReadKey[] } {
  const base = defaultReadValues(units);
  const values = decodeReadQuery(params, units);
  const replaced: ReadKey[] = [];
  for (const key of Object.keys(READ_URL_KEYS) as ReadKey[]) {
    const raw = params.get(READ_URL_KEYS[key]);
    if (raw === null || raw.trim() === "") continue;
    const n = parseDecimal(raw);
    if (n === null || !within(key, n)) {
      values[key] = base[key];
      replaced.push(key);
    }
  }
  values.fallLineDeg %= 360;
  return { values, replaced };
}

/** Values → URL query (without "?"), keys in a fixed order so equal reads give equal links. */
export function encodeReadQuery(v: ReadValues): string {
  const params = new URLSearchParams();
  for (const key of ORDER) params.set(READ_URL_KEYS[key], short(v[key]));
  if (v.paceMode === "entrySpeed") params.set(READ_URL_KEYS.entrySpeedMps, short(v.entrySpeedMps));
  else params.set(READ_URL_KEYS.rollPastM, short(v.rollPastM));
  return params.toString();
}

/** The API request for these values, or null when a value is out of the API's limits. */
export function toReadRequest(v: ReadValues): ReadRequest | null {
  const paceKey = v.paceMode === "entrySpeed" ? "entrySpeedMps" : "rollPastM";
  const keys: ReadKey[] = ["distanceM", "slopePct", "fallLineDeg", "stimpFt", paceKey];
  if (!keys.every((key) => within(key, v[key]))) return null;
  return {
    distanceM: v.distanceM,
    slopePct: v.slopePct,
    fallLineDeg: v.fallLineDeg,
    stimpFt: v.stimpFt,
    pace: v.paceMode === "entrySpeed" ? { entrySpeedMps: v.entrySpeedMps } : { rollPastM: v.rollPastM },
  };
}

/** A saved read's request back to values (for "open": a saved read becomes a link). */
export function fromReadRequest(r: ReadRequest, units: UnitSystem): ReadValues {
  const base = defaultReadValues(units);
  return {
    distanceM: r.distanceM,
    slopePct: r.slopePct,
    fallLineDeg: r.fallLineDeg,
    stimpFt: r.stimpFt,
    paceMode: "entrySpeedMps" in r.pace ? "entrySpeed" : "rollPast",
    rollPastM: "rollPastM" in r.pace ? r.pace.rollPastM : base.rollPastM,
    entrySpeedMps: "entrySpeedMps" in r.pace ? r.pace.entrySpeedMps : base.entrySpeedMps,
  };
}
