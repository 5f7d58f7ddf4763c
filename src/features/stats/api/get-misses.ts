import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { Misses } from "./types";

type Params = { from?: string; to?: string; bands?: string; playerId?: string };

/** GET /api/stats/misses: per band, misses left/right and short/long, and strokes gained against the tour. */
export function missesQueryOptions(params: Params) {
  return queryOptions({
    queryKey: statsKeys.misses(params),
    queryFn: ({ signal }) => api.get<Misses>(apiPaths.statsMisses, { query: params, signal }),
    staleTime: 0,
    placeholderData: keepPreviousData,
  });
}

export function useMisses(params: Params) {
  return useQuery(missesQueryOptions(params));
}
