import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { Compare } from "./types";
import type { CompareParams } from "./types";
/** GET /api/stats/compare: two periods per band with a two-proportion z-test. */
export function getCompare(params: CompareParams, signal?: AbortSignal): Promise<Compare> {
  return api.get<Compare>(apiPaths.statsCompare, { query: params, signal });
}

export function compareQueryOptions(params: CompareParams) {
  return queryOptions({
    queryKey: statsKeys.compare(params),
    queryFn: ({ signal }) => getCompare(params, signal),
    // Cheap to ask again, and a putt logged a moment ago must show: always refetch on mount, keep the old answer meanwhile.
    staleTime: 0,
    placeholderData: keepPreviousData,
  });
}

export function useCompare(params: CompareParams) {
  return useQuery(compareQueryOptions(params));
}
