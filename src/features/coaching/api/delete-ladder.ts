import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** DELETE /api/ladders/:id → 204. Assignments already made keep their copy of it. */
export function deleteLadder(id: string): Promise<void> {
  return api.delete<void>(apiPaths.ladder(id));
}

export function useDeleteLadder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLadder,
    onSuccess: (_void, id) => {
      queryClient.removeQueries({ queryKey: coachingKeys.ladder(id) });
      return queryClient.invalidateQueries({ queryKey: coachingKeys.ladders(), exact: true });
    },
  });
}
