import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { RoundSummary } from "#shared/schemas/rounds";
import type { Page } from "#shared/schemas/sessions";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

export const ROUNDS_PAGE_SIZE = 20;

/** GET /api/rounds → the player's rounds, newest first, with their totals. */
export function getRounds(page: number, signal?: AbortSignal): Promise<Page<RoundSummary>> {
  return api.get<Page<RoundSummary>>(apiPaths.rounds, { query: { page, pageSize: ROUNDS_PAGE_SIZE }, signal });
}

export function roundsQueryOptions(page: number) {
  return queryOptions({
    queryKey: practiceKeys.roundList(page),
    queryFn: ({ signal }) => getRounds(page, signal),
    placeholderData: keepPreviousData,
  });
}

export function useRounds(page: number) {
  return useQuery(roundsQueryOptions(page));
}
