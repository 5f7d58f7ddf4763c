import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { apiPaths } from "../../../config/paths";
import { authKeys } from "./keys";
import type { Me, MePreferences } from "./get-me";

/** PATCH /api/me/preferences; the server answers with the same shape as GET /api/me. */
export function updatePreferences(input: Partial<MePreferences>): Promise<Me> {
  return api.patch<Me>(apiPaths.mePreferences, input);
}

export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    // The account page shows the failure beside the choice.
    meta: { errorToast: false },
    onSuccess: (me) => {
      queryClient.setQueryData(authKeys.me(), me);
      return queryClient.invalidateQueries({ queryKey: authKeys.all });
    },
  });
}
