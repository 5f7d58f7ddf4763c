import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Squad } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/squads/:id (the coach's own squad; another coach's is a 404). */
export function getSquad(id: string, signal?: AbortSignal): Promise<Squad> {
  return api.get<Squad>(apiPaths.squad(id), { signal });
}

export function squadQueryOptions(id: string) {
  return queryOptions({ queryKey: coachingKeys.squad(id), queryFn: ({ signal }) => getSquad(id, signal), meta: { errorToast: false } });
}

export function useSquad(id: string) {
  return useQuery(squadQueryOptions(id));
}
