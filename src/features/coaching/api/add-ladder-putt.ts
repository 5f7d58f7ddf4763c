// A ladder putt goes through the outbox (src/lib/outbox.ts), the same persisted mutations as a practice putt: it is
// kept on the phone until the server has it, sent in the order played (one mutation scope per assignment), and
// each carries its clientId, so a repeat is stored once. The run screen folds the waiting putts onto the server's
// last answer with the shared engine (hooks/use-ladder-run.ts).
import type { Mutation, QueryClient } from "@tanstack/react-query";
import type { AssignmentDetail, LadderPuttInput } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api, isApiError } from "../../../lib/api-client";
import { enqueue, outboxRetry, outboxRetryDelay } from "../../../lib/outbox";
import { coachingKeys } from "./keys";

/** One ladder putt as queued: the API's body and the assignment it belongs to. */
export type QueuedLadderPutt = LadderPuttInput & { assignmentId: string; clientId: string };

/**
 * POST /api/assignments/:id/putts → the new state (201; 200 when the clientId was already stored, so a retry
 * is safe).
 */
export function addLadderPutt(assignmentId: string, input: LadderPuttInput): Promise<AssignmentDetail> {
  return api.post<AssignmentDetail>(apiPaths.assignmentPutts(assignmentId), input);
}

// Putts taken back while still waiting: if one is resumed anyway, its request is skipped.
const undone = new Set<string>();

async function sendLadderPutt({ assignmentId, ...input }: QueuedLadderPutt): Promise<AssignmentDetail | null> {
  if (undone.has(input.clientId)) return null;
  return addLadderPutt(assignmentId, input);
}

const scopeOf = (assignmentId: string) => `ladder:${assignmentId}`;

function isFor(assignmentId: string) {
  return (m: Mutation<unknown, Error, unknown, unknown>) =>
    (m.state.variables as QueuedLadderPutt | undefined)?.assignmentId === assignmentId;
}

/** This assignment's putts not yet stored (waiting or on their way), oldest first. */
export function pendingLadderPutts(client: QueryClient, assignmentId: string) {
  return client
    .getMutationCache()
    .findAll({ mutationKey: coachingKeys.addLadderPutt(), status: "pending", predicate: isFor(assignmentId) });
}

/**
 * Registers how a ladder putt is sent, so the outbox restored after a reload can run. Call once per query client,
 * before the outbox is restored (src/app/outbox.ts does both).
 */
export function registerLadderPuttMutations(client: QueryClient, options: { retryDelay?: (attempt: number) => number } = {}): void {
  const cache = client.getMutationCache();
  client.setMutationDefaults<AssignmentDetail | null, Error, QueuedLadderPutt>(coachingKeys.addLadderPutt(), {
    mutationFn: sendLadderPutt,
    // The first try goes out even when the browser says offline (it is often wrong); a failure then waits for the network.
    networkMode: "offlineFirst",
    retry: outboxRetry(),
    retryDelay: options.retryDelay ?? outboxRetryDelay,
    gcTime: 10 * 60_000,
    meta: { errorToast: false },
    // A GET of the assignment still on its way would bring back a state from before this putt.
    onMutate: (v) => client.cancelQueries({ queryKey: coachingKeys.assignment(v.assignmentId) }),
    onSuccess: async (detail, v) => {
      if (!detail) return;
      await client.cancelQueries({ queryKey: coachingKeys.assignment(v.assignmentId) });
      client.setQueryData(coachingKeys.assignment(v.assignmentId), detail);
      void client.invalidateQueries({ queryKey: coachingKeys.assignments(), predicate: (q) => q.queryKey.at(-1) === "mine" });
    },
    onError: async (error, v) => {
      if (!(isApiError(error) && error.status === 409)) return;
      // The server has the ladder completed (perhaps from another phone): its state wins, the waiting putts go.
      for (const m of pendingLadderPutts(client, v.assignmentId)) {
        const other = m.state.variables as QueuedLadderPutt;
        if (other.clientId === v.clientId) continue;
        undone.add(other.clientId);
        cache.remove(m);
      }
      await client.invalidateQueries({ queryKey: coachingKeys.assignment(v.assignmentId) });
    },
  });
}

/** Queues a ladder putt: it goes out after the assignment's earlier putts, now or when the connection is back. */
export function queueLadderPutt(client: QueryClient, putt: QueuedLadderPutt): void {
  enqueue(client, coachingKeys.addLadderPutt(), scopeOf(putt.assignmentId), putt);
}

/**
 * Takes back the latest waiting putt of an assignment if it has not gone out yet (it leaves the queue and
 * localStorage). Returns "taken back", "on its way" (the caller waits for its answer, then asks the server), or
 * "none" when nothing is waiting.
 */
export function takeBackLadderPutt(
  client: QueryClient,
  assignmentId: string,
): { outcome: "taken back" | "none" } | { outcome: "on its way"; settled: Promise<boolean> } {
  const last = pendingLadderPutts(client, assignmentId).at(-1);
  if (!last) return { outcome: "none" };
  // Only a first try still out has to be waited for; one that failed before may be retried for a long time.
  if (!last.state.isPaused && last.state.failureCount === 0) return { outcome: "on its way", settled: settledOk(client, last) };
  undone.add((last.state.variables as QueuedLadderPutt).clientId);
  client.getMutationCache().remove(last);
  return { outcome: "taken back" };
}

/** Resolves once the mutation has its answer: true when the server stored the putt. */
function settledOk(client: QueryClient, m: Mutation<unknown, Error, unknown, unknown>): Promise<boolean> {
  return new Promise((resolve) => {
    const look = () => {
      if (m.state.status === "pending") return false;
      unsubscribe();
      resolve(m.state.status === "success" && m.state.data !== null);
      return true;
    };
    const unsubscribe = client.getMutationCache().subscribe(() => void look());
    look();
  });
}

/** Forgets this assignment's failed putts once they have been shown (a new putt or an undo clears the message). */
export function dismissLadderPuttErrors(client: QueryClient, assignmentId: string): void {
  const cache = client.getMutationCache();
  for (const m of cache.findAll({ mutationKey: coachingKeys.addLadderPutt(), status: "error", predicate: isFor(assignmentId) }))
    cache.remove(m);
}

/** Ladder putts left in the queue of an earlier version (one localStorage entry per assignment) join the outbox. */
export function adoptOldLadderQueues(client: QueryClient, storage: Storage = window.localStorage): number {
  const PREFIX = "borrowline.ladder-run.";
  let adopted = 0;
  try {
    const keys = Array.from({ length: storage.length }, (_, i) => storage.key(i)).filter(
      (k): k is string => k?.startsWith(PREFIX) ?? false,
    );
    for (const key of keys) {
      const assignmentId = key.slice(PREFIX.length);
      let list: unknown;
      try {
        list = JSON.parse(storage.getItem(key) ?? "[]");
      } catch {
        list = [];
      }
      for (const p of Array.isArray(list) ? (list as Partial<QueuedLadderPutt>[]) : []) {
        if (typeof p.clientId !== "string" || typeof p.holed !== "boolean") continue;
        queueLadderPutt(client, {
          assignmentId,
          clientId: p.clientId,
          holed: p.holed,
          ...(p.missSide ? { missSide: p.missSide } : {}),
          ...(typeof p.missLengthM === "number" ? { missLengthM: p.missLengthM } : {}),
        });
        adopted += 1;
      }
      storage.removeItem(key);
    }
  } catch {
    // No storage: nothing was kept.
  }
  return adopted;
}
