import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Putt } from "../../../../shared/schemas/putts";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

export type SessionPutts = { items: Putt[] };

/** GET /api/sessions/:id/putts → the session's putts in the order they were logged. */
export function getSessionPutts(sessionId: string, signal?: AbortSignal): Promise<SessionPutts> {
  return api.get<SessionPutts>(apiPaths.sessionPutts(sessionId), { signal });
}

export function sessionPuttsQueryOptions(sessionId: string) {
  return queryOptions({ queryKey: practiceKeys.sessionPutts(sessionId), queryFn: ({ signal }) => getSessionPutts(sessionId, signal) });
}

export function useSessionPutts(sessionId: string) {
  return useQuery(sessionPuttsQueryOptions(sessionId));
}
