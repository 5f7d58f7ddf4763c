import { queryOptions, useQuery } from "@tanstack/react-query";
import type { AssignmentSummary } from "../../../../shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

export type CoachedPlayer = {
  id: string;
  name: string;
  email: string;
  squads: { id: string; name: string }[];
  /** The ladders this coach gave the player, newest first. */
  assignments: AssignmentSummary[];
};

/** GET /api/coach/players: every player in the coach's squads with the state of each ladder given. */
export function getCoachedPlayers(signal?: AbortSignal): Promise<{ players: CoachedPlayer[] }> {
  return api.get<{ players: CoachedPlayer[] }>(apiPaths.coachPlayers, { signal });
}

export function coachedPlayersQueryOptions() {
  return queryOptions({ queryKey: coachingKeys.coachPlayers(), queryFn: ({ signal }) => getCoachedPlayers(signal) });
}

export function useCoachedPlayers() {
  return useQuery(coachedPlayersQueryOptions());
}
