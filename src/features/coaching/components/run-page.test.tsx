// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { act, cleanup, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { replay } from "#shared/ladder-engine";
import type { AssignmentDetail, LadderSnapshot } from "#shared/schemas/assignments";
import { feetToMetres } from "#shared/units";
import type { QueryClient } from "@tanstack/react-query";
import { OUTBOX_STORAGE_KEY, persistOutbox } from "../../../lib/outbox";
import { delay, http, HttpResponse, meAnswer, network } from "../../../testing/network";
import { createTestQueryClient, renderRoute } from "../../../testing/render";
import { registerLadderPuttMutations } from "../api/add-ladder-putt";
import { coachingKeys } from "../api/keys";
import { RunPage } from "./run-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

const ID = "aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa";
const me = {
  user: { id: "p1", name: "Ivo Marsh", email: "ivo@example.test", role: "player", emailVerified: true },
  preferences: { units: "imperial" },
};
const ladder: LadderSnapshot = {
  sourceLadderId: "l1",
  name: "Short stuff",
  description: null,
  failRule: "drop-one",
  rungs: [
    { distanceM: feetToMetres(3), balls: 2, passRule: { kind: "make", made: 1 } },
    { distanceM: feetToMetres(5), balls: 3, passRule: { kind: "in-a-row", count: 2 } },
  ],
};

/** The server's side: the stored outcomes, answered as the handlers do (replayed by the same engine). */
let stored: boolean[] = [];
let posts: { holed: boolean; clientId?: string }[] = [];
let answerPost: (body: { holed: boolean; clientId?: string }) => Promise<Response> | Response;

function detail(): AssignmentDetail {
  const progress = replay(ladder, stored);
  return {
    id: ID,
    ladder,
    player: { id: "p1", name: "Ivo Marsh" },
    assignedBy: { id: "c1", name: "Dana Whitcombe" },
    squadId: null,
    sessionId: null,
    dueDate: null,
    overdue: false,
    status: progress.completed ? "completed" : stored.length ? "in-progress" : "assigned",
    createdAt: "2025-05-01T10:00:00.000Z",
    lastActivityAt: null,
    completedAt: null,
    progress,
    currentRung: progress.completed ? null : ladder.rungs[progress.rungIndex]!,
    putts: [],
  };
}

function storeAndAnswer(body: { holed: boolean }) {
  stored.push(body.holed);
  return HttpResponse.json(detail(), { status: 201 });
}

/** The ladder putts kept in the outbox on this phone (localStorage), oldest first. */
const keptOnPhone = () =>
  (
    (
      JSON.parse(window.localStorage.getItem(OUTBOX_STORAGE_KEY) ?? "null") as {
        mutations: { state: { variables: { clientId: string } } }[];
      } | null
    )?.mutations ?? []
  ).map((m) => m.state.variables.clientId);

let client: QueryClient;
let stopOutbox: () => void;

beforeEach(() => {
  stored = [];
  posts = [];
  answerPost = storeAndAnswer;
  window.localStorage.clear();
  client = createTestQueryClient();
  registerLadderPuttMutations(client, { retryDelay: () => 0 });
  stopOutbox = persistOutbox(client, [coachingKeys.addLadderPutt()]);
  network.use(
    meAnswer(me),
    http.get(`/api/assignments/${ID}`, () => HttpResponse.json(detail())),
    http.post(`/api/assignments/${ID}/putts`, async ({ request }) => {
      const body = (await request.json()) as { holed: boolean; clientId?: string };
      posts.push(body);
      return answerPost(body);
    }),
    http.delete(`/api/assignments/${ID}/putts/last`, () => {
      stored.pop();
      return HttpResponse.json(detail());
    }),
  );
});
afterEach(() => {
  cleanup();
  stopOutbox();
  client.clear();
});

