// The one offline queue (issue 16): what a golfer logs on the green — a practice putt, a ladder putt — is a TanStack
// Query mutation under a registered key. Each feature registers its key's defaults (mutationFn, retry, what to do
// with the answer), so a queue restored after a reload can run; `persistOutbox` keeps every pending mutation under
// those keys in one localStorage entry and resumes them at start. Each write carries a clientId made on the phone,
// so a request that was in flight when the page went away is stored once when it is sent again.
import type { MutationKey, QueryClient } from "@tanstack/react-query";
import { ApiError } from "./api-client";
import { persistMutations } from "./mutation-persistence";

/** The localStorage entry of the queue (its name from when it held practice putts only; kept so no queue is lost). */
export const OUTBOX_STORAGE_KEY = "borrowline.putt-outbox";

/**
 * Which failures are worth another try: no connection (status 0: paused while offline, tried again when it comes
 * back) always; a server fault or a rate limit, and the statuses in `alsoRetry`, up to four tries. Any other
 * answer will not change by asking again.
 */
export function outboxRetry(alsoRetry: readonly number[] = []) {
  return (failureCount: number, error: Error): boolean => {
    if (!(error instanceof ApiError)) return failureCount < 3;
    if (error.status === 0) return true;
    if (error.status >= 500 || error.status === 429 || alsoRetry.includes(error.status)) return failureCount < 4;
    return false;
  };
}

/** 2 s, 4 s, 8 s … at most 30 s between tries while the browser says it is online. */
export const outboxRetryDelay = (attempt: number) => Math.min(30_000, 1000 * 2 ** attempt);

/** Keeps the pending mutations under `mutationKeys` in localStorage and resumes a stored queue. Returns the unsubscribe. */
export function persistOutbox(client: QueryClient, mutationKeys: ReadonlyArray<MutationKey>): () => void {
  return persistMutations(client, { storageKey: OUTBOX_STORAGE_KEY, mutationKeys });
}

/** Puts one write in the queue (the key's registered defaults do the rest); its failure is the screen's to show. */
export function enqueue<TVariables>(client: QueryClient, mutationKey: MutationKey, scope: string, variables: TVariables): void {
  const mutation = client.getMutationCache().build<unknown, Error, TVariables, unknown>(client, { mutationKey, scope: { id: scope } });
  void mutation.execute(variables).catch(() => undefined);
}
