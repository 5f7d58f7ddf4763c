import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { SurfaceReadResponse, SurfaceSolveRequest } from "#shared/schemas/height-map";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

/** POST /api/greens/:id/reads/solve: the read API's shape plus the surface's own fields (shared/schemas/height-map.ts). */
export type { SurfaceReadResponse };

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