function renderRun() {
  return renderRoute(<RunPage assignmentId={ID} />, {
    at: `/ladders/run/${ID}`,
    routes: [{ path: "/ladders/mine", element: <p>My ladders page</p> }],
    queryClient: client,
  });
}

const stat = (label: string) =>
  within(screen.getByRole("region", { name: "Current rung" })).getByText(label).nextElementSibling?.textContent;

test("a tap shows the new state at once, before the server has answered", async () => {
  answerPost = async () => {
    await delay("infinite");
    return HttpResponse.json(null);
  };
  const user = userEvent.setup();
  renderRun();
  expect(await screen.findByText("3 ft")).toBeInTheDocument();
  expect(stat("Balls left")).toBe("2");

  await user.click(screen.getByRole("button", { name: "Missed" }));
  expect(stat("Balls left")).toBe("1");
  expect(stat("Holed")).toBe("0");
  // The miss can take details; it already counts, and goes to the server once they are given or skipped.
  expect(screen.getByRole("region", { name: "Miss details" })).toBeInTheDocument();
  expect(screen.getByText("The miss is saved after its details")).toBeInTheDocument();
  expect(posts).toEqual([]);
  await user.click(screen.getByRole("button", { name: "Skip" }));
  expect(screen.getByText("Saving…")).toBeInTheDocument();
  expect(stat("Balls left")).toBe("1");
  await waitFor(() => expect(posts).toHaveLength(1));
});

test("passing a rung moves up with a clear message, and the server's answer agrees", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  await user.click(screen.getByRole("button", { name: "Holed" }));

  expect(screen.getByText("Rung passed — on to 5 ft")).toBeInTheDocument();
  expect(within(screen.getByRole("region", { name: "Current rung" })).getByText("Rung 2 of 2")).toBeInTheDocument();
  expect(within(screen.getByRole("region", { name: "Current rung" })).getByText("5 ft")).toBeInTheDocument();
  expect(stat("In a row")).toBe("0");
  expect(await screen.findByText("Every putt saved")).toBeInTheDocument();
  expect(posts).toEqual([{ holed: true, clientId: expect.stringMatching(/^[0-9a-f-]{36}$/) }]);
});

test("failing a rung applies the ladder's rule: drop one rung", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  await user.click(screen.getByRole("button", { name: "Holed" }));
  await user.click(screen.getByRole("button", { name: "Holed" }));
  // On rung 2 (2 in a row of 3): holed, then missed leaves one ball, too few for a run of two.
  await user.click(screen.getByRole("button", { name: "Missed" }));
  expect(screen.getByText("Missed the rung — back to 3 ft")).toBeInTheDocument();
  expect(within(screen.getByRole("region", { name: "Current rung" })).getByText("Rung 1 of 2")).toBeInTheDocument();
  // The miss waits for its details; skipping sends it.
  await user.click(screen.getByRole("button", { name: "Skip" }));
  await waitFor(() => expect(stored).toEqual([true, true, false]));
});

test("miss details go with the putt; skipping sends it without them", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  await user.click(screen.getByRole("button", { name: "Missed" }));
  await user.click(screen.getByRole("button", { name: "Left" }));
  await user.click(screen.getByRole("button", { name: "Short" }));
  await user.type(screen.getByLabelText("How far short (in)"), "12");
  await user.click(screen.getByRole("button", { name: "Save miss" }));
  await waitFor(() => expect(posts).toHaveLength(1));
  expect(posts[0]).toMatchObject({ holed: false, missSide: "left", missLengthM: -0.305 });

  await user.click(screen.getByRole("button", { name: "Missed" }));
  await user.click(screen.getByRole("button", { name: "Skip" }));
  await waitFor(() => expect(posts).toHaveLength(2));
  expect(posts[1]).toEqual({ holed: false, clientId: expect.any(String) });
});

