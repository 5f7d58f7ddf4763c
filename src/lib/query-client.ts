import { MutationCache, onlineManager, QueryCache, QueryClient } from "@tanstack/react-query";
import { toast } from "./toast";
import { ApiError, isApiError } from "./api-client";

declare module "@tanstack/react-query" {
  interface Register {
    defaultError: Error;
    // `errorToast: false` for requests whose failure the screen itself explains
    // (a form showing field errors, a probe that is allowed to fail).
    queryMeta: { errorToast?: boolean };
    mutationMeta: { errorToast?: boolean };
  }
}

export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return "Something went wrong.";
}

function shouldRetry(failureCount: number, error: Error): boolean {
  // Client errors do not get better by asking again.
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (query.meta?.errorToast === false) return;
        toast.error(errorMessage(error), { id: `query-${query.queryHash}` });
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (mutation.meta?.errorToast === false) return;
        // Field errors are shown beside their fields by the form; a toast would repeat them.
        if (error instanceof ApiError && Object.keys(error.fields).length > 0) return;
        toast.error(errorMessage(error));
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: shouldRetry,
        refetchOnWindowFocus: true,
        // Try once even offline: the service worker may have the answer (src/lib/offline-cache.ts); retries wait
        // for the connection.
        networkMode: "offlineFirst",
      },
      mutations: { retry: false },
    },
  });
}

/**
 * TanStack Query assumes it is online until an "offline" event: a page opened with no signal would never hear one.
 * A browser that says it is offline is right (it is "online" that can be wrong), so start from that.
 */
export function startOnlineState(): void {
  if (typeof navigator !== "undefined" && navigator.onLine === false) onlineManager.setOnline(false);
}
