import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Ladder } from "#shared/schemas/ladders";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/ladders/:id/copy → 201 with the copy in the coach's own library. */
export function copyLadder({ id, name }: { id: string; name?: string }): Promise<Ladder> {
  return api.post<Ladder>(apiPaths.ladderCopy(id), name ? { name } : {});
}

export function useCopyLadder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: copyLadder,
    onSuccess: (ladder) => {
      queryClient.setQueryData(coachingKeys.ladder(ladder.id), ladder);
      return queryClient.invalidateQueries({ queryKey: coachingKeys.ladders(), exact: true });
    },
  });
}
