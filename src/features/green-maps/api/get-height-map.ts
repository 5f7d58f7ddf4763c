import { queryOptions, useQuery } from "@tanstack/react-query";
import type { HeightMapResponse } from "#shared/schemas/height-map";
import { apiPaths } from "../../../config/paths";
import { api, ApiError } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

/**
 * GET /api/greens/:id/height-map. Asked only for a green whose answer says `hasHeightMap` (useHeightMap), so a green
 * without a map costs no request and no 404; a map deleted meanwhile still answers null (the API's 404), not an error.
 */
export async function getHeightMap(greenId: string, signal?: AbortSignal): Promise<HeightMapResponse | null> {
  try {
    return await api.get<HeightMapResponse>(apiPaths.greenHeightMap(greenId), { signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 404 && /height map/i.test(error.message)) return null;
    throw error;
  }
}

export function heightMapQueryOptions(greenId: string, hasHeightMap: boolean) {
  return queryOptions({
    queryKey: greenMapsKeys.heightMap(greenId),
    queryFn: ({ signal }) => getHeightMap(greenId, signal),
    enabled: hasHeightMap,
    meta: { errorToast: false },
  });
}

/** The green's map once its answer says it has one (`hasHeightMap` from GET /api/greens/:id); idle before. */
export function useHeightMap(greenId: string, hasHeightMap: boolean) {
  return useQuery(heightMapQueryOptions(greenId, hasHeightMap));
}
