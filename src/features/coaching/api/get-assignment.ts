import { queryOptions, useQuery } from "@tanstack/react-query";
import type { AssignmentDetail } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/assignments/:id: the assignment with its ladder copy, its putts and the replayed progress. */
export function getAssignment(id: string, signal?: AbortSignal): Promise<AssignmentDetail> {
  return api.get<AssignmentDetail>(apiPaths.assignment(id), { signal });
}

export function assignmentQueryOptions(id: string) {
  return queryOptions({
    queryKey: coachingKeys.assignment(id),
    queryFn: ({ signal }) => getAssignment(id, signal),
    meta: { errorToast: false },
    // While putts are being played the page owns this entry; a background refetch could show an older state.
    refetchOnWindowFocus: false,
  });
}

export function useAssignment(id: string) {
  return useQuery(assignmentQueryOptions(id));
}
