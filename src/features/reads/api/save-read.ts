import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { SavedRead, SaveReadInput } from "#shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { readsKeys } from "./keys";

/** POST /api/reads → 201 with the saved row. */
export function saveRead(input: SaveReadInput): Promise<SavedRead> {
  return api.post<SavedRead>(apiPaths.reads, input);
}

export function useSaveRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveRead,
    // The save form shows its own failure.
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: readsKeys.saved() }),
  });
}
