import { useMutation, useMutationState, type Mutation, type QueryClient } from "@tanstack/react-query";
import { toast } from "../../../lib/toast";
import type { BreakType, MissSide, Putt } from "#shared/schemas/putts";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { outboxRetry, outboxRetryDelay } from "../../../lib/outbox";
import { errorMessage } from "../../../lib/query-client";
import { practiceKeys } from "./keys";
import type { SessionPutts } from "./get-session-putts";

/** A putt as the logging screen sends it. `clientId` (crypto.randomUUID()) makes a repeat harmless: the server stores it once. */
export type NewPutt = {
  sessionId: string;
  clientId: string;
  distanceM: number;
  holed: boolean;
  missSide?: MissSide | null;
  missLengthM?: number | null;
  breakType?: BreakType | null;
  /** When it was logged (ISO), to order it before the server has it. */
  loggedAt: string;
};

export type AddPuttResult = { id: string | null };

// Putts undone while still waiting: their request is skipped, or, if it was already on its way, the stored putt
// is deleted as soon as its id comes back.
const undone = new Set<string>();

/** POST /api/sessions/:id/putts → 201 `{id}` (200 with the same id for a repeated clientId). */
export async function postPutt(putt: NewPutt): Promise<AddPuttResult> {
  if (undone.has(putt.clientId)) return { id: null };
  const { sessionId, loggedAt: _loggedAt, ...body } = putt;
  return api.post<{ id: string }>(apiPaths.sessionPutts(sessionId), body);
}

/** The row shown while the server has not answered yet. */
export function pendingPutt(v: NewPutt, sessionDate = v.loggedAt.slice(0, 10)): Putt {
  return {
    id: `pending:${v.clientId}`,
    sessionId: v.sessionId,
    date: sessionDate,
    distanceM: v.distanceM,
    holed: v.holed,
    missSide: v.missSide ?? null,
    missLengthM: v.missLengthM ?? null,
    breakType: v.breakType ?? null,
    clientId: v.clientId,
    createdAt: v.loggedAt,
  };
}

/** The outbox's retries (src/lib/outbox.ts), and a 409 too: the server's "being stored; retry". */
export const retryPutt = outboxRetry([409]);

// Sessions whose logging screen is open: that screen shows a failed putt itself, so no toast then.
const watched = new Map<string, number>();
export function watchSession(sessionId: string): () => void {
  watched.set(sessionId, (watched.get(sessionId) ?? 0) + 1);
  return () => {
    const n = (watched.get(sessionId) ?? 1) - 1;
    if (n <= 0) watched.delete(sessionId);
    else watched.set(sessionId, n);
  };
}

function withoutPutt(old: SessionPutts | undefined, clientId: string): SessionPutts | undefined {
  return old && { items: old.items.filter((p) => p.clientId !== clientId) };
}

/**
 * Registers how a logged putt is sent, so the outbox restored from localStorage after a reload can run. Call once
 * per query client, before the outbox is restored (src/app/outbox.ts does both).
 */
