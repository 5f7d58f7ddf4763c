import { queryOptions, useQuery } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { ApiError, api } from "../../../lib/api-client";
import { readsKeys } from "./keys";

/** What saving a read needs of a green. */
export type GreenChoice = { id: string; name: string; currentStimpFt: number | null };

function isGreen(v: unknown): v is GreenChoice {
  return typeof v === "object" && v !== null && typeof (v as GreenChoice).id === "string" && typeof (v as GreenChoice).name === "string";
}

/** The greens list may come as `{ items: [...] }` or a bare array; anything else counts as no greens. */
export function toGreenChoices(body: unknown): GreenChoice[] {
  const list = Array.isArray(body)
    ? body
    : typeof body === "object" && body !== null && Array.isArray((body as { items?: unknown }).items)
      ? (body as { items: unknown[] }).items
      : [];
  return list
    .filter(isGreen)
    .map((g) => ({ id: g.id, name: g.name, currentStimpFt: typeof g.currentStimpFt === "number" ? g.currentStimpFt : null }));
}

/** GET /api/greens for "save to a green". A missing endpoint (404) is no greens, not an error. */
export async function getGreenChoices(signal?: AbortSignal): Promise<GreenChoice[]> {
  try {
    return toGreenChoices(await api.get<unknown>(apiPaths.greens, { signal }));
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
