import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Invitation } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/squads/:id/invitations: newest first, with status pending / accepted / expired / revoked. */
export function getInvitations(squadId: string, signal?: AbortSignal): Promise<{ invitations: Invitation[] }> {
  return api.get<{ invitations: Invitation[] }>(apiPaths.squadInvitations(squadId), { signal });
}

export function invitationsQueryOptions(squadId: string) {
  return queryOptions({ queryKey: coachingKeys.invitations(squadId), queryFn: ({ signal }) => getInvitations(squadId, signal) });
}

export function useInvitations(squadId: string) {
  return useQuery(invitationsQueryOptions(squadId));
}
