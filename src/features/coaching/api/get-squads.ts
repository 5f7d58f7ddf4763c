import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Squad, SquadMembership } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/squads: a coach gets the squads they run (with members); a player the squads they belong to. */
export function getSquads<T extends Squad | SquadMembership>(signal?: AbortSignal): Promise<{ squads: T[] }> {
  return api.get<{ squads: T[] }>(apiPaths.squads, { signal });
}

export function coachSquadsQueryOptions() {
  return queryOptions({ queryKey: [...coachingKeys.squads(), "coach"] as const, queryFn: ({ signal }) => getSquads<Squad>(signal) });
}

export function mySquadsQueryOptions() {
  return queryOptions({
    queryKey: [...coachingKeys.squads(), "member"] as const,
    queryFn: ({ signal }) => getSquads<SquadMembership>(signal),
  });
}

/** The squads a coach runs. */
export function useCoachSquads(enabled = true) {
  return useQuery({ ...coachSquadsQueryOptions(), enabled });
}

/** The squads a player belongs to. */
export function useMySquads(enabled = true) {
  return useQuery({ ...mySquadsQueryOptions(), enabled });
}
