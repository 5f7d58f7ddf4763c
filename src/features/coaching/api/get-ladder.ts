import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Ladder } from "#shared/schemas/ladders";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/ladders/:id: a built-in ladder or one of the coach's own. */
export function getLadder(id: string, signal?: AbortSignal): Promise<Ladder> {
  return api.get<Ladder>(apiPaths.ladder(id), { signal });
}

export function ladderQueryOptions(id: string) {
  return queryOptions({ queryKey: coachingKeys.ladder(id), queryFn: ({ signal }) => getLadder(id, signal), meta: { errorToast: false } });
}

export function useLadder(id: string | undefined) {
  return useQuery({ ...ladderQueryOptions(id ?? ""), enabled: Boolean(id) });
}
