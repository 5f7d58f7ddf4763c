import { queryOptions, useQuery } from "@tanstack/react-query";
import type { SessionItem } from "#shared/schemas/sessions";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** GET /api/sessions/:id → the session with its putt counts. */
export function getSession(id: string, signal?: AbortSignal): Promise<SessionItem> {
  return api.get<SessionItem>(apiPaths.practiceSession(id), { signal });
}

export function sessionQueryOptions(id: string) {
  return queryOptions({ queryKey: practiceKeys.session(id), queryFn: ({ signal }) => getSession(id, signal), meta: { errorToast: false } });
}

export function useSession(id: string) {
  return useQuery(sessionQueryOptions(id));
}
