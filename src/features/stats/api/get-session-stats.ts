import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { SessionStats } from "./types";

/** GET /api/stats/sessions: expected putts, strokes gained and long-lag share per session, newest first. */
export function getSessionStats(
  params: { from?: string; to?: string; pageSize?: number; playerId?: string },
  signal?: AbortSignal,
): Promise<SessionStats> {
  return api.get<SessionStats>(apiPaths.statsSessions, { query: params, signal });
}

export function sessionStatsQueryOptions(params: { from?: string; to?: string; pageSize?: number; playerId?: string }) {
  return queryOptions({
    queryKey: statsKeys.sessions(params),
    queryFn: ({ signal }) => getSessionStats(params, signal),
    // Cheap to ask again, and a putt logged a moment ago must show: always refetch on mount, keep the old answer meanwhile.
    staleTime: 0,
    placeholderData: keepPreviousData,
  });
}

export function useSessionStats(params: { from?: string; to?: string; pageSize?: number; playerId?: string }) {
  return useQuery(sessionStatsQueryOptions(params));
}
