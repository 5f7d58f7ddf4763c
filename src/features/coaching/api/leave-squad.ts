import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/squads/:id/leave → 204: the signed-in player leaves the squad. */
export function leaveSquad(id: string): Promise<void> {
  return api.post<void>(apiPaths.squadLeave(id));
}

export function useLeaveSquad() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: leaveSquad,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
  });
}
