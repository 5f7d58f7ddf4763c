import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ReadRequest, ReadResponse } from "../../../../shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { readsKeys } from "./keys";

export type SavedRead = {
  id: string;
  label: string | null;
  greenId: string | null;
  greenName: string | null;
  input: ReadRequest;
  /** The answer without its drawn path. */
  result: Omit<ReadResponse, "path">;
  createdAt: string;
};

/** GET /api/reads: the signed-in player's saved reads, newest first. */
export function getSavedReads(signal?: AbortSignal): Promise<{ items: SavedRead[] }> {
  return api.get<{ items: SavedRead[] }>(apiPaths.reads, { signal });
}

export function savedReadsQueryOptions() {
  return queryOptions({ queryKey: readsKeys.saved(), queryFn: ({ signal }) => getSavedReads(signal) });
}

export function useSavedReads(enabled = true) {
  return useQuery({ ...savedReadsQueryOptions(), enabled });
}
