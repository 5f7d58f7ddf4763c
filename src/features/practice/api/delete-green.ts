import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** DELETE /api/greens/:id → 204. Its sessions keep their putts and lose the green. */
export function deleteGreen(id: string): Promise<void> {
  return api.delete<void>(apiPaths.green(id));
}

export function useDeleteGreen() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteGreen,
    onSuccess: (_data, id) => {
      queryClient.removeQueries({ queryKey: practiceKeys.green(id) });
      return queryClient.invalidateQueries({ queryKey: practiceKeys.all });
    },
  });
}
