import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Green } from "#shared/schemas/greens";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

/** GET /api/greens/:id → the green with its Stimp readings, newest first. */
export function getGreen(id: string, signal?: AbortSignal): Promise<Green> {
  return api.get<Green>(apiPaths.green(id), { signal });
}

export function greenQueryOptions(id: string) {
  return queryOptions({ queryKey: practiceKeys.green(id), queryFn: ({ signal }) => getGreen(id, signal), meta: { errorToast: false } });
}

export function useGreen(id: string) {
  return useQuery(greenQueryOptions(id));
}
