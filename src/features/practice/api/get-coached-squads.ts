import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Squad } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** GET /api/squads as a coach → the squads they coach: where a green can be shared. */
export function getCoachedSquads(signal?: AbortSignal): Promise<{ squads: Squad[] }> {
  return api.get<{ squads: Squad[] }>(apiPaths.squads, { signal });
}

export function useCoachedSquads(enabled: boolean) {
  return useQuery(queryOptions({ queryKey: practiceKeys.coachedSquads(), queryFn: ({ signal }) => getCoachedSquads(signal), enabled }));
}
