import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { HeightMapSummary } from "#shared/schemas/height-map";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

export type WalkedMap = { spacingM: number; originM: [number, number]; heightsM: number[][] };

/** PUT /api/greens/:id/height-map with the walked grid as JSON (`walked: true`): the same save as an uploaded grid. */
export function useSaveWalkedMap(greenId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (map: WalkedMap) => api.put<HeightMapSummary>(apiPaths.greenHeightMap(greenId), { kind: "grid", walked: true, ...map }),
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: greenMapsKeys.green(greenId) }),
  });
}
