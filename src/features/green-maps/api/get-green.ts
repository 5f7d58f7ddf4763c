import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Green } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

/** GET /api/greens/:id: the green's name and current Stimp (the map's default green speed). */
export function getGreen(greenId: string, signal?: AbortSignal): Promise<Green> {
  return api.get<Green>(apiPaths.green(greenId), { signal });
}

export function greenQueryOptions(greenId: string) {
  return queryOptions({
    queryKey: greenMapsKeys.details(greenId),
    queryFn: ({ signal }) => getGreen(greenId, signal),
    meta: { errorToast: false },
  });
}

export function useGreen(greenId: string) {
  return useQuery(greenQueryOptions(greenId));
}