export function registerPuttMutations(client: QueryClient, options: { retryDelay?: (attempt: number) => number } = {}): void {
  client.setMutationDefaults<AddPuttResult, Error, NewPutt, { previous?: SessionPutts }>(practiceKeys.addPutt(), {
    mutationFn: postPutt,
    // The first try goes out even when the browser says offline (it is often wrong); a failure then waits for the network.
    networkMode: "offlineFirst",
    retry: retryPutt,
    retryDelay: options.retryDelay ?? outboxRetryDelay,
    gcTime: 10 * 60_000,
    meta: { errorToast: false },
    onMutate: async (v) => {
      const key = practiceKeys.sessionPutts(v.sessionId);
      await client.cancelQueries({ queryKey: key });
      const previous = client.getQueryData<SessionPutts>(key);
      const sessionDate = previous?.items[0]?.date;
      client.setQueryData<SessionPutts>(key, (old) => ({
        items: [...(old?.items ?? []).filter((p) => p.clientId !== v.clientId), pendingPutt(v, sessionDate)],
      }));
      return { previous };
    },
    onError: (error, v) => {
      // Roll back this putt only: others may have been logged since the snapshot was taken.
      client.setQueryData<SessionPutts>(practiceKeys.sessionPutts(v.sessionId), (old) => withoutPutt(old, v.clientId));
      if (!watched.has(v.sessionId)) toast.error(`A putt could not be saved: ${errorMessage(error)}`, { id: `putt-${v.clientId}` });
    },
    onSuccess: (data, v) => {
      if (data.id && undone.has(v.clientId)) {
        // Undone while it was on its way: remove the stored copy.
        void api.delete(apiPaths.putt(data.id)).catch(() => undefined);
        return;
      }
      const id = data.id;
      if (!id) return;
      client.setQueryData<SessionPutts>(practiceKeys.sessionPutts(v.sessionId), (old) =>
        old ? { items: old.items.map((p) => (p.clientId === v.clientId ? { ...p, id } : p)) } : old,
      );
    },
    onSettled: (_data, _error, v) => {
      // Refetch once the last queued putt is through, so the list does not jump while others are still on their way.
      if (client.isMutating({ mutationKey: practiceKeys.addPutt() }) > 1) return;
      void client.invalidateQueries({ queryKey: practiceKeys.putts() });
      void client.invalidateQueries({ queryKey: practiceKeys.session(v.sessionId) });
      void client.invalidateQueries({ queryKey: practiceKeys.sessions(), refetchType: "none" });
    },
  });
}

/** Logs a putt; putts of one session go out one after another, in the order they were logged. */
export function useAddPutt(sessionId: string) {
  return useMutation<AddPuttResult, Error, NewPutt>({ mutationKey: practiceKeys.addPutt(), scope: { id: `putts:${sessionId}` } });
}

export type QueuedPutt = { putt: NewPutt; paused: boolean; status: "pending" | "error"; error: Error | null; submittedAt: number };

function queued(m: Mutation<unknown, Error, unknown, unknown>): QueuedPutt {
  return {
    putt: m.state.variables as NewPutt,
    paused: m.state.isPaused,
    status: m.state.status === "error" ? "error" : "pending",
    error: m.state.error,
    submittedAt: m.state.submittedAt,
  };
}

/** Putts not yet stored (waiting or on their way), across all sessions, oldest first. */
export function usePuttQueue(): QueuedPutt[] {
  return useMutationState({ filters: { mutationKey: practiceKeys.addPutt(), status: "pending" }, select: queued });
}

/** Putts of a session that failed for good (already rolled back), newest last. */
export function useFailedPutts(sessionId: string): QueuedPutt[] {
  return useMutationState({
    filters: {
      mutationKey: practiceKeys.addPutt(),
      status: "error",
      predicate: (m) => (m.state.variables as NewPutt | undefined)?.sessionId === sessionId,
    },
    select: queued,
  });
}

/** Forgets failures that have been shown. */
export function dismissFailedPutts(client: QueryClient, sessionId: string): void {
  const cache = client.getMutationCache();
  for (const m of cache.findAll({ mutationKey: practiceKeys.addPutt(), status: "error" })) {
    if ((m.state.variables as NewPutt | undefined)?.sessionId === sessionId) cache.remove(m);
  }
}

/**
 * Takes back a putt that has not been stored yet: it leaves the queue (and localStorage), and if its request is
 * already on its way the stored copy is deleted when the answer comes. Returns false when it was not queued.
 */
export function undoQueuedPutt(client: QueryClient, clientId: string): boolean {
  const cache = client.getMutationCache();
  const m = cache
    .findAll({ mutationKey: practiceKeys.addPutt(), status: "pending" })
    .find((x) => (x.state.variables as NewPutt).clientId === clientId);
  if (!m) return false;
  undone.add(clientId);
  const v = m.state.variables as NewPutt;
  cache.remove(m);
  client.setQueryData<SessionPutts>(practiceKeys.sessionPutts(v.sessionId), (old) => withoutPutt(old, clientId));
  return true;
}
