// @vitest-environment jsdom
// One offline queue (issue 16): practice putts and ladder putts wait in the same localStorage entry, a fresh page
// (a reload) restores both, and each reaches the server once.
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { onlineManager, QueryClient } from "@tanstack/react-query";
import { OUTBOX_STORAGE_KEY } from "../lib/outbox";
import { http, HttpResponse, network } from "../testing/network";
import { pendingLadderPutts, queueLadderPutt, takeBackLadderPutt } from "../features/coaching/api/add-ladder-putt";
import { coachingKeys } from "../features/coaching/api/keys";
import { practiceKeys } from "../features/practice/api/keys";
import { startOutbox } from "./outbox";

const SESSION = "11111111-1111-4111-8111-111111111111";
const ASSIGNMENT = "aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa";
const OTHER = "bbbbbbbb-bbbb-4bbb-8bbb-bbbbbbbbbbbb";

type Stored = { mutations: { mutationKey: unknown[]; state: { variables: { clientId: string } } }[] } | null;
const stored = () => JSON.parse(window.localStorage.getItem(OUTBOX_STORAGE_KEY) ?? "null") as Stored;
const keptIds = () => (stored()?.mutations ?? []).map((m) => m.state.variables.clientId);

/** A page: a query client with the outbox started as the provider starts it. */
const pages: { client: QueryClient; stop: () => void }[] = [];
function page() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  // No wait between tries: a failed try pauses at once while offline.
  const stop = startOutbox(client, { retryDelay: () => 0 });
  pages.push({ client, stop });
  return client;
}

function logPractice(client: QueryClient, clientId: string) {
  const m = client.getMutationCache().build(client, { mutationKey: practiceKeys.addPutt(), scope: { id: `putts:${SESSION}` } });
  void m.execute({ sessionId: SESSION, clientId, distanceM: 1.5, holed: true, loggedAt: new Date().toISOString() }).catch(() => undefined);
}

/** The server: what reached it, by route; answers every write as stored. */
function server() {
  const practice: string[] = [];
  const ladder: { assignment: string; clientId: string; holed: boolean }[] = [];
  network.use(
    http.post(`/api/sessions/${SESSION}/putts`, async ({ request }) => {
      practice.push(((await request.json()) as { clientId: string }).clientId);
      return HttpResponse.json({ id: `p-${practice.length}` }, { status: 201 });
    }),
    http.post("/api/assignments/:id/putts", async ({ request, params }) => {
      const body = (await request.json()) as { clientId: string; holed: boolean };
      ladder.push({ assignment: String(params.id), clientId: body.clientId, holed: body.holed });
      return HttpResponse.json({ id: params.id, putts: [] }, { status: 201 });
    }),
  );
  return { practice, ladder };
}

beforeEach(() => {
  window.localStorage.clear();
});
afterEach(() => {
  for (const p of pages.splice(0)) {
    p.stop();
    p.client.clear();
  }
  onlineManager.setOnline(true);
});

test("practice and ladder putts logged offline wait in one entry, and a reloaded page sends each once", async () => {
  network.use(http.post("*", () => HttpResponse.error()));
  onlineManager.setOnline(false);
  const first = page();
  logPractice(first, "practice-1");
  queueLadderPutt(first, { assignmentId: ASSIGNMENT, clientId: "ladder-1", holed: true });
  logPractice(first, "practice-2");
  queueLadderPutt(first, { assignmentId: ASSIGNMENT, clientId: "ladder-2", holed: false, missSide: "left" });
  await vi.waitFor(() => expect(keptIds()).toEqual(["practice-1", "ladder-1", "practice-2", "ladder-2"]));
  expect(stored()!.mutations.map((m) => m.mutationKey)).toEqual([
    practiceKeys.addPutt(),
    coachingKeys.addLadderPutt(),
    practiceKeys.addPutt(),
    coachingKeys.addLadderPutt(),
  ]);
  await vi.waitFor(() =>
    expect(
      first
        .getMutationCache()
        .getAll()
        .every((m) => m.state.isPaused),
    ).toBe(true),
  );

  // Reload: the stored queue comes back; online, both kinds go out, in the order played, once each.
  network.resetHandlers();
  const reached = server();
  const second = page();
  expect(second.getMutationCache().findAll({ status: "pending" })).toHaveLength(4);
  onlineManager.setOnline(true);
  await second.resumePausedMutations();
  await vi.waitFor(() => expect(stored()).toBeNull());
  expect(reached.practice).toEqual(["practice-1", "practice-2"]);
  expect(reached.ladder).toEqual([
    { assignment: ASSIGNMENT, clientId: "ladder-1", holed: true },
    { assignment: ASSIGNMENT, clientId: "ladder-2", holed: false },
  ]);
});

