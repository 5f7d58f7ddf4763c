import { queryOptions, useQuery } from "@tanstack/react-query";
import type { HeightMapResponse } from "../../../../shared/schemas/height-map";
import { apiPaths } from "../../../config/paths";
import { api, ApiError } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

/** GET /api/greens/:id/height-map. A green without a map answers null (the API's 404 for the map), not an error. */
export async function getHeightMap(greenId: string, signal?: AbortSignal): Promise<HeightMapResponse | null> {
  try {
    return await api.get<HeightMapResponse>(apiPaths.greenHeightMap(greenId), { signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 404 && /height map/i.test(error.message)) return null;
    throw error;
  }
}

export function heightMapQueryOptions(greenId: string) {
  return queryOptions({
    queryKey: greenMapsKeys.heightMap(greenId),
    queryFn: ({ signal }) => getHeightMap(greenId, signal),
    meta: { errorToast: false },
  });
}

export function useHeightMap(greenId: string) {
  return useQuery(heightMapQueryOptions(greenId));
}
