import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { SquadOverview } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api, downloadFile } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/coach/squads/:id/overview?days=: each player's recent practice against their own past. */
export function squadOverviewQueryOptions(squadId: string, days: number) {
  return queryOptions({
    queryKey: coachingKeys.squadOverview(squadId, days),
    queryFn: ({ signal }) => api.get<SquadOverview>(apiPaths.squadOverview(squadId), { query: { days }, signal }),
    placeholderData: keepPreviousData,
  });
}

export function useSquadOverview(squadId: string, days: number) {
  return useQuery(squadOverviewQueryOptions(squadId, days));
}

/** The same overview as a CSV download (formula-safe on the server). */
export function downloadSquadOverview(squadId: string, days: number): Promise<string> {
  return downloadFile(apiPaths.squadOverviewExport(squadId), { query: { days }, fallbackName: "squad-overview.csv" });
}
