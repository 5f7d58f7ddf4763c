import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Ladder } from "#shared/schemas/ladders";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/ladders: the coach's own (newest first), then Borrowline's built-in ladders (builtIn: true). */
export function getLadders(signal?: AbortSignal): Promise<{ ladders: Ladder[] }> {
  return api.get<{ ladders: Ladder[] }>(apiPaths.ladders, { signal });
}

export function laddersQueryOptions() {
  return queryOptions({ queryKey: coachingKeys.ladders(), queryFn: ({ signal }) => getLadders(signal) });
}

export function useLadders() {
  return useQuery(laddersQueryOptions());
}
