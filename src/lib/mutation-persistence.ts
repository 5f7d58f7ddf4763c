// Keeps chosen unfinished mutations (a putt logged on the green) in localStorage, so a reload or a dropped
// connection loses nothing. Built on TanStack Query's own dehydrate/hydrate, the same calls its
// persist-client packages make; see DEVELOPERS.md "Decisions" for why those packages are not installed.
import { dehydrate, hydrate, matchMutation, type Mutation, type MutationKey, type QueryClient } from "@tanstack/react-query";

export type MutationPersistenceOptions = {
  /** localStorage key for the queue. */
  storageKey: string;
  /** Only mutations under these keys are kept (their mutationFn must be registered with setMutationDefaults). */
  mutationKeys: ReadonlyArray<MutationKey>;
  storage?: Pick<Storage, "getItem" | "setItem" | "removeItem">;
};

type Stored = { version: 1; mutations: ReturnType<typeof dehydrate>["mutations"] };

const restored = new WeakSet<QueryClient>();

function safeStorage(options: MutationPersistenceOptions) {
  try {
    return options.storage ?? window.localStorage;
  } catch {
    return null;
  }
}

function kept(mutation: Mutation<unknown, Error, unknown, unknown>, keys: ReadonlyArray<MutationKey>): boolean {
  return mutation.state.status === "pending" && keys.some((mutationKey) => matchMutation({ mutationKey }, mutation));
}

/** Writes the pending mutations we keep; removes the entry when there are none. */
export function saveMutations(client: QueryClient, options: MutationPersistenceOptions): void {
  const storage = safeStorage(options);
  if (!storage) return;
  const { mutations } = dehydrate(client, {
    shouldDehydrateMutation: (m) => kept(m, options.mutationKeys),
    shouldDehydrateQuery: () => false,
  });
  try {
    if (mutations.length === 0) storage.removeItem(options.storageKey);
    else storage.setItem(options.storageKey, JSON.stringify({ version: 1, mutations } satisfies Stored));
  } catch {
    // Storage full or refused: the queue still lives in memory for this page.
  }
}

/**
 * Puts the stored queue back into the mutation cache (once per client) and resumes it. A mutation that was
 * in flight when the page went away is resumed too: it may have reached the server, so its variables must make
 * a repeat harmless (an idempotency key such as a putt's clientId). Returns how many were restored.
 */
export function restoreMutations(client: QueryClient, options: MutationPersistenceOptions): number {
  if (restored.has(client)) return 0;
  restored.add(client);
  const storage = safeStorage(options);
  if (!storage) return 0;
  let stored: Stored | null = null;
  try {
    const raw = storage.getItem(options.storageKey);
    stored = raw ? (JSON.parse(raw) as Stored) : null;
  } catch {
    stored = null;
  }
  if (!stored || stored.version !== 1 || !Array.isArray(stored.mutations)) return 0;
  // Marked paused, so resumePausedMutations picks them up; a restored pending mutation skips onMutate.
  const mutations = stored.mutations.map((m) => ({ ...m, state: { ...m.state, isPaused: true, status: "pending" as const } }));
  hydrate(client, { mutations, queries: [] });
  void client.resumePausedMutations();
  return mutations.length;
}

/** Restores the queue, then keeps localStorage in step with the mutation cache. Returns the unsubscribe. */
export function persistMutations(client: QueryClient, options: MutationPersistenceOptions): () => void {
  restoreMutations(client, options);
  saveMutations(client, options);
  return client.getMutationCache().subscribe((event) => {
    if (event.type === "added" || event.type === "removed" || event.type === "updated") saveMutations(client, options);
  });
}
