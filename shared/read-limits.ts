// The public read API's limits as plain numbers, in a module without zod: the read form and the slope measurer check
// against them on the page's first load, which must not have to fetch the whole schema set (shared/schemas/reads.ts
// builds its schemas from these).

/** Limits of the public read API (issue-agreed ranges; a flat-green Stimp of 4–16 ft covers real greens). */
export const READ_LIMITS = {
  distanceM: { min: 0.3, max: 30 },
  slopePct: { min: 0, max: 8 },
  fallLineDeg: { min: 0, max: 360 },
  stimpFt: { min: 4, max: 16 },
  rollPastM: { min: 0, max: 3 },
  entrySpeedMps: { min: 0, max: 2.5 },
} as const;
