// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test } from "vitest";
import { cleanup, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { QueryClient } from "@tanstack/react-query";
import type { Putt } from "#shared/schemas/putts";
import { METRES_PER_FOOT } from "#shared/units";
import { createTestQueryClient, renderRoute } from "../../../testing/render";
import { delay, http, HttpResponse, meAnswer, network, type JsonBodyType } from "../../../testing/network";
import { registerPuttMutations } from "../api/add-putt";
import type { SessionPutts } from "../api/get-session-putts";
import { practiceKeys } from "../api/keys";
import { SessionLogPage } from "./session-log-page";

const SESSION = "11111111-1111-4111-8111-111111111111";
const me = {
  user: { id: "u1", name: "Ivo Marsh", email: "ivo@example.test", role: "player", emailVerified: true },
  preferences: { units: "imperial" },
};
const session = {
  id: SESSION,
  playerId: "u1",
  date: "2024-05-01",
  greenId: null,
  greenName: "Top green",
  stimpFt: 9.5,
  conditions: null,
  tags: [],
  notes: null,
  putts: 0,
  holed: 0,
  makeRate: null,
};

type PostAnswer = "store" | "hang" | { status: number; body: unknown };

/** A small stand-in for the API: stores putts, answers POSTs as the test says. */
function fakeServer(post: PostAnswer, options: { refetchHangs?: boolean; deleteHangs?: boolean } = {}) {
  let listed = 0;
  const stored: Putt[] = [];
  const posts: Record<string, unknown>[] = [];
  const deletes: string[] = [];
  let n = 0;
  network.use(
    meAnswer(me),
    http.get(`/api/sessions/${SESSION}`, () => HttpResponse.json(session)),
    http.get(`/api/sessions/${SESSION}/putts`, async () => {
      if (options.refetchHangs && listed++ > 0) await delay("infinite");
      return HttpResponse.json({ items: stored });
    }),
    http.post(`/api/sessions/${SESSION}/putts`, async ({ request }) => {
      const body = (await request.json()) as Record<string, unknown>;
      posts.push(body);
      if (post === "hang") await delay("infinite");
      if (post !== "store" && post !== "hang") return HttpResponse.json(post.body as JsonBodyType, { status: post.status });
      const id = `p${++n}`;
      stored.push({
        id,
        sessionId: SESSION,
        date: session.date,
        distanceM: body.distanceM as number,
        holed: body.holed as boolean,
        missSide: (body.missSide as Putt["missSide"]) ?? null,
        missLengthM: (body.missLengthM as number | null) ?? null,
        breakType: (body.breakType as Putt["breakType"]) ?? null,
        clientId: body.clientId as string,
        createdAt: new Date(Date.now() + n).toISOString(),
      });
      return HttpResponse.json({ id }, { status: 201 });
    }),
    http.delete("/api/putts/:id", async ({ params }) => {
      const id = String(params.id);
      deletes.push(id);
      if (options.deleteHangs) await delay("infinite");
      const i = stored.findIndex((p) => p.id === id);
      if (i >= 0) stored.splice(i, 1);
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return { stored, posts, deletes };
}

let client: QueryClient;
beforeEach(() => {
  window.localStorage.clear();
  client = createTestQueryClient();
  registerPuttMutations(client, { retryDelay: () => 0 });
});
afterEach(() => {
  cleanup();
});

function renderPage() {
  return renderRoute(<SessionLogPage sessionId={SESSION} />, { at: `/practice/${SESSION}`, queryClient: client });
}

const list = () => screen.getByRole("list", { name: "Putts, newest first" });
const tallyValue = (name: string) => within(screen.getByLabelText("This session so far")).getByText(name).nextElementSibling?.textContent;

test("a putt is shown at once, before the server answers", async () => {
  const server = fakeServer("hang");
  const user = userEvent.setup();
  renderPage();
  await screen.findByRole("heading", { name: /^Wed,? (1 May|May 1),? 2024$/ });
  await waitFor(() => expect(screen.getByText(/No putts yet/)).toBeInTheDocument());

  await user.click(screen.getByRole("button", { name: "Holed" }));

  const row = within(list()).getByRole("listitem");
  expect(row).toHaveTextContent("6 ft · Holed");
  expect(row).toHaveTextContent("saving…");
  expect(tallyValue("Putts")).toBe("1");
  expect(tallyValue("Make rate")).toBe("100 %");
  // The request went out with an idempotency key, and the server has not answered.
  await waitFor(() => expect(server.posts).toHaveLength(1));
  expect(server.posts[0]).toMatchObject({ holed: true, clientId: expect.stringMatching(/^[0-9a-f-]{36}$/) });
  expect(server.stored).toHaveLength(0);
  // The optimistic update wrote the putt into the session's cached list (onMutate).
  expect(client.getQueryData<SessionPutts>(practiceKeys.sessionPutts(SESSION))?.items).toEqual([
    expect.objectContaining({ id: expect.stringMatching(/^pending:/), holed: true, clientId: server.posts[0]!.clientId }),
  ]);
});

test("a server failure rolls the putt back and says so", async () => {
  // The list's refetch after the failure never answers, so only the rollback can take the putt off.
  const server = fakeServer(
    { status: 500, body: { error: { code: "INTERNAL", message: "The server had a problem. Please try again." } } },
    { refetchHangs: true },
  );
  const user = userEvent.setup();
  renderPage();
  await waitFor(() => expect(screen.getByText(/No putts yet/)).toBeInTheDocument());

  await user.click(screen.getByRole("button", { name: "Missed" }));
  expect(within(list()).getAllByRole("listitem")).toHaveLength(1);
  expect(client.getQueryData<SessionPutts>(practiceKeys.sessionPutts(SESSION))?.items).toHaveLength(1);

  const alert = await screen.findByRole("alert");
  expect(alert).toHaveTextContent("A putt was not saved");
  expect(alert).toHaveTextContent("The 6 ft putt was taken off the list: The server had a problem.");
  expect(within(list()).queryAllByRole("listitem")).toHaveLength(0);
  expect(tallyValue("Putts")).toBe("0");
  // Rolled back in the cache too (onError), not only hidden.
  expect(client.getQueryData<SessionPutts>(practiceKeys.sessionPutts(SESSION))?.items).toEqual([]);
  // A server fault is worth retrying before giving up, with the same clientId each time.
  expect(server.posts.length).toBeGreaterThan(1);
  expect(new Set(server.posts.map((p) => p.clientId)).size).toBe(1);
});

test("undo removes the last putt, on screen and on the server", async () => {
  const server = fakeServer("store");
  const user = userEvent.setup();
  renderPage();
  await waitFor(() => expect(screen.getByText(/No putts yet/)).toBeInTheDocument());

  await user.click(screen.getByRole("button", { name: "Holed" }));
  await user.click(screen.getByRole("button", { name: "Right" }));
  await user.click(screen.getByRole("button", { name: "Missed right" }));
  await waitFor(() => expect(server.stored).toHaveLength(2));
  await waitFor(() => expect(within(list()).getAllByRole("listitem")).toHaveLength(2));
  await waitFor(() => expect(within(list()).queryByText("saving…")).not.toBeInTheDocument());

  await user.click(screen.getByRole("button", { name: "Undo last putt" }));

  await waitFor(() => expect(within(list()).getAllByRole("listitem")).toHaveLength(1));
  expect(within(list()).getByRole("listitem")).toHaveTextContent("6 ft · Holed");
  expect(server.deletes).toEqual(["p2"]);
  await waitFor(() => expect(server.stored.map((p) => p.id)).toEqual(["p1"]));
  expect(tallyValue("Putts")).toBe("1");
});

test("while an undo is saving, Undo keeps the focus and ignores more presses", async () => {
  const server = fakeServer("store", { deleteHangs: true });
  const user = userEvent.setup();
  renderPage();
  await waitFor(() => expect(screen.getByText(/No putts yet/)).toBeInTheDocument());
  await user.click(screen.getByRole("button", { name: "Holed" }));
  await user.click(screen.getByRole("button", { name: "Holed" }));
  await waitFor(() => expect(server.stored).toHaveLength(2));
  await waitFor(() => expect(within(list()).queryByText("saving…")).not.toBeInTheDocument());

  const undo = screen.getByRole("button", { name: "Undo last putt" });
  undo.focus();
  await user.keyboard("{Enter}");
  await waitFor(() => expect(undo).toHaveAttribute("aria-disabled", "true"));
  // Still the same, focusable button (a `disabled` one would have dropped the focus on <body>).
  expect(undo).not.toBeDisabled();
  expect(undo).toHaveFocus();
  await user.keyboard("{Enter}");
  await user.click(undo);
  expect(server.deletes).toEqual(["p2"]);
});

test("the distance stays for the next putt, and a miss's details do not", async () => {
  const server = fakeServer("store");
  const user = userEvent.setup();
  renderPage();
  await waitFor(() => expect(screen.getByText(/No putts yet/)).toBeInTheDocument());

  await user.click(screen.getByRole("button", { name: "10" }));
  await user.click(screen.getByRole("button", { name: "Longer by 1 ft" }));
  expect(screen.getByRole("group", { name: "Distance" })).toHaveTextContent("11 ft");
  await user.click(screen.getByRole("button", { name: "Left" }));
  await user.click(screen.getByRole("button", { name: "Short" }));
  await user.click(screen.getByRole("button", { name: "12" }));
  await user.click(screen.getByRole("button", { name: /^Missed/ }));

  expect(screen.getByRole("group", { name: "Distance" })).toHaveTextContent("11 ft");
  expect(screen.getByRole("button", { name: "Left" })).toHaveAttribute("aria-pressed", "false");
  await user.click(screen.getByRole("button", { name: "Holed" }));

  await waitFor(() => expect(server.posts).toHaveLength(2));
  expect(server.posts[0]).toMatchObject({
    distanceM: expect.closeTo(11 * METRES_PER_FOOT, 9),
    holed: false,
    missSide: "left",
    missLengthM: expect.closeTo(-12 * 0.0254, 9),
  });
  expect(server.posts[1]).toMatchObject({
    distanceM: expect.closeTo(11 * METRES_PER_FOOT, 9),
    holed: true,
    missSide: null,
    missLengthM: null,
  });
  const rows = within(list()).getAllByRole("listitem");
  expect(rows[0]).toHaveTextContent("11 ft · Holed");
  expect(rows[1]).toHaveTextContent("11 ft · Missed left, 12 in short");
});
