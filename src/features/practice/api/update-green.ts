import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Green, GreenPatch } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** PATCH /api/greens/:id (rename, location note) → the green. */
export function updateGreen(id: string, patch: GreenPatch): Promise<Green> {
  return api.patch<Green>(apiPaths.green(id), patch);
}

export function useUpdateGreen(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: GreenPatch) => updateGreen(id, patch),
    meta: { errorToast: false },
    onSuccess: (green) => {
      queryClient.setQueryData(practiceKeys.green(id), green);
      // Session rows show the green's name.
      return queryClient.invalidateQueries({ queryKey: practiceKeys.all });
    },
  });
}
