import { queryOptions, useQuery } from "@tanstack/react-query";
import type { AttemptList } from "#shared/schemas/training";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { trainingKeys } from "./keys";

/** GET /api/training/attempts?limit= — the signed-in player's attempts, newest first. */
export function getAttempts(limit: number, signal?: AbortSignal): Promise<AttemptList> {
  return api.get<AttemptList>(apiPaths.trainingAttempts, { query: { limit }, signal });
}

export function attemptsQueryOptions(limit = 200) {
  return queryOptions({ queryKey: trainingKeys.attempts(limit), queryFn: ({ signal }) => getAttempts(limit, signal) });
}

export function useAttempts(enabled: boolean, limit = 200) {
  return useQuery({ ...attemptsQueryOptions(limit), enabled });
}
