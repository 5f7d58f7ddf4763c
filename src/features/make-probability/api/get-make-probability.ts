import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { MakeProbabilityRequest, MakeProbabilityResponse } from "#shared/schemas/make-probability";
import type { ReadRequest } from "#shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { makeProbabilityKeys } from "./keys";

/** One seed for every read: the same read then always gets the same answer, and moving the pace compares like with like. */
export const ODDS_SEED = 20_240_801;

/** POST /api/reads/make-probability with the signed-in player's own dispersion (no `dispersion` in the body). */
export function getMakeProbability(input: Pick<MakeProbabilityRequest, "read"> & Partial<MakeProbabilityRequest>, signal?: AbortSignal) {
  return api.post<MakeProbabilityResponse>(apiPaths.readsMakeProbability, input, { signal });
}

export function makeProbabilityQueryOptions(read: ReadRequest | null) {
  return queryOptions({
    queryKey: makeProbabilityKeys.odds(read, ODDS_SEED),
    queryFn: ({ signal }) => getMakeProbability({ read: read as ReadRequest, seed: ODDS_SEED }, signal),
    enabled: read !== null,
    // The answer for a read changes only when the player logs more putts.
    staleTime: 5 * 60_000,
    placeholderData: keepPreviousData,
    // The panel explains a failure itself (a ball that would not stop is an answer, not a fault).
    meta: { errorToast: false },
  });
}

export function useMakeProbability(read: ReadRequest | null) {
  return useQuery(makeProbabilityQueryOptions(read));
}
