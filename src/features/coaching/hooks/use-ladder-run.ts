import { useCallback, useEffect, useRef, useState } from "react";
import { useMutationState, useQueryClient, type Mutation } from "@tanstack/react-query";
import { step, type LadderProgress } from "#shared/ladder-engine";
import type { AssignmentDetail } from "#shared/schemas/assignments";
import type { MissSide } from "#shared/schemas/putts";
import { isApiError } from "../../../lib/api-client";
import { dismissLadderPuttErrors, queueLadderPutt, takeBackLadderPutt, type QueuedLadderPutt } from "../api/add-ladder-putt";
import { useAssignment } from "../api/get-assignment";
import { coachingKeys } from "../api/keys";
import { undoLadderPutt } from "../api/undo-ladder-putt";

export type LadderRun = {
  query: ReturnType<typeof useAssignment>;
  assignment: AssignmentDetail | null;
  /** The server's state with the waiting putts applied by the engine: what the player sees at once. */
  progress: LadderProgress | null;
  /** Putts not stored yet: waiting in the outbox, on their way, or a miss still open for details. */
  pendingCount: number;
  /** The miss still open for details (its clientId), if any. */
  openMiss: string | null;
  /** True once a putt's try failed for want of a connection (or a server fault): it is tried again by itself. */
  waiting: boolean;
  error: string | null;
  /** Plays one putt; returns its clientId. */
  play: (holed: boolean) => string;
  addMissDetails: (clientId: string, details: { missSide?: MissSide; missLengthM?: number }) => void;
  skipMissDetails: (clientId: string) => void;
  undo: () => Promise<void>;
};

type Queued = { putt: QueuedLadderPutt; status: "pending" | "error" | "other"; failed: boolean; error: Error | null };

function queued(m: Mutation<unknown, Error, unknown, unknown>): Queued {
  const status = m.state.status === "pending" || m.state.status === "error" ? m.state.status : "other";
  return { putt: m.state.variables as QueuedLadderPutt, status, failed: m.state.failureCount > 0, error: m.state.error };
}

/**
 * Runs a ladder assignment putt by putt: instant feedback from the shared engine, saving through the outbox.
 * A miss is held here for its optional details until they are given or skipped, the next putt is played, the page
 * is hidden or left; then it joins the outbox.
 */
export function useLadderRun(assignmentId: string): LadderRun {
  const client = useQueryClient();
  const query = useAssignment(assignmentId);
  const mine = useMutationState({
    filters: {
      mutationKey: coachingKeys.addLadderPutt(),
      predicate: (m) => (m.state.variables as QueuedLadderPutt | undefined)?.assignmentId === assignmentId,
    },
    select: queued,
  });
  const pending = mine.filter((q) => q.status === "pending");
  const failed = mine.filter((q) => q.status === "error").at(-1);

  const [openMiss, setOpenMiss] = useState<string | null>(null);
  const [undoError, setUndoError] = useState<string | null>(null);
  // The handlers below run after a render may have changed it (page hidden, unmount).
  const openMissRef = useRef<string | null>(null);
  const holdMiss = (clientId: string | null) => {
    openMissRef.current = clientId;
    setOpenMiss(clientId);
  };

  const send = useCallback(
    (clientId: string, holed: boolean, details: { missSide?: MissSide; missLengthM?: number } = {}) => {
      queueLadderPutt(client, {
        assignmentId,
        clientId,
        holed,
        ...(details.missSide ? { missSide: details.missSide } : {}),
        ...(details.missLengthM !== undefined ? { missLengthM: details.missLengthM } : {}),
      });
    },
    [client, assignmentId],
  );

  /** The open miss goes without details. */
  const sendOpenMiss = useCallback(() => {
    const clientId = openMissRef.current;
    if (!clientId) return;
    openMissRef.current = null;
    setOpenMiss(null);
    send(clientId, false);
  }, [send]);

  // A phone put away (or a page left) with a miss still open for details: the putt goes without them.
  useEffect(() => {
    const hidden = () => {
      if (document.visibilityState === "hidden") sendOpenMiss();
    };
    document.addEventListener("visibilitychange", hidden);
    window.addEventListener("pagehide", sendOpenMiss);
    return () => {
      document.removeEventListener("visibilitychange", hidden);
      window.removeEventListener("pagehide", sendOpenMiss);
      sendOpenMiss();
    };
  }, [sendOpenMiss]);

  const assignment = query.data ?? null;
  // A few steps of the pure engine: cheap enough for every render.
  const played = [...pending.map((q) => q.putt.holed), ...(openMiss ? [false] : [])];
  const progress = assignment ? played.reduce((state, holed) => step(assignment.ladder, state, holed), assignment.progress) : null;

  const clearErrors = () => {
    setUndoError(null);
    dismissLadderPuttErrors(client, assignmentId);
  };

  return {
    query,
    assignment,
    progress,
    pendingCount: pending.length + (openMiss ? 1 : 0),
    openMiss,
    waiting: pending.some((q) => q.failed),
    error: undoError ?? (failed?.error ? (isApiError(failed.error) ? failed.error.message : "A putt could not be saved.") : null),
    play: (holed) => {
      clearErrors();
      // A new putt closes any miss still open for details.
      sendOpenMiss();
      const clientId = crypto.randomUUID();
      if (holed) send(clientId, true);
      else holdMiss(clientId);
      return clientId;
    },
    addMissDetails: (clientId, details) => {
      if (openMissRef.current !== clientId) return;
      holdMiss(null);
      send(clientId, false, details);
    },
    skipMissDetails: (clientId) => {
      if (openMissRef.current === clientId) sendOpenMiss();
    },
    /** Takes back the latest putt: one not sent yet leaves the queue, else the server removes it. */
    undo: async () => {
      clearErrors();
      if (openMissRef.current) {
        holdMiss(null);
        return;
      }
      const local = takeBackLadderPutt(client, assignmentId);
      if (local.outcome === "taken back") return;
      // The putt on its way is let through first: then the server has it, and takes it back.
      if (local.outcome === "on its way" && !(await local.settled)) return;
      try {
        client.setQueryData(coachingKeys.assignment(assignmentId), await undoLadderPutt(assignmentId));
      } catch (error) {
        if (isApiError(error) && error.status === 404) return;
        setUndoError(isApiError(error) ? error.message : "Could not take the putt back.");
      }
    },
  };
}
