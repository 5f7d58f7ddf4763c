// What the logging screen lists: the putts the server (or the optimistic update) has, plus queued putts restored
// after a reload that the cache does not know yet, in the order they were logged.
import type { Putt } from "#shared/schemas/putts";
import { pendingPutt, type NewPutt } from "../api/add-putt";

export type ListedPutt = Putt & { saved: "yes" | "waiting" | "sending" };

export function listedPutts(
  stored: ReadonlyArray<Putt>,
  queue: ReadonlyArray<{ putt: NewPutt; paused: boolean }>,
  sessionId: string,
  sessionDate?: string,
): ListedPutt[] {
  const mine = queue.filter((q) => q.putt.sessionId === sessionId);
  const state = new Map(mine.map((q) => [q.putt.clientId, q.paused ? ("waiting" as const) : ("sending" as const)]));
  const known = new Set(stored.map((p) => p.clientId).filter(Boolean));
  const rows: ListedPutt[] = stored.map((p) => ({ ...p, saved: (p.clientId && state.get(p.clientId)) || "yes" }));
  for (const q of mine) {
    if (!known.has(q.putt.clientId)) rows.push({ ...pendingPutt(q.putt, sessionDate), saved: state.get(q.putt.clientId) ?? "waiting" });
  }
  return rows.sort((a, b) => a.createdAt.localeCompare(b.createdAt));
}
