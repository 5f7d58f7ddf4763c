import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** DELETE /api/greens/:id/stimp-readings/:readingId → 204. */
export function deleteStimpReading(greenId: string, readingId: string): Promise<void> {
  return api.delete<void>(apiPaths.greenStimpReading(greenId, readingId));
}

export function useDeleteStimpReading(greenId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (readingId: string) => deleteStimpReading(greenId, readingId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: practiceKeys.greens() }),
  });
}
