import { queryOptions, useQuery } from "@tanstack/react-query";
import type { DevMailList, DevMailMessage } from "#shared/schemas/system";
import { api, ApiError } from "../../../lib/api-client";
import { apiPaths } from "../../../config/paths";
import { useMe } from "../../auth/api/get-me";
import { devMailKeys } from "./keys";

export type { DevMailList, DevMailMessage };

/** GET /api/dev/mail, newest first whatever order the server sends. */
export async function getDevMail(signal?: AbortSignal): Promise<DevMailList> {
  const data = await api.get<DevMailList>(apiPaths.devMail, { signal });
  const messages = [...(data?.messages ?? [])].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
  return { messages };
}

export function devMailQueryOptions() {
  return queryOptions({
    queryKey: devMailKeys.list(),
    queryFn: ({ signal }) => getDevMail(signal),
    staleTime: 0,
    refetchInterval: 5_000,
    meta: { errorToast: false },
  });
}

export function useDevMail() {
  return useQuery(devMailQueryOptions());
}

/** Whether this server has a local inbox (no SMTP_URL) that the signed-in admin may read: asks the server once. */
export async function probeDevMail(signal?: AbortSignal): Promise<boolean> {
  try {
    await api.get<unknown>(apiPaths.devMail, { signal });
    return true;
  } catch (error) {
    if (error instanceof ApiError) return false;
    throw error;
  }
}

/** Only an admin can read the local inbox (it holds every sign-in and invitation link), so only an admin asks. */
export function useDevMailAvailable(): boolean {
  const me = useMe();
  const admin = me.data?.user.role === "admin";
  const probe = useQuery({
    queryKey: devMailKeys.probe(),
    queryFn: ({ signal }) => probeDevMail(signal),
    enabled: admin,
    staleTime: Infinity,
    retry: false,
    meta: { errorToast: false },
  });
  return admin && probe.data === true;
}
