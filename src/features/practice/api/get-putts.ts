import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { BreakType, Putt } from "#shared/schemas/putts";
import type { Page } from "#shared/schemas/sessions";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

export type PuttSort = "date" | "-date" | "distance" | "-distance" | "createdAt" | "-createdAt";
export type PuttListParams = {
  page: number;
  pageSize: number;
  sort: PuttSort;
  from?: string;
  to?: string;
  holed?: "true" | "false";
  breakType?: BreakType;
  sessionId?: string;
  minM?: number;
  maxM?: number;
};

/** GET /api/putts: every putt of the player, sorted, filtered and paged by the server. */
export function getPutts(params: PuttListParams, signal?: AbortSignal): Promise<Page<Putt>> {
  return api.get<Page<Putt>>(apiPaths.putts, { query: params, signal });
}

export function puttsQueryOptions(params: PuttListParams) {
  return queryOptions({
    queryKey: practiceKeys.puttList(params),
    queryFn: ({ signal }) => getPutts(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function usePutts(params: PuttListParams) {
  return useQuery(puttsQueryOptions(params));
}
