import { queryOptions, useQuery } from "@tanstack/react-query";
import type { GreenSummary } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** GET /api/greens → the player's own greens by name, each with its latest Stimp. */
export function getGreens(signal?: AbortSignal): Promise<{ items: GreenSummary[] }> {
  return api.get<{ items: GreenSummary[] }>(apiPaths.greens, { signal });
}

export function greensQueryOptions() {
  return queryOptions({ queryKey: practiceKeys.greens(), queryFn: ({ signal }) => getGreens(signal) });
}

export function useGreens() {
  return useQuery(greensQueryOptions());
}
