import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** DELETE /api/rounds/:id → 204. */
export function deleteRound(id: string): Promise<void> {
  return api.delete<void>(apiPaths.round(id));
}

export function useDeleteRound() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRound,
    onSuccess: (_d, id) => {
      queryClient.removeQueries({ queryKey: practiceKeys.round(id) });
      return queryClient.invalidateQueries({ queryKey: practiceKeys.rounds() });
    },
  });
}