test("a ladder miss marked long is not saved without how far: Save waits, and taking Long back saves the side only", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  await user.click(screen.getByRole("button", { name: "Missed" }));
  await user.click(screen.getByRole("button", { name: "Left" }));
  await user.click(screen.getByRole("button", { name: "Long" }));
  expect(screen.getByRole("button", { name: "Save miss" })).toBeDisabled();
  expect(screen.getByText(/Enter how far long/)).toBeInTheDocument();
  await user.type(screen.getByLabelText("How far long (in)"), "6");
  await user.click(screen.getByRole("button", { name: "Save miss" }));
  await waitFor(() => expect(posts).toHaveLength(1));
  expect(posts[0]).toMatchObject({ holed: false, missSide: "left", missLengthM: 0.152 });
});

test("without a connection the putts wait on the phone and go out, once each, when it comes back", async () => {
  let online = false;
  answerPost = (body) => (online ? storeAndAnswer(body) : HttpResponse.error());
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  // The phone loses its signal (the browser says so).
  await act(async () => {
    window.dispatchEvent(new Event("offline"));
  });
  await user.click(screen.getByRole("button", { name: "Missed" }));
  await user.click(screen.getByRole("button", { name: "Skip" }));
  expect(await screen.findByText(/No connection/)).toBeInTheDocument();
  expect(keptOnPhone()).toEqual([posts[0]!.clientId]);
  await user.click(screen.getByRole("button", { name: "Holed" }));
  expect(screen.getByText("Rung passed — on to 5 ft")).toBeInTheDocument();
  expect(keptOnPhone()).toHaveLength(2);

  online = true;
  await act(async () => {
    window.dispatchEvent(new Event("online"));
  });
  expect(await screen.findByText("Every putt saved")).toBeInTheDocument();
  expect(stored).toEqual([false, true]);
  // The first putt was tried offline and again online, with the same clientId both times.
  const ids = posts.map((p) => p.clientId);
  expect(new Set(ids).size).toBe(2);
  expect(ids[0]).toBe(ids[1]);
  expect(window.localStorage.getItem(OUTBOX_STORAGE_KEY)).toBeNull();
});

test("undo takes back the last putt", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  await user.click(screen.getByRole("button", { name: "Holed" }));
  await screen.findByText("Every putt saved");
  await user.click(screen.getByRole("button", { name: "Undo last putt" }));
  await waitFor(() => expect(within(screen.getByRole("region", { name: "Current rung" })).getByText("Rung 1 of 2")).toBeInTheDocument());
  expect(stored).toEqual([]);
  expect(stat("Balls left")).toBe("2");
});

test("the top rung passed shows the completed screen", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  for (let i = 0; i < 3; i++) await user.click(screen.getByRole("button", { name: "Holed" }));
  expect(screen.getByRole("heading", { name: "Ladder completed" })).toBeInTheDocument();
  expect(screen.getByText(/All 2 rungs passed in 3 putts, without missing a rung/)).toBeInTheDocument();
  await waitFor(() => expect(stored).toEqual([true, true, true]));
});

// Issue 18 (keyboard use): the last Holed goes with its rung; the focus fell to <body>.
test("by keyboard, the last putt puts the focus on 'Ladder completed', and Undo there hands it to the reopened rung's Undo", async () => {
  const user = userEvent.setup();
  renderRun();
  await screen.findByText("3 ft");
  for (let i = 0; i < 3; i++) {
    screen.getByRole("button", { name: "Holed" }).focus();
    await user.keyboard("{Enter}");
  }
  const heading = screen.getByRole("heading", { name: "Ladder completed" });
  await waitFor(() => expect(heading).toHaveFocus());
  await waitFor(() => expect(stored).toEqual([true, true, true]));
  screen.getByRole("button", { name: "Undo last putt (reopens the ladder)" }).focus();
  await user.keyboard("{Enter}");
  await waitFor(() => expect(screen.getByRole("button", { name: "Undo last putt" })).toHaveFocus());
  await waitFor(() => expect(stored).toEqual([true, true]));
});
