import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Ladder, LadderInput } from "#shared/schemas/ladders";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

/** POST /api/ladders (new) or PUT /api/ladders/:id (replace) → the ladder. */
export function saveLadder({ id, input }: { id?: string; input: LadderInput }): Promise<Ladder> {
  return id ? api.put<Ladder>(apiPaths.ladder(id), input) : api.post<Ladder>(apiPaths.ladders, input);
}

export function useSaveLadder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveLadder,
    // The builder shows field errors beside their fields and other failures over the form.
    meta: { errorToast: false },
    onSuccess: (ladder) => {
      queryClient.setQueryData(coachingKeys.ladder(ladder.id), ladder);
      return queryClient.invalidateQueries({ queryKey: coachingKeys.ladders(), exact: true });
    },
  });
}
