// A Web Worker around simulateLiveOdds: one message in (a read and a dispersion), one answer out, with its id so the
// page can drop answers that a newer drag position has overtaken.
import { simulateLiveOdds, type LiveOdds, type LiveOddsRequest } from "./live-odds";

// The project compiles against the DOM library; this is the little of a worker's global scope used here.
const scope = self as unknown as {
  onmessage: ((event: MessageEvent<LiveOddsRequest>) => void) | null;
  postMessage: (answer: LiveOdds) => void;
};

scope.onmessage = (event) => {
  try {
    scope.postMessage(simulateLiveOdds(event.data));
  } catch (error) {
    scope.postMessage({ id: event.data.id, ok: false, message: error instanceof Error ? error.message : "The simulation failed." });
  }
};
