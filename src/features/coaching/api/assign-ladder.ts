import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { AssignInput, Assignment } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/ladders/:id/assignments {playerIds} | {squadId}, dueDate? → 201 {assignments}. */
export function assignLadder({ ladderId, input }: { ladderId: string; input: AssignInput }): Promise<{ assignments: Assignment[] }> {
  return api.post<{ assignments: Assignment[] }>(apiPaths.ladderAssignments(ladderId), input);
}

export function useAssignLadder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: assignLadder,
    meta: { errorToast: false },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: coachingKeys.coach() }),
        queryClient.invalidateQueries({ queryKey: coachingKeys.squads() }),
      ]),
  });
}
