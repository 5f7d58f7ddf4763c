import { queryOptions, useQuery } from "@tanstack/react-query";
import type { CoachedPlayerDetail } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

export type { CoachedPlayerDetail };

/** GET /api/coach/players/:playerId: one player of the coach's squads, read-only, with ladder history. */
export function getCoachedPlayer(playerId: string, signal?: AbortSignal): Promise<CoachedPlayerDetail> {
  return api.get<CoachedPlayerDetail>(apiPaths.coachPlayer(playerId), { signal });
}

export function coachedPlayerQueryOptions(playerId: string) {
  return queryOptions({
    queryKey: coachingKeys.coachPlayer(playerId),
    queryFn: ({ signal }) => getCoachedPlayer(playerId, signal),
    meta: { errorToast: false },
  });
}

export function useCoachedPlayer(playerId: string) {
  return useQuery(coachedPlayerQueryOptions(playerId));
}
