import { queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { ApiError, api } from "../../../lib/api-client";
import type { GreenList } from "#shared/schemas/greens";
import { readsKeys } from "./keys";

/** What saving a read needs of a green. */
export type GreenChoice = { id: string; name: string; currentStimpFt: number | null };

/** The greens list (GET /api/greens, shared/schemas/greens.ts) as the save form offers it. */
export function toGreenChoices(list: GreenList): GreenChoice[] {
  return list.items.map((g) => ({ id: g.id, name: g.name, currentStimpFt: g.currentStimpFt }));
}

/** GET /api/greens for "save to a green". A missing endpoint (404) is no greens, not an error. */
export async function getGreenChoices(signal?: AbortSignal): Promise<GreenChoice[]> {
  try {
    return toGreenChoices(await api.get<GreenList>(apiPaths.greens, { signal }));
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return [];
    throw error;
  }
}

export function greenChoicesQueryOptions() {
  return queryOptions({
    queryKey: readsKeys.greens(),
    queryFn: ({ signal }) => getGreenChoices(signal),
    // Saving without a green still works, so a failure here is not worth a toast.
    meta: { errorToast: false },
  });
}

export function useGreenChoices(enabled = true) {
  return useQuery({ ...greenChoicesQueryOptions(), enabled });
}
