import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { SurfaceSolveRequest } from "../../../../shared/schemas/height-map";
import type { ReadResponse } from "../../../../shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

/** POST /api/greens/:id/reads/solve answers the read API's shape plus the surface's own fields. */
export type SurfaceReadResponse = ReadResponse & {
  /** The line in the green's frame (x east, y north, m), ball to rest. */
  path: [number, number][];
  /** The same line in the putt frame (ball at 0,0, hole at 0,D). */
  puttFramePath: [number, number][];
  restM: [number, number];
  distanceM: number;
  /** The plane of the mean slope along the putt: what a planar read would assume. */
  meanPlane: { slopePct: number; fallLineDeg: number };
};

export function solveOnSurface(greenId: string, input: SurfaceSolveRequest, signal?: AbortSignal): Promise<SurfaceReadResponse> {
  return api.post<SurfaceReadResponse>(apiPaths.greenSurfaceSolve(greenId), input, { signal });
}

export function surfaceReadQueryOptions(greenId: string, input: SurfaceSolveRequest | null) {
  return queryOptions({
    queryKey: greenMapsKeys.solve(greenId, input),
    queryFn: ({ signal }) => solveOnSurface(greenId, input as SurfaceSolveRequest, signal),
    enabled: input !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
    // The page explains a refused read beside the map.
    meta: { errorToast: false },
  });
}

export function useSurfaceRead(greenId: string, input: SurfaceSolveRequest | null) {
  return useQuery(surfaceReadQueryOptions(greenId, input));
}
