import { queryOptions, useQuery } from "@tanstack/react-query";
import type { PuttList } from "#shared/schemas/putts";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** GET /api/sessions/:id/putts (puttListSchema). */
export type SessionPutts = PuttList;

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
