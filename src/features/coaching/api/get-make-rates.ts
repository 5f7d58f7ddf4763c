import { queryOptions, useQueries, useQuery } from "@tanstack/react-query";
import type { MakeRates } from "#shared/schemas/stats";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/stats/make-rates?playerId=: a player's make rate by distance band (the coach of their squad may ask). */
export function getMakeRates(playerId: string, signal?: AbortSignal): Promise<MakeRates> {
  return api.get<MakeRates>(apiPaths.statsMakeRates, { query: { playerId }, signal });
}

export function makeRatesQueryOptions(playerId: string) {
  return queryOptions({
    queryKey: coachingKeys.makeRates(playerId),
    queryFn: ({ signal }) => getMakeRates(playerId, signal),
    // The chart panel says what went wrong in place.
    meta: { errorToast: false },
  });
}

export function useMakeRates(playerId: string) {
  return useQuery(makeRatesQueryOptions(playerId));
}

/** The make rates of several players at once (the squad chart). */
export function useSquadMakeRates(playerIds: readonly string[]) {
  return useQueries({ queries: playerIds.map((id) => makeRatesQueryOptions(id)) });
}
