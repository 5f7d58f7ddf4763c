// The putts of one ladder run that the server has not confirmed yet, kept in order and in localStorage, and
// sent one at a time (each with its clientId, so a retry after a lost answer is stored once). The screen shows
// the server's last answer with the waiting putts folded on by the shared engine's `step`.
import type { AssignmentDetail, LadderPuttInput } from "../../../../shared/schemas/assignments";
import type { MissSide } from "../../../../shared/schemas/putts";
import { isApiError } from "../../../lib/api-client";
import { addLadderPutt } from "../api/add-ladder-putt";
import { getAssignment } from "../api/get-assignment";
import { undoLadderPutt } from "../api/undo-ladder-putt";

export type PendingPutt = {
  clientId: string;
  holed: boolean;
  missSide?: MissSide;
  /** Signed, metres: negative = short. */
  missLengthM?: number;
  /** False while the player may still add miss details; a waiting putt is sent only when ready. */
  ready: boolean;
};

export type RunSnapshot = {
  /** The server's latest answer (null until the first load). */
  base: AssignmentDetail | null;
  pending: readonly PendingPutt[];
  /** True while the last attempt to send failed for want of a connection (or a server error): it will retry. */
  waiting: boolean;
  /** A putt the server refused for good (it is dropped), in words. */
  error: string | null;
};

const STORAGE_PREFIX = "borrowline.ladder-run.";
const RETRY_MS = [2_000, 5_000, 10_000, 30_000];

function storageKey(id: string) {
  return `${STORAGE_PREFIX}${id}`;
}

function loadPending(id: string): PendingPutt[] {
  try {
    const raw = window.localStorage.getItem(storageKey(id));
    const list = raw ? (JSON.parse(raw) as PendingPutt[]) : [];
    // Miss details left open before a reload are skipped: the putt itself counts.
    return Array.isArray(list) ? list.map((p) => ({ ...p, ready: true })) : [];
  } catch {
    return [];
  }
}

/** Lost connections, rate limits and server errors are worth another try; other refusals are not. */
function isRetryable(error: unknown): boolean {
  if (!isApiError(error)) return true;
  return error.status === 0 || error.status === 429 || error.status >= 500;
}

export class RunStore {
  private snapshot: RunSnapshot;
  private listeners = new Set<() => void>();
  private sending: Promise<void> | null = null;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private failures = 0;

  constructor(readonly assignmentId: string) {
    this.snapshot = { base: null, pending: loadPending(assignmentId), waiting: false, error: null };
  }

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = () => this.snapshot;

  private set(patch: Partial<RunSnapshot>) {
    this.snapshot = { ...this.snapshot, ...patch };
    if (patch.pending) {
      try {
        if (this.snapshot.pending.length === 0) window.localStorage.removeItem(storageKey(this.assignmentId));
        else window.localStorage.setItem(storageKey(this.assignmentId), JSON.stringify(this.snapshot.pending));
      } catch {
        // Without storage the queue lasts as long as the page.
      }
    }
    for (const l of this.listeners) l();
  }

  /** A fresh answer from GET /api/assignments/:id; ignored while a putt is on its way (its answer is newer). */
  setBase(detail: AssignmentDetail) {
    if (this.sending || detail === this.snapshot.base) return;
    this.set({ base: detail });
  }

  add(putt: PendingPutt) {
    this.set({ pending: [...this.snapshot.pending, putt], error: null });
    void this.flush();
  }

  /** Miss details added (or skipped) for a waiting miss: it can be sent now. */
  complete(clientId: string, details: { missSide?: MissSide; missLengthM?: number } = {}) {
    this.set({ pending: this.snapshot.pending.map((p) => (p.clientId === clientId ? { ...p, ...details, ready: true } : p)) });
    void this.flush();
  }

  completeAll() {
    if (this.snapshot.pending.some((p) => !p.ready)) this.set({ pending: this.snapshot.pending.map((p) => ({ ...p, ready: true })) });
  }

  /** Takes back the latest putt: one not sent yet goes from the queue, else the server removes it. */
  async undo(): Promise<void> {
    // The only waiting putt may be on its way: let that finish, then see whether the server has it.
    if (this.sending && this.snapshot.pending.length === 1) await this.sending;
    if (this.snapshot.pending.length > 0) {
      this.set({ pending: this.snapshot.pending.slice(0, -1), error: null });
      return;
    }
    try {
      const detail = await undoLadderPutt(this.assignmentId);
      this.set({ base: detail, error: null });
    } catch (error) {
      if (isApiError(error) && error.status === 404) return;
      this.set({ error: isApiError(error) ? error.message : "Could not take the putt back." });
    }
  }

  /** Sends the waiting putts in order, one at a time; stops at a putt still open for details. */
  flush(): Promise<void> {
    if (this.sending) return this.sending;
    if (this.retryTimer) {
      clearTimeout(this.retryTimer);
      this.retryTimer = null;
    }
    this.sending = (async () => {
      for (;;) {
        const first = this.snapshot.pending[0];
        if (!first || !first.ready) break;
        const input: LadderPuttInput = {
          holed: first.holed,
          clientId: first.clientId,
          ...(first.missSide ? { missSide: first.missSide } : {}),
          ...(first.missLengthM !== undefined ? { missLengthM: first.missLengthM } : {}),
        };
        try {
          const detail = await addLadderPutt(this.assignmentId, input);
          this.failures = 0;
          this.set({ base: detail, pending: this.snapshot.pending.filter((p) => p.clientId !== first.clientId), waiting: false });
        } catch (error) {
          if (isRetryable(error)) {
            this.set({ waiting: true });
            this.scheduleRetry();
            break;
          }
          if (isApiError(error) && error.status === 409) {
            // The server has the ladder completed (perhaps from another phone): its state wins.
            const fresh = await getAssignment(this.assignmentId).catch(() => this.snapshot.base);
            this.set({ base: fresh, pending: [], waiting: false, error: error.message });
            break;
          }
          this.set({
            pending: this.snapshot.pending.filter((p) => p.clientId !== first.clientId),
            waiting: false,
            error: isApiError(error) ? error.message : "A putt could not be saved.",
          });
        }
      }
    })().finally(() => {
      this.sending = null;
    });
    return this.sending;
  }

  private scheduleRetry() {
    const delay = RETRY_MS[Math.min(this.failures, RETRY_MS.length - 1)]!;
    this.failures += 1;
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      void this.flush();
    }, delay);
  }

  dispose() {
    if (this.retryTimer) clearTimeout(this.retryTimer);
    this.retryTimer = null;
  }
}

const stores = new Map<string, RunStore>();

/** One store per assignment for the life of the page, so a putt in flight is not sent twice by two screens. */
export function runStoreFor(assignmentId: string): RunStore {
  let store = stores.get(assignmentId);
  if (!store) {
    store = new RunStore(assignmentId);
    stores.set(assignmentId, store);
  }
  return store;
}

/** For tests: forget every store (and its timers). */
export function forgetRunStores() {
  for (const s of stores.values()) s.dispose();
  stores.clear();
}
