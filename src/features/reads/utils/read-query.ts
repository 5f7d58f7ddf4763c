// The read in the URL query, always in SI so a link means the same putt whatever units its reader uses:
//   /read?d=3.048&s=2&f=90&st=10&rp=0.4318    (distance m, slope %, fall line °, Stimp ft, roll-past m)
//   /read?d=3&s=2&f=90&st=10&es=0.8           (entry speed m/s instead of roll-past)
import { readRequestSchema, type ReadRequest } from "../../../../shared/schemas/reads";
import { feetToMetres, inchesToMetres, type UnitSystem } from "../../../../shared/units";

export type PaceMode = "rollPast" | "entrySpeed";

/** A read as numbers in SI, possibly out of range (the form says so); the pace mode decides which speed counts. */
export type ReadValues = {
  distanceM: number;
  slopePct: number;
  fallLineDeg: number;
  stimpFt: number;
  paceMode: PaceMode;
  rollPastM: number;
  entrySpeedMps: number;
};

const KEYS = { distanceM: "d", slopePct: "s", fallLineDeg: "f", stimpFt: "st", rollPastM: "rp", entrySpeedMps: "es" } as const;

/** Defaults a golfer would recognise: 10 ft (3 m), 2 %, falls to the right, Stimp 10, 17 in (45 cm) past. */
export function defaultReadValues(units: UnitSystem): ReadValues {
  return {
    distanceM: units === "imperial" ? feetToMetres(10) : 3,
    slopePct: 2,
    fallLineDeg: 90,
    stimpFt: 10,
    paceMode: "rollPast",
    rollPastM: units === "imperial" ? inchesToMetres(17) : 0.45,
    entrySpeedMps: 0.8,
  };
}

/** Six significant decimals are far below anything a golfer can judge, and keep links short. */
function short(n: number): string {
  return String(Number(n.toFixed(6)));
}

function num(params: URLSearchParams, key: string): number | undefined {
  const raw = params.get(key);
  if (raw === null || raw.trim() === "") return undefined;
  const n = Number(raw);
  return Number.isFinite(n) ? n : undefined;
}

/** True when the query names every part of a read (distance, slope, fall line, Stimp and a pace). */
export function isCompleteReadQuery(params: URLSearchParams): boolean {
  const hasPace = num(params, KEYS.rollPastM) !== undefined || num(params, KEYS.entrySpeedMps) !== undefined;
  return hasPace && (["distanceM", "slopePct", "fallLineDeg", "stimpFt"] as const).every((k) => num(params, KEYS[k]) !== undefined);
}

/** URL query → values; anything missing or not a number takes the default for these units. */
export function decodeReadQuery(params: URLSearchParams, units: UnitSystem): ReadValues {
  const base = defaultReadValues(units);
  const es = num(params, KEYS.entrySpeedMps);
  const rp = num(params, KEYS.rollPastM);
  return {
    distanceM: num(params, KEYS.distanceM) ?? base.distanceM,
    slopePct: num(params, KEYS.slopePct) ?? base.slopePct,
    fallLineDeg: num(params, KEYS.fallLineDeg) ?? base.fallLineDeg,
    stimpFt: num(params, KEYS.stimpFt) ?? base.stimpFt,
    // Entry speed only when the link asks for it and names no roll-past.
    paceMode: es !== undefined && rp === undefined ? "entrySpeed" : "rollPast",
    rollPastM: rp ?? base.rollPastM,
    entrySpeedMps: es ?? base.entrySpeedMps,
  };
}

/** Values → URL query (without "?"), keys in a fixed order so equal reads give equal links. */
export function encodeReadQuery(v: ReadValues): string {
  const params = new URLSearchParams();
  params.set(KEYS.distanceM, short(v.distanceM));
  params.set(KEYS.slopePct, short(v.slopePct));
  params.set(KEYS.fallLineDeg, short(v.fallLineDeg));
  params.set(KEYS.stimpFt, short(v.stimpFt));
  if (v.paceMode === "entrySpeed") params.set(KEYS.entrySpeedMps, short(v.entrySpeedMps));
  else params.set(KEYS.rollPastM, short(v.rollPastM));
  return params.toString();
}

/** The API request for these values, or null when a value is out of the API's limits. */
export function toReadRequest(v: ReadValues): ReadRequest | null {
  const parsed = readRequestSchema.safeParse({
    distanceM: v.distanceM,
    slopePct: v.slopePct,
    fallLineDeg: v.fallLineDeg,
    stimpFt: v.stimpFt,
    pace: v.paceMode === "entrySpeed" ? { entrySpeedMps: v.entrySpeedMps } : { rollPastM: v.rollPastM },
  });
  return parsed.success ? parsed.data : null;
}

/** A saved read's request back to values (for "open": a saved read becomes a link). */
export function fromReadRequest(r: ReadRequest, units: UnitSystem): ReadValues {
  const base = defaultReadValues(units);
  const entry = "entrySpeedMps" in r.pace;
  return {
    distanceM: r.distanceM,
    slopePct: r.slopePct,
    fallLineDeg: r.fallLineDeg,
    stimpFt: r.stimpFt,
    paceMode: entry ? "entrySpeed" : "rollPast",
    rollPastM: "rollPastM" in r.pace ? r.pace.rollPastM : base.rollPastM,
    entrySpeedMps: "entrySpeedMps" in r.pace ? r.pace.entrySpeedMps : base.entrySpeedMps,
  };
}
