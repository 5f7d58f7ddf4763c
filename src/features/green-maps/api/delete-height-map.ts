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
    // The map is gone: say so at once (no GET that would 404), then ask the green again, whose hasHeightMap turns false.
    onSuccess: () => {
      queryClient.setQueryData(greenMapsKeys.heightMap(greenId), null);
      return queryClient.invalidateQueries({ queryKey: greenMapsKeys.details(greenId) });
    },
  });
}
