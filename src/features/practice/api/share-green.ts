import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Green, GreenShare } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** PUT /api/greens/:id/squad → the green, shared with that squad of the coach's, or (null) kept to oneself. */
export function shareGreen(id: string, share: GreenShare): Promise<Green> {
  return api.put<Green>(apiPaths.greenSquad(id), share);
}

export function useShareGreen(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (share: GreenShare) => shareGreen(id, share),
    meta: { errorToast: false },
    onSuccess: (green) => {
      queryClient.setQueryData(practiceKeys.green(id), green);
      return queryClient.invalidateQueries({ queryKey: practiceKeys.greens() });
    },
  });
}
