import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { MakeRates } from "./types";
import type { StatsParams } from "./types";
/** GET /api/stats/make-rates: attempts, makes, rate and the Wilson 95 % interval per distance band. */
export function getMakeRates(params: StatsParams, signal?: AbortSignal): Promise<MakeRates> {
  return api.get<MakeRates>(apiPaths.statsMakeRates, { query: params, signal });
}

export function makeRatesQueryOptions(params: StatsParams) {
  return queryOptions({
    queryKey: statsKeys.makeRates(params),
    queryFn: ({ signal }) => getMakeRates(params, signal),
    // Cheap to ask again, and a putt logged a moment ago must show: always refetch on mount, keep the old answer meanwhile.
    staleTime: 0,
    placeholderData: keepPreviousData,
  });
}

export function useMakeRates(params: StatsParams) {
  return useQuery(makeRatesQueryOptions(params));
}
