// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { cleanup, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useLocation } from "react-router";
import { renderRoute } from "../../../testing/render";
import { http, HttpResponse, meAnswer, network, type JsonBodyType } from "../../../testing/network";
import { ReadPage } from "./read-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

const me = {
  user: { id: "u1", name: "Leena Park", email: "leena@example.test", role: "player", emailVerified: true },
  preferences: { units: "metric" },
};
const result = {
  launchSpeedMps: 1.9,
  startLineDeg: -5,
  aimOffsetM: -0.27,
  entrySpeedMps: 0.67,
  rollPastM: 0.45,
  flatPuttLengthM: 2.95,
  aimGiven: "offset",
  aimNote: null,
  breaks: "left-to-right",
  capture: { holed: true, outcome: "holed", maxCaptureSpeedMps: 1.64, marginMps: 0.97 },
  model: { name: "m", v0Mps: 1.83, rollingDecelMps2: 0.55, gravityDecelMps2: 0.14, maxStoppableSlopePct: 7.86 },
};

type Saved = {
  id: string;
  label: string | null;
  greenId: string | null;
  greenName: string | null;
  input: unknown;
  result: unknown;
  createdAt: string;
};
let saved: Saved[] = [];
let posted: unknown[] = [];
let greensAnswer: { status: number; body: unknown } = { status: 404, body: { error: { code: "NOT_FOUND", message: "Not found" } } };

beforeEach(() => {
  saved = [
    {
      id: "11111111-1111-4111-8111-111111111111",
      label: "9th, back pin",
      greenId: null,
      greenName: null,
      input: { distanceM: 5, slopePct: 1.5, fallLineDeg: 270, stimpFt: 9.5, pace: { rollPastM: 0.3 } },
      result,
      createdAt: "2025-05-01T10:00:00.000Z",
    },
  ];
  posted = [];
  greensAnswer = { status: 404, body: { error: { code: "NOT_FOUND", message: "Not found" } } };
  window.localStorage.clear();
  network.use(
    meAnswer(me),
    http.post("/api/reads/solve", () =>
      HttpResponse.json({
        ...result,
        path: [
          [0, 0],
          [0, 3],
        ],
      }),
    ),
    http.get("/api/greens", () => HttpResponse.json(greensAnswer.body as JsonBodyType, { status: greensAnswer.status })),
    http.get("/api/reads", () => HttpResponse.json({ items: saved })),
    http.post("/api/reads", async ({ request }) => {
      const body = (await request.json()) as { read: unknown; label?: string; greenId?: string };
      posted.push(body);
      const row = {
        id: "22222222-2222-4222-8222-222222222222",
        label: body.label ?? null,
        greenId: body.greenId ?? null,
        greenName: body.greenId ? "Top green" : null,
        input: body.read,
        result,
        createdAt: "2025-05-02T10:00:00.000Z",
      };
      saved = [row, ...saved];
      return HttpResponse.json(row as JsonBodyType, { status: 201 });
    }),
    http.delete("/api/reads/:id", ({ params }) => {
      saved = saved.filter((s) => s.id !== params.id);
      return new HttpResponse(null, { status: 204 });
    }),
  );
});
afterEach(() => {
  cleanup();
});

function Where() {
  return <output data-testid="where">{useLocation().search}</output>;
}

function renderPage() {
  return renderRoute(
    <>
      <ReadPage />
      <Where />
    </>,
    { at: "/read?d=3&s=2&f=90&st=10&rp=0.45" },
  );
}

test("a signed-in player sees lengths in their account's units, saves a read without a green when they have none", async () => {
  const user = userEvent.setup();
  renderPage();
  expect(await screen.findByLabelText("Distance (m)")).toHaveValue("3");
  expect(await screen.findByText(/Saved without a green/)).toBeInTheDocument();
  await user.type(screen.getByLabelText("Label (optional)"), "  Practice green, left of the flag ");
  await user.click(screen.getByRole("button", { name: "Save this read" }));
  expect(await screen.findByText("Saved. It is in your list below.")).toBeInTheDocument();
  expect(posted).toEqual([
    {
      read: { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } },
      label: "Practice green, left of the flag",
    },
  ]);
  const list = await screen.findByRole("region", { name: "Saved reads" });
  expect(await within(list).findByText("Practice green, left of the flag")).toBeInTheDocument();
});

test("with greens saved, the read can be saved to one of them", async () => {
  greensAnswer = { status: 200, body: { items: [{ id: "33333333-3333-4333-8333-333333333333", name: "Top green", currentStimpFt: 9.5 }] } };
  const user = userEvent.setup();
  renderPage();
  const green = await screen.findByLabelText("Green (optional)");
  await user.selectOptions(green, "Top green (Stimp 9.5)");
  await user.click(screen.getByRole("button", { name: "Save this read" }));
  await waitFor(() => expect(posted).toEqual([expect.objectContaining({ greenId: "33333333-3333-4333-8333-333333333333" })]));
});

test("a saved read opens into the form through its link, and can be deleted after a confirmation", async () => {
  const user = userEvent.setup();
  const { router } = renderPage();
  const list = await screen.findByRole("region", { name: "Saved reads" });
  const open = await within(list).findByRole("link", { name: "Open 9th, back pin" });
  expect(open).toHaveAttribute("href", "/read?d=5&s=1.5&f=270&st=9.5&rp=0.3");
  expect(within(list).getByText("5.00 m, 1.5 % falls to the left, Stimp 9.5")).toBeInTheDocument();

  await user.click(open);
  await waitFor(() => expect(router.state.location.search).toBe("?d=5&s=1.5&f=270&st=9.5&rp=0.3"));
  expect(await screen.findByLabelText("Distance (m)")).toHaveValue("5");
  expect(screen.getByLabelText("Past the hole (cm)")).toHaveValue("30");
  expect(screen.getByRole("slider", { name: "Which way the green falls" })).toHaveAttribute("aria-valuenow", "270");

  await user.click(within(list).getByRole("button", { name: "Delete 9th, back pin" }));
  await user.click(within(list).getByRole("button", { name: "Yes, delete 9th, back pin" }));
  expect(await within(list).findByText("No saved reads yet")).toBeInTheDocument();
});
