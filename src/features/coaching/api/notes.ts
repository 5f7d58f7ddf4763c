import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { PlayerNote } from "#shared/schemas/notes";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { coachingKeys } from "./keys";

export type { PlayerNote };

/** GET /api/players/:playerId/notes: a coach's dated notes on the player, newest first. */
export function notesQueryOptions(playerId: string) {
  return queryOptions({
    queryKey: coachingKeys.notes(playerId),
    queryFn: ({ signal }) => api.get<{ notes: PlayerNote[] }>(apiPaths.playerNotes(playerId), { signal }),
    meta: { errorToast: false },
  });
}

export function useNotes(playerId: string | undefined) {
  return useQuery({ ...notesQueryOptions(playerId ?? ""), enabled: Boolean(playerId) });
}

/** POST /api/players/:playerId/notes → 201 with the note. */
export function useAddNote(playerId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => api.post<PlayerNote>(apiPaths.playerNotes(playerId), { body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: coachingKeys.notes(playerId) }),
  });
}
