import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { readsKeys } from "./keys";

/** DELETE /api/reads/:id → 204. */
export function deleteRead(id: string): Promise<void> {
  return api.delete<void>(apiPaths.read(id));
}

export function useDeleteRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRead,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: readsKeys.saved() }),
  });
}
