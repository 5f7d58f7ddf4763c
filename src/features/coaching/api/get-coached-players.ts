import { queryOptions, useQuery } from "@tanstack/react-query";
import type { CoachedPlayer, CoachedPlayers } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

export type { CoachedPlayer };

/** GET /api/coach/players: every player in the coach's squads with the state of each ladder given. */
export function getCoachedPlayers(signal?: AbortSignal): Promise<CoachedPlayers> {
  return api.get<CoachedPlayers>(apiPaths.coachPlayers, { signal });
}

export function coachedPlayersQueryOptions() {
  return queryOptions({ queryKey: coachingKeys.coachPlayers(), queryFn: ({ signal }) => getCoachedPlayers(signal) });
}

export function useCoachedPlayers() {
  return useQuery(coachedPlayersQueryOptions());
}
