import { METRES_PER_FOOT, type UnitSystem } from "../units";

/** A distance band: includes fromM, excludes toM; toM null = open-ended (the last band). */
export type Band = { fromM: number; toM: number | null };

/** Largest band edge accepted, m (the longest putt we store is 60 m). */
export const MAX_BAND_EDGE_M = 60;
export const MAX_BAND_EDGES = 20;

/**
 * Default edges by the user's unit preference. Imperial: 0–3, 3–6, 6–10, 10–15, 15–20, 20–30, 30+ ft;
 * metric: 0–1, 1–2, 2–3, 3–5, 5–7, 7–10, 10+ m.
 */
export const DEFAULT_BAND_EDGES_M: Record<UnitSystem, number[]> = {
  imperial: [3, 6, 10, 15, 20, 30].map((ft) => ft * METRES_PER_FOOT),
  metric: [1, 2, 3, 5, 7, 10],
};

/**
 * Edges → bands. The edges are the inner boundaries: the first band starts at 0 (a leading 0 in the
 * list is allowed and changes nothing) and the last band is open-ended, so every putt falls in exactly
 * one band. Each band includes its lower edge and excludes its upper edge.
 * @example bandsFromEdges([1, 2]) // [{0,1}, {1,2}, {2,null}]
 */
export function bandsFromEdges(edgesM: readonly number[]): Band[] {
  const edges = normaliseEdges(edgesM);
  const bounds = [0, ...edges];
  return bounds.map((fromM, i) => ({ fromM, toM: bounds[i + 1] ?? null }));
}

/** Drops a leading 0 and checks the edges are finite, positive and strictly increasing. */
export function normaliseEdges(edgesM: readonly number[]): number[] {
  const edges = edgesM[0] === 0 ? edgesM.slice(1) : [...edgesM];
  edges.forEach((e, i) => {
    if (!Number.isFinite(e) || e <= 0) throw new RangeError(`band edge ${e} must be a positive number`);
    if (i > 0 && e <= edges[i - 1]!) throw new RangeError("band edges must be strictly increasing");
  });
  return edges;
}

/**
 * The band a distance falls in, 0-based, with the semantics of PostgreSQL's width_bucket over
 * [0, ...edges] (minus one): lower edge included, upper edge excluded.
 */
export function bandIndex(distanceM: number, edgesM: readonly number[]): number {
  const edges = normaliseEdges(edgesM);
  let i = 0;
  while (i < edges.length && distanceM >= edges[i]!) i++;
  return i;
}
