import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Assignment } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/assignments: the signed-in player's ladders, newest first. */
export function getMyAssignments(signal?: AbortSignal): Promise<{ assignments: Assignment[] }> {
  return api.get<{ assignments: Assignment[] }>(apiPaths.assignments, { signal });
}

export function myAssignmentsQueryOptions() {
  return queryOptions({ queryKey: [...coachingKeys.assignments(), "mine"] as const, queryFn: ({ signal }) => getMyAssignments(signal) });
}

export function useMyAssignments() {
  return useQuery(myAssignmentsQueryOptions());
}
