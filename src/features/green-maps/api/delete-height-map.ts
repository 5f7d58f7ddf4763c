import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

/** DELETE /api/greens/:id/height-map (204). */
export function deleteHeightMap(greenId: string): Promise<void> {
  return api.delete<void>(apiPaths.greenHeightMap(greenId));
}

export function useDeleteHeightMap(greenId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteHeightMap(greenId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: greenMapsKeys.green(greenId) }),
  });
}
