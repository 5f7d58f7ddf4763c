import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CreateAttemptInput, CreateAttemptResponse } from "#shared/schemas/training";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { trainingKeys } from "./keys";

/** POST /api/training/attempts — the server scores the read itself; no score is sent. */
export function createAttempt(input: CreateAttemptInput): Promise<CreateAttemptResponse> {
  return api.post<CreateAttemptResponse>(apiPaths.trainingAttempts, input);
}

export function useCreateAttempt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAttempt,
    // The page says what happened (kept, not kept, or a putt scored before), so no toast on top.
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingKeys.all }),
  });
}
