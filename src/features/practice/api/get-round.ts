import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Round } from "#shared/schemas/rounds";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** GET /api/rounds/:id → the round with each hole valued against the tour baseline, and its totals. */
export function getRound(id: string, signal?: AbortSignal): Promise<Round> {
  return api.get<Round>(apiPaths.round(id), { signal });
}

export function roundQueryOptions(id: string) {
  return queryOptions({ queryKey: practiceKeys.round(id), queryFn: ({ signal }) => getRound(id, signal), meta: { errorToast: false } });
}

export function useRound(id: string) {
  return useQuery(roundQueryOptions(id));
}
