// The one offline queue's members (src/lib/outbox.ts): practice putts and ladder putts. Their defaults are
// registered before the stored queue is restored, so every restored write knows how to go out.
import type { QueryClient } from "@tanstack/react-query";
import { adoptOldLadderQueues, registerLadderPuttMutations } from "../features/coaching/api/add-ladder-putt";
import { coachingKeys } from "../features/coaching/api/keys";
import { registerPuttMutations } from "../features/practice/api/add-putt";
import { practiceKeys } from "../features/practice/api/keys";
import { persistOutbox } from "../lib/outbox";

export const OUTBOX_MUTATION_KEYS = [practiceKeys.addPutt(), coachingKeys.addLadderPutt()];

/** Call once per query client (the provider does); returns the unsubscribe. */
export function startOutbox(client: QueryClient, options: { retryDelay?: (attempt: number) => number } = {}): () => void {
  registerPuttMutations(client, options);
  registerLadderPuttMutations(client, options);
  const stop = persistOutbox(client, OUTBOX_MUTATION_KEYS);
  adoptOldLadderQueues(client);
  return stop;
}
