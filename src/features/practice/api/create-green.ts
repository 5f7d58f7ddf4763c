import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Green, GreenInput } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** POST /api/greens → 201 with the new green. */
export function createGreen(input: GreenInput): Promise<Green> {
  return api.post<Green>(apiPaths.greens, input);
}

export function useCreateGreen() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createGreen,
    meta: { errorToast: false },
    onSuccess: (green) => {
      queryClient.setQueryData(practiceKeys.green(green.id), green);
      return queryClient.invalidateQueries({ queryKey: practiceKeys.greens(), exact: true });
    },
  });
}
