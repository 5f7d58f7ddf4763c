import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { SessionInput } from "#shared/schemas/sessions";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** POST /api/sessions → 201 `{id}`. Without stimpFt the server takes the green's reading on that date. */
export function createSession(input: SessionInput): Promise<{ id: string }> {
  return api.post<{ id: string }>(apiPaths.sessions, input);
}

export function useCreateSession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSession,
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: practiceKeys.sessions() }),
  });
}
