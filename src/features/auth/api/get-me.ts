import { queryOptions, useQuery } from "@tanstack/react-query";
import { api, ApiError } from "../../../lib/api-client";
import { apiPaths } from "../../../config/paths";
import { authKeys } from "./keys";

import type { Role } from "#shared/roles";
import type { Me, MeResponse, MeUser, Preferences } from "#shared/schemas/me";
import type { UnitSystem } from "#shared/units";
export type { Role };
/** The answer's types come from shared/schemas/me.ts (the route's response schema); nothing is declared twice. */
export type Units = UnitSystem;
export type { Me, MeResponse, MeUser };
export type MePreferences = Preferences;

/** GET /api/me. Resolves with null when nobody is signed in (401, or a 200 with `user: null`),
 *  so "signed out" is data, not an error. */
export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    const me = await api.get<MeResponse | undefined>(apiPaths.me, { signal });
    return me?.user ? me : null;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 60_000,
    // The shell explains a failure itself; a toast on every page would be noise.
    meta: { errorToast: false },
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
