import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { PlayerRange, RoundList } from "./types";

/** GET /api/rounds (newest first, up to 100): each round's putts against the tour's expected putts. */
export function roundsQueryOptions(params: PlayerRange) {
  return queryOptions({
    queryKey: statsKeys.rounds(params),
    queryFn: ({ signal }) => api.get<RoundList>(apiPaths.rounds, { query: { ...params, pageSize: 100 }, signal }),
    staleTime: 0,
    placeholderData: keepPreviousData,
  });
}

export function useRounds(params: PlayerRange) {
  return useQuery(roundsQueryOptions(params));
}
