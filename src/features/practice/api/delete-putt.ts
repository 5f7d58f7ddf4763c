import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Putt } from "#shared/schemas/putts";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import type { SessionPutts } from "./get-session-putts";
import { practiceKeys } from "./keys";

/** DELETE /api/putts/:id → 204. */
export function deletePutt(id: string): Promise<void> {
  return api.delete<void>(apiPaths.putt(id));
}

/** Deletes a stored putt; on the logging screen it disappears at once and comes back if the server refuses. */
export function useDeletePutt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (putt: Pick<Putt, "id" | "sessionId">) => deletePutt(putt.id),
    onMutate: async (putt) => {
      const key = practiceKeys.sessionPutts(putt.sessionId);
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<SessionPutts>(key);
      queryClient.setQueryData<SessionPutts>(key, (old) => old && { items: old.items.filter((p) => p.id !== putt.id) });
      return { previous };
    },
    onError: (_error, putt, context) => {
      if (context?.previous) queryClient.setQueryData(practiceKeys.sessionPutts(putt.sessionId), context.previous);
    },
    onSettled: (_d, _e, putt) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: practiceKeys.putts() }),
        queryClient.invalidateQueries({ queryKey: practiceKeys.session(putt.sessionId) }),
        queryClient.invalidateQueries({ queryKey: practiceKeys.sessions(), refetchType: "none" }),
      ]),
  });
}