test("a ladder putt not yet sent can be taken back: it leaves the queue and storage, and never reaches the server", async () => {
  network.use(http.post("*", () => HttpResponse.error()));
  onlineManager.setOnline(false);
  const client = page();
  queueLadderPutt(client, { assignmentId: ASSIGNMENT, clientId: "ladder-1", holed: true });
  queueLadderPutt(client, { assignmentId: ASSIGNMENT, clientId: "ladder-2", holed: true });
  queueLadderPutt(client, { assignmentId: OTHER, clientId: "other-1", holed: true });
  await vi.waitFor(() => expect(keptIds()).toHaveLength(3));

  expect(takeBackLadderPutt(client, ASSIGNMENT).outcome).toBe("taken back");
  expect(keptIds()).toEqual(["ladder-1", "other-1"]);
  expect(pendingLadderPutts(client, ASSIGNMENT).map((m) => (m.state.variables as { clientId: string }).clientId)).toEqual(["ladder-1"]);

  network.resetHandlers();
  const reached = server();
  onlineManager.setOnline(true);
  await client.resumePausedMutations();
  await vi.waitFor(() => expect(stored()).toBeNull());
  expect(reached.ladder.map((p) => p.clientId).sort()).toEqual(["ladder-1", "other-1"]);
});

test("a 409 (the ladder was completed elsewhere) drops that assignment's waiting putts and keeps the server's message", async () => {
  const sent: string[] = [];
  network.use(
    http.post(`/api/assignments/${ASSIGNMENT}/putts`, async ({ request }) => {
      sent.push(((await request.json()) as { clientId: string }).clientId);
      return HttpResponse.json({ error: { code: "conflict", message: "This ladder is already completed." } }, { status: 409 });
    }),
    http.get(`/api/assignments/${ASSIGNMENT}`, () => HttpResponse.json({ id: ASSIGNMENT })),
  );
  const client = page();
  queueLadderPutt(client, { assignmentId: ASSIGNMENT, clientId: "ladder-1", holed: true });
  queueLadderPutt(client, { assignmentId: ASSIGNMENT, clientId: "ladder-2", holed: true });
  await vi.waitFor(() => expect(client.getMutationCache().findAll({ status: "error" })).toHaveLength(1));
  expect(pendingLadderPutts(client, ASSIGNMENT)).toHaveLength(0);
  expect(sent).toEqual(["ladder-1"]);
  expect(client.getMutationCache().findAll({ status: "error" })[0]!.state.error?.message).toBe("This ladder is already completed.");
  expect(stored()).toBeNull();
});

test("ladder putts left in an earlier version's queue (one entry per assignment) join the outbox at start", async () => {
  window.localStorage.setItem(
    `borrowline.ladder-run.${ASSIGNMENT}`,
    JSON.stringify([
      { clientId: "old-1", holed: false, missSide: "right", missLengthM: -0.3, ready: false },
      { clientId: "old-2", holed: true, ready: true },
    ]),
  );
  const reached = server();
  page();
  await vi.waitFor(() => expect(reached.ladder.map((p) => p.clientId)).toEqual(["old-1", "old-2"]));
  expect(window.localStorage.getItem(`borrowline.ladder-run.${ASSIGNMENT}`)).toBeNull();
  await vi.waitFor(() => expect(stored()).toBeNull());
});
