import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DispersionResponse } from "#shared/schemas/make-probability";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { makeProbabilityKeys } from "./keys";

/** GET /api/players/me/dispersion: my start-line and pace spread with their 95 % intervals, from my logged putts. */
export function getMyDispersion(signal?: AbortSignal): Promise<DispersionResponse> {
  return api.get<DispersionResponse>(apiPaths.myDispersion, { signal });
}

export function myDispersionQueryOptions(enabled = true) {
  return queryOptions({
    queryKey: makeProbabilityKeys.dispersion(),
    queryFn: ({ signal }) => getMyDispersion(signal),
    enabled,
    staleTime: 5 * 60_000,
    meta: { errorToast: false },
  });
}

export function useMyDispersion(enabled = true) {
  return useQuery(myDispersionQueryOptions(enabled));
}
