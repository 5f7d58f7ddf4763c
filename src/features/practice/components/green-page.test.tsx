// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { GreenPage } from "./green-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

const GREEN_ID = "6c9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f";
const SQUAD_ID = "7d9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f";
const reading = { id: "8e9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f", measuredOn: "2026-05-01", stimpFt: 10.5, upFt: null, downFt: null, note: null };
const base = { id: GREEN_ID, name: "Top green", locationNote: null, currentStimpFt: 10.5, createdAt: "2026-01-01T00:00:00Z", readings: [reading] };
const me = { user: { id: "u1", name: "Coach Ash", email: "ash@example.com", role: "coach", emailVerified: true }, preferences: { units: "metric" } };

type Call = { path: string; method: string; body: unknown };
let calls: Call[] = [];

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } });
}

function stubApi(green: object) {
  let current = green;
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(typeof input === "string" ? input : input instanceof URL ? input.href : input.url, "http://localhost");
      const method = init?.method ?? "GET";
      const body = init?.body ? JSON.parse(String(init.body)) : undefined;
      calls.push({ path: url.pathname, method, body });
      if (url.pathname === "/api/me") return json(200, me);
      if (url.pathname === "/api/squads") return json(200, { squads: [{ id: SQUAD_ID, name: "Juniors" }] });
      if (url.pathname === `/api/greens/${GREEN_ID}/squad` && method === "PUT") {
        const squadId = (body as { squadId: string | null }).squadId;
        current = { ...current, squad: squadId ? { id: squadId, name: "Juniors" } : null };
        return json(200, current);
      }
      if (url.pathname === `/api/greens/${GREEN_ID}`) return json(200, current);
      if (url.pathname === "/api/greens") return json(200, { items: [current] });
      return json(404, { error: { code: "not_found", message: "Not found" } });
    }),
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  calls = [];
});

test("a player on a green shared with their squad sees who keeps it, its readings, and no way to change it", async () => {
  stubApi({ ...base, squad: { id: SQUAD_ID, name: "Juniors" }, ownerName: "Coach Ash", mine: false });
  renderRoute(<GreenPage greenId={GREEN_ID} />, { at: "/greens/g" });
  expect(await screen.findByRole("heading", { name: "Top green" })).toBeInTheDocument();
  expect(screen.getByText(/Shared with Juniors by Coach Ash/)).toBeInTheDocument();
  expect(screen.getByRole("list", { name: /Stimp readings/ })).toHaveTextContent("10.5");
  expect(screen.getByRole("link", { name: "Height map and reads" })).toBeInTheDocument();
  for (const name of ["Rename", "Delete", /Delete the reading/]) expect(screen.queryByRole("button", { name })).not.toBeInTheDocument();
  expect(screen.queryByRole("heading", { name: "Add a Stimp reading" })).not.toBeInTheDocument();
  expect(screen.queryByRole("form", { name: "Share the green" })).not.toBeInTheDocument();
});

test("the coach who keeps a green shares it with a squad, then takes it back", async () => {
  stubApi({ ...base, squad: null, ownerName: "Coach Ash", mine: true });
  const user = userEvent.setup();
  renderRoute(<GreenPage greenId={GREEN_ID} canShare />, { at: "/greens/g" });
  const select = await screen.findByRole("combobox", { name: "Shared with" });
  expect(screen.getByText(/Only you see this green/)).toBeInTheDocument();
  await user.selectOptions(select, "Juniors");
  await user.click(screen.getByRole("button", { name: "Share" }));
  await waitFor(() => expect(calls.filter((c) => c.method === "PUT")).toEqual([{ path: `/api/greens/${GREEN_ID}/squad`, method: "PUT", body: { squadId: SQUAD_ID } }]));
  expect(await screen.findByText(/Shared with Juniors: its players see this green/)).toBeInTheDocument();
  await user.selectOptions(screen.getByRole("combobox", { name: "Shared with" }), "Nobody (only me)");
  await user.click(screen.getByRole("button", { name: "Stop sharing" }));
  await waitFor(() => expect(calls.filter((c) => c.method === "PUT").at(-1)?.body).toEqual({ squadId: null }));
  expect(await screen.findByText(/Only you see this green/)).toBeInTheDocument();
});
