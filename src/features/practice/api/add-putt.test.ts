// @vitest-environment jsdom
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { onlineManager, QueryClient } from "@tanstack/react-query";
import { OUTBOX_STORAGE_KEY, persistOutbox } from "../../../lib/outbox";
import { http, HttpResponse, network, serve } from "../../../testing/network";
import { registerPuttMutations, undoQueuedPutt, type NewPutt } from "./add-putt";
import { practiceKeys } from "./keys";

const SESSION = "11111111-1111-4111-8111-111111111111";
const putt = (clientId: string, holed = true): NewPutt => ({
  sessionId: SESSION,
  clientId,
  distanceM: 1.5,
  holed,
  loggedAt: new Date().toISOString(),
});

/** A page's query client with the putt defaults registered and the outbox kept in localStorage. */
function newClient() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  registerPuttMutations(client, { retryDelay: () => 0 });
  return { client, stop: persistOutbox(client, [practiceKeys.addPutt()]) };
}

const noConnection = () => serve(http.post(`/api/sessions/${SESSION}/putts`, () => HttpResponse.error()));

function run(client: QueryClient, v: NewPutt) {
  const m = client.getMutationCache().build(client, { mutationKey: practiceKeys.addPutt(), scope: { id: `putts:${v.sessionId}` } });
  return m.execute(v).catch(() => undefined);
}

const stored = () =>
  JSON.parse(window.localStorage.getItem(OUTBOX_STORAGE_KEY) ?? "null") as { mutations: { state: { variables: NewPutt } }[] } | null;

beforeEach(() => {
  window.localStorage.clear();
});
afterEach(() => {
  onlineManager.setOnline(true);
});

test("a putt logged offline waits in localStorage and a fresh page sends it, once, when the connection is back", async () => {
  const tried = noConnection();
  onlineManager.setOnline(false);
  const { client: first, stop } = newClient();
  void run(first, putt("c-1"));
  void run(first, putt("c-2", false));
  await vi.waitFor(() => expect(stored()?.mutations.map((m) => m.state.variables.clientId)).toEqual(["c-1", "c-2"]));
  // offlineFirst: the first putt was tried once and then paused; the second waits its turn behind it.
  await vi.waitFor(() => expect(tried).toHaveLength(1));
  await vi.waitFor(() =>
    expect(
      first
        .getMutationCache()
        .getAll()
        .map((m) => m.state.isPaused),
    ).toEqual([true, true]),
  );
  await new Promise((r) => setTimeout(r, 30));
  expect(tried).toHaveLength(1);
  stop();

  // "Reload": a new client restores the queue and sends it when the browser is online again.
  network.resetHandlers();
  const sent: Record<string, unknown>[] = [];
  network.use(
    http.post(`/api/sessions/${SESSION}/putts`, async ({ request }) => {
      sent.push((await request.json()) as Record<string, unknown>);
      return HttpResponse.json({ id: `id-${sent.length}` }, { status: 201 });
    }),
  );
  const { client: second, stop: stop2 } = newClient();
  expect(second.getMutationCache().findAll({ mutationKey: practiceKeys.addPutt(), status: "pending" })).toHaveLength(2);
  expect(sent).toHaveLength(0);
  onlineManager.setOnline(true);
  await second.resumePausedMutations();
  await vi.waitFor(() => expect(sent.map((b) => b.clientId)).toEqual(["c-1", "c-2"]));
  await vi.waitFor(() => expect(stored()).toBeNull());
  // The body is the API's: no session id or local timestamp in it.
  expect(sent[1]).toEqual({ clientId: "c-2", distanceM: 1.5, holed: false });
  stop2();
});

test("undoing a putt that is still waiting takes it out of the queue and out of storage", async () => {
  noConnection();
  onlineManager.setOnline(false);
  const { client, stop } = newClient();
  void run(client, putt("c-1"));
  void run(client, putt("c-2"));
  await vi.waitFor(() => expect(stored()?.mutations).toHaveLength(2));

  expect(undoQueuedPutt(client, "c-2")).toBe(true);
  expect(stored()?.mutations.map((m) => m.state.variables.clientId)).toEqual(["c-1"]);
  expect(undoQueuedPutt(client, "no-such")).toBe(false);
  stop();
});
