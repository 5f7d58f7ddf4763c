import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Green, StimpReadingInput } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/**
 * POST /api/greens/:id/stimp-readings with `{measuredOn, stimpFt}` or a two-way reading `{measuredOn, upFt, downFt}`
 * (the server applies Brede's correction) → 201 with the green.
 */
export function addStimpReading(greenId: string, input: StimpReadingInput): Promise<Green> {
  return api.post<Green>(apiPaths.greenStimpReadings(greenId), input);
}

export function useAddStimpReading(greenId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StimpReadingInput) => addStimpReading(greenId, input),
    meta: { errorToast: false },
    onSuccess: (green) => {
      queryClient.setQueryData(practiceKeys.green(greenId), green);
      return queryClient.invalidateQueries({ queryKey: practiceKeys.greens(), exact: true });
    },
  });
}
