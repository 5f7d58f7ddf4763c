import { queryOptions, useQuery } from "@tanstack/react-query";
import type { InvitationPreview } from "#shared/schemas/squads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** GET /api/invitations/:token: public, so the join page can show whom the link is for before sign-in. */
export function getInvitationPreview(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get<InvitationPreview>(apiPaths.invitation(token), { signal });
}

export function invitationPreviewQueryOptions(token: string) {
  return queryOptions({
    queryKey: coachingKeys.invitationPreview(token),
    queryFn: ({ signal }) => getInvitationPreview(token, signal),
    // The join page explains a bad link itself.
    meta: { errorToast: false },
  });
}

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}
