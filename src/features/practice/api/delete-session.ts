import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** DELETE /api/sessions/:id → 204 (its putts go with it). */
export function deleteSession(id: string): Promise<void> {
  return api.delete<void>(apiPaths.practiceSession(id));
}

export function useDeleteSession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteSession,
    onSuccess: (_d, id) => {
      queryClient.removeQueries({ queryKey: practiceKeys.session(id) });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: practiceKeys.sessions() }),
        queryClient.invalidateQueries({ queryKey: practiceKeys.putts() }),
      ]);
    },
  });
}
