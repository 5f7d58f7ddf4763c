// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { http, HttpResponse, meAnswer, serve, type Call } from "../../../testing/network";
import { GreenPage } from "./green-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

const GREEN_ID = "6c9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f";
const SQUAD_ID = "7d9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f";
const reading = {
  id: "8e9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f",
  measuredOn: "2026-05-01",
  stimpFt: 10.5,
  upFt: null,
  downFt: null,
  note: null,
};
const base = {
  id: GREEN_ID,
  name: "Top green",
  locationNote: null,
  currentStimpFt: 10.5,
  createdAt: "2026-01-01T00:00:00Z",
  readings: [reading],
};
const me = {
  user: { id: "u1", name: "Coach Ash", email: "ash@example.com", role: "coach", emailVerified: true },
  preferences: { units: "metric" },
};

let calls: Call[] = [];

function stubApi(green: object) {
  let current = green;
  calls = serve(
    meAnswer(me),
    http.get("/api/squads", () => HttpResponse.json({ squads: [{ id: SQUAD_ID, name: "Juniors" }] })),
    http.put(`/api/greens/${GREEN_ID}/squad`, async ({ request }) => {
      const { squadId } = (await request.json()) as { squadId: string | null };
      current = { ...current, squad: squadId ? { id: squadId, name: "Juniors" } : null };
      return HttpResponse.json(current);
    }),
    http.get(`/api/greens/${GREEN_ID}`, () => HttpResponse.json(current)),
    http.get("/api/greens", () => HttpResponse.json({ items: [current] })),
  );
}

afterEach(() => {
  cleanup();
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
  await waitFor(() =>
    expect(calls.filter((c) => c.method === "PUT")).toMatchObject([
      { path: `/api/greens/${GREEN_ID}/squad`, method: "PUT", body: { squadId: SQUAD_ID } },
    ]),
  );
  expect(await screen.findByText(/Shared with Juniors: its players see this green/)).toBeInTheDocument();
  await user.selectOptions(screen.getByRole("combobox", { name: "Shared with" }), "Nobody (only me)");
  await user.click(screen.getByRole("button", { name: "Stop sharing" }));
  await waitFor(() => expect(calls.filter((c) => c.method === "PUT").at(-1)?.body).toEqual({ squadId: null }));
  expect(await screen.findByText(/Only you see this green/)).toBeInTheDocument();
});

test("a Stimp reading is read as a golfer types it: 10,5 is 10.5; 1e1 and 0x0A are not numbers", async () => {
  stubApi({ ...base, squad: null, ownerName: "Coach Ash", mine: true });
  const user = userEvent.setup();
  renderRoute(<GreenPage greenId={GREEN_ID} />, { at: "/greens/g" });
  const field = await screen.findByLabelText("Stimp (ft)");
  const save = screen.getByRole("button", { name: "Save the reading" });
  for (const typed of ["1e1", "0x0A"]) {
    await user.clear(field);
    await user.type(field, typed);
    expect(save).toBeDisabled();
    expect(field).toHaveAccessibleDescription(/Between 3 and 16 ft/);
  }
  await user.clear(field);
  await user.type(field, "10,5");
  expect(save).toBeEnabled();
});
