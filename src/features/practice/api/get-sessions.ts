import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { Page, SessionItem } from "#shared/schemas/sessions";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

export type SessionSort = "date" | "-date" | "putts" | "-putts" | "makeRate" | "-makeRate";
export type SessionListParams = { page: number; pageSize: number; sort: SessionSort; from?: string; to?: string; greenId?: string };

/** GET /api/sessions: sorted, filtered and paged by the server. */
export function getSessions(params: SessionListParams, signal?: AbortSignal): Promise<Page<SessionItem>> {
  return api.get<Page<SessionItem>>(apiPaths.sessions, { query: params, signal });
}

export function sessionsQueryOptions(params: SessionListParams) {
  return queryOptions({
    queryKey: practiceKeys.sessionList(params),
    queryFn: ({ signal }) => getSessions(params, signal),
    // Keep the rows on screen while the next page or sort loads.
    placeholderData: keepPreviousData,
  });
}

export function useSessions(params: SessionListParams) {
  return useQuery(sessionsQueryOptions(params));
}
