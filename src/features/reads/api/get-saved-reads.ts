import { queryOptions, useQuery } from "@tanstack/react-query";
import type { SavedRead, SavedReadList } from "#shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { readsKeys } from "./keys";

export type { SavedRead };

/** GET /api/reads: the signed-in player's saved reads, newest first. */
export function getSavedReads(signal?: AbortSignal): Promise<SavedReadList> {
  return api.get<SavedReadList>(apiPaths.reads, { signal });
}

export function savedReadsQueryOptions() {
  return queryOptions({ queryKey: readsKeys.saved(), queryFn: ({ signal }) => getSavedReads(signal) });
}

export function useSavedReads(enabled = true) {
  return useQuery({ ...savedReadsQueryOptions(), enabled });
}
