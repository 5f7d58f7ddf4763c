import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { ReadRequest, ReadResponse } from "#shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api, isApiError } from "../../../lib/api-client";
import { readsKeys } from "./keys";

/**
 * POST /api/reads/solve. A 422 means the ball cannot stop on that slope at that Stimp (an answer, not a fault).
 * Without the server (no signal, a server fault, a rate limit) the browser works the same answer out itself.
 */
export async function solveRead(input: ReadRequest, signal?: AbortSignal): Promise<ReadResponse> {
  try {
    return await api.post<ReadResponse>(apiPaths.readsSolve, input, { signal });
  } catch (error) {
    if (!answerableHere(error)) throw error;
    const { readOffline } = await import("../utils/offline-answers");
    return readOffline(input);
  }
}

/** Failures the browser can answer for the server: the same physics runs here. */
export function answerableHere(error: unknown): boolean {
  return isApiError(error) && (error.status === 0 || error.status === 429 || error.status >= 500);
}

export function solveReadQueryOptions(input: ReadRequest | null) {
  return queryOptions({
    queryKey: readsKeys.solve(input),
    queryFn: ({ signal }) => solveRead(input as ReadRequest, signal),
    enabled: input !== null,
    // The same putt always has the same answer.
    staleTime: Infinity,
    // Keep showing the last answer while the next one is worked out, so the page does not jump.
    placeholderData: keepPreviousData,
    // The page explains a failed read itself (beside the field, or as "would not stop").
    meta: { errorToast: false },
  });
}

export function useSolveRead(input: ReadRequest | null) {
  return useQuery(solveReadQueryOptions(input));
}
