import { useEffect, useMemo, useSyncExternalStore } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { step, type LadderProgress } from "../../../../shared/ladder-engine";
import type { AssignmentDetail } from "../../../../shared/schemas/assignments";
import type { MissSide } from "../../../../shared/schemas/putts";
import { useAssignment } from "../api/get-assignment";
import { coachingKeys } from "../api/keys";
import { runStoreFor } from "./run-store";

export type LadderRun = {
  query: ReturnType<typeof useAssignment>;
  assignment: AssignmentDetail | null;
  /** The server's state with the waiting putts applied by the engine: what the player sees at once. */
  progress: LadderProgress | null;
  pendingCount: number;
  /** The miss still open for details (its clientId), if any. */
  openMiss: string | null;
  waiting: boolean;
  error: string | null;
  /** Plays one putt; returns its clientId. */
  play: (holed: boolean) => string;
  addMissDetails: (clientId: string, details: { missSide?: MissSide; missLengthM?: number }) => void;
  skipMissDetails: (clientId: string) => void;
  undo: () => Promise<void>;
  retryNow: () => void;
};

/** Runs a ladder assignment putt by putt: instant feedback from the shared engine, saving in the background. */
export function useLadderRun(assignmentId: string): LadderRun {
  const queryClient = useQueryClient();
  const query = useAssignment(assignmentId);
  const store = runStoreFor(assignmentId);
  const snap = useSyncExternalStore(store.subscribe, store.getSnapshot);

  useEffect(() => {
    if (query.data) store.setBase(query.data);
  }, [query.data, store]);

  // Putts left from a reload go out as soon as the page is back; a regained connection sends at once.
  useEffect(() => {
    void store.flush();
    const online = () => void store.flush();
    // A phone put away with a miss still open for details: the putt goes without them.
    const hidden = () => {
      if (document.visibilityState !== "hidden") return;
      store.completeAll();
      void store.flush();
    };
    window.addEventListener("online", online);
    document.addEventListener("visibilitychange", hidden);
    return () => {
      window.removeEventListener("online", online);
      document.removeEventListener("visibilitychange", hidden);
    };
  }, [store]);

  useEffect(() => {
    if (!snap.base) return;
    queryClient.setQueryData(coachingKeys.assignment(assignmentId), snap.base);
    void queryClient.invalidateQueries({ queryKey: coachingKeys.assignments(), exact: false, predicate: (q) => q.queryKey.at(-1) === "mine" });
  }, [snap.base, assignmentId, queryClient]);

  const assignment = snap.base ?? query.data ?? null;
  const progress = useMemo(() => {
    if (!assignment) return null;
    return snap.pending.reduce((state, p) => step(assignment.ladder, state, p.holed), assignment.progress);
  }, [assignment, snap.pending]);

  const openMiss = snap.pending.find((p) => !p.ready)?.clientId ?? null;

  return {
    query,
    assignment,
    progress,
    pendingCount: snap.pending.length,
    openMiss,
    waiting: snap.waiting,
    error: snap.error,
    play: (holed) => {
      // A new putt closes any miss still open for details.
      store.completeAll();
      const clientId = crypto.randomUUID();
      store.add({ clientId, holed, ready: holed });
      return clientId;
    },
    addMissDetails: (clientId, details) => store.complete(clientId, details),
    skipMissDetails: (clientId) => store.complete(clientId),
    undo: () => store.undo(),
    retryNow: () => void store.flush(),
  };
}
