import { useEffect, useRef, useState } from "react";
import type { Dispersion } from "#shared/schemas/make-probability";
import type { ReadRequest } from "#shared/schemas/reads";
import type { LiveOdds, LiveOddsRequest } from "../utils/live-odds";

/**
 * While `read` is non-null (the dial is being dragged), simulates it in a Web Worker and answers the latest result.
 * One run at a time: positions that arrive while the worker is busy are coalesced into the newest one. The worker is
 * created on the first drag and ended with the page. Without Worker support (or a dispersion) it answers null and the
 * panel waits for the API.
 */
export function useLiveOdds(read: ReadRequest | null, dispersion: Dispersion | null, seed: number): LiveOdds | null {
  const worker = useRef<Worker | null>(null);
  const busy = useRef(false);
  const pending = useRef<LiveOddsRequest | null>(null);
  const latestId = useRef(0);
  const [answer, setAnswer] = useState<LiveOdds | null>(null);

  useEffect(
    () => () => {
      worker.current?.terminate();
      worker.current = null;
    },
    [],
  );

  useEffect(() => {
    if (!read || !dispersion || typeof Worker === "undefined") {
      pending.current = null;
      return;
    }
    if (!worker.current) {
      try {
        const w = new Worker(new URL("../utils/odds.worker.ts", import.meta.url), { type: "module" });
        w.onmessage = (event: MessageEvent<LiveOdds>) => {
          busy.current = false;
          const next = pending.current;
          pending.current = null;
          if (next) {
            busy.current = true;
            w.postMessage(next);
          }
          // Answers come back in order; one a frame behind the finger is still the right picture while dragging.
          setAnswer(event.data);
        };
        w.onerror = () => {
          // A worker that fails to start (a strict policy, an old browser) just means no live preview.
          busy.current = false;
          w.terminate();
          if (worker.current === w) worker.current = null;
        };
        worker.current = w;
      } catch {
        return;
      }
    }
    const message: LiveOddsRequest = { id: ++latestId.current, read, dispersion, seed };
    if (busy.current) {
      pending.current = message;
    } else {
      busy.current = true;
      worker.current.postMessage(message);
    }
  }, [read, dispersion, seed]);

  return read ? answer : null;
}
