import { queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { statsKeys } from "./keys";
import type { Baseline } from "./types";

/** GET /api/stats/baseline: the tour one-putt table and expected putts, with their sources. */
export function getBaseline(signal?: AbortSignal): Promise<Baseline> {
  return api.get<Baseline>(apiPaths.statsBaseline, { signal });
}

export function baselineQueryOptions() {
  return queryOptions({ queryKey: statsKeys.baseline(), queryFn: ({ signal }) => getBaseline(signal), staleTime: Infinity });
}

export function useBaseline() {
  return useQuery(baselineQueryOptions());
}
