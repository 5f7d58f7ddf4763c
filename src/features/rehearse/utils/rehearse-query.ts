// The putt to rehearse, from the URL query in SI — the same keys as /read, so a read links here unchanged:
//   /rehearse?d=3&s=2&f=90&st=10&rp=0.45   (distance m, slope %, fall line °, Stimp ft, roll-past m)
import { READ_LIMITS } from "../../../../shared/schemas/reads";

export type RehearsePutt = { distanceM: number; slopePct: number; fallLineDeg: number; stimpFt: number; rollPastM: number };

export const REHEARSE_DEFAULTS: RehearsePutt = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, rollPastM: 0.45 };
/** The pace control runs from dying (0) to firm (1.5 m past). */
export const ROLL_PAST_RANGE_M = { min: 0, max: 1.5 } as const;

const KEYS = { distanceM: "d", slopePct: "s", fallLineDeg: "f", stimpFt: "st", rollPastM: "rp" } as const;
const LIMITS: Record<keyof RehearsePutt, { min: number; max: number }> = {
  distanceM: READ_LIMITS.distanceM,
  slopePct: READ_LIMITS.slopePct,
  fallLineDeg: READ_LIMITS.fallLineDeg,
  stimpFt: READ_LIMITS.stimpFt,
  rollPastM: ROLL_PAST_RANGE_M,
};

/** Query → putt. Missing values take the defaults; values that are not numbers or out of range too, and are named. */
export function decodeRehearseQuery(params: URLSearchParams): { putt: RehearsePutt; replaced: (keyof RehearsePutt)[] } {
  const putt = { ...REHEARSE_DEFAULTS };
  const replaced: (keyof RehearsePutt)[] = [];
  for (const key of Object.keys(KEYS) as (keyof RehearsePutt)[]) {
    const raw = params.get(KEYS[key]);
    if (raw === null || raw.trim() === "") continue;
    const n = Number(raw);
    const { min, max } = LIMITS[key];
    if (Number.isFinite(n) && n >= min && n <= max) putt[key] = key === "fallLineDeg" ? n % 360 : n;
    else replaced.push(key);
  }
  return { putt, replaced };
}

/** Putt → query (without "?"), fixed key order, six decimals at most. */
export function encodeRehearseQuery(p: RehearsePutt): string {
  const q = new URLSearchParams();
  for (const key of Object.keys(KEYS) as (keyof RehearsePutt)[]) q.set(KEYS[key], String(Number(p[key].toFixed(6))));
  return q.toString();
}
