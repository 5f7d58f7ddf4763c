import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { Trend } from "./types";
import type { TrendParams } from "./types";
/** GET /api/stats/trend: per band per ISO week (or a rolling window of weeks). */
export function getTrend(params: TrendParams, signal?: AbortSignal): Promise<Trend> {
  return api.get<Trend>(apiPaths.statsTrend, { query: params, signal });
}

export function trendQueryOptions(params: TrendParams) {
  return queryOptions({
    queryKey: statsKeys.trend(params),
    queryFn: ({ signal }) => getTrend(params, signal),
    // Cheap to ask again, and a putt logged a moment ago must show: always refetch on mount, keep the old answer meanwhile.
    staleTime: 0,
    placeholderData: keepPreviousData,
  });
}

export function useTrend(params: TrendParams) {
  return useQuery(trendQueryOptions(params));
}
