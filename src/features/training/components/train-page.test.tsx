// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { apiError, http, HttpResponse, serve, type Call } from "../../../testing/network";
import { fallLineWords } from "../../../components/green-3d/words";
import { roundPutt } from "../utils/putt-generator";
import { TrainPage } from "./train-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

let calls: Call[] = [];
let units: "imperial" | "metric" = "imperial";
let attemptAnswer: () => Response;

const me = () => ({
  user: { id: "u1", name: "Ivo Marsh", email: "ivo@example.test", role: "player", emailVerified: true },
  preferences: { units },
});

beforeEach(() => {
  calls = [];
  units = "imperial";
  attemptAnswer = () => HttpResponse.json({ id: "a1" }, { status: 201 });
  // No WebGL in jsdom: the page draws the flat diagram, as it does on a phone without WebGL.
  vi.spyOn(HTMLCanvasElement.prototype, "getContext").mockReturnValue(null);
  calls = serve(
    http.get("/api/me", () => HttpResponse.json(me())),
    http.post("/api/training/attempts", () => attemptAnswer()),
    http.get("/api/training/attempts", () => HttpResponse.json({ items: [] })),
  );
});
afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

const posts = () => calls.filter((c) => c.path === "/api/training/attempts" && c.method === "POST");

test("the By eye level hides the slope and fall line until the reveal, then names them", async () => {
  const putt = roundPutt("by-eye", 123, 0);
  renderRoute(<TrainPage />, { at: "/train?level=by-eye&seed=123&n=0" });
  await screen.findByText(/Read the slope from the green itself/);
  const page = () => document.body.textContent ?? "";
  expect(screen.getByText("Stimp")).toBeInTheDocument();
  expect(screen.queryByText("Slope")).not.toBeInTheDocument();
  expect(screen.queryByText("Fall line")).not.toBeInTheDocument();
  expect(page()).not.toContain(`${putt.slopePct} %`);
  expect(page()).not.toContain(fallLineWords(putt.fallLineDeg));
  // The canvas's spoken label does not give it away either.
  expect(screen.getByRole("img").getAttribute("aria-label") ?? "").not.toContain(fallLineWords(putt.fallLineDeg));

  await userEvent.click(screen.getByRole("button", { name: "Reveal the line" }));
  await screen.findByText("Slope");
  expect(page()).toContain(`${putt.slopePct} %`);
  expect(page()).toContain(fallLineWords(putt.fallLineDeg));
});

test("after the reveal a putt can be read again, but that read is not scored or sent to be kept", async () => {
  renderRoute(<TrainPage />, { at: "/train?level=club&seed=77&n=2" });
  await userEvent.click(await screen.findByRole("button", { name: "Reveal the line" }));
  await screen.findByLabelText(/^Score \d+ out of 100$/);
  await waitFor(() => expect(posts()).toHaveLength(1));

  await userEvent.click(screen.getByRole("button", { name: /Read it again/ }));
  await userEvent.click(screen.getByRole("button", { name: "Reveal the line (not scored)" }));
  await screen.findByText("Practice read · not scored");
  expect(screen.queryByLabelText(/^Score \d+ out of 100$/)).not.toBeInTheDocument();
  expect(screen.getByText(/is practice: it is not scored or kept/)).toBeInTheDocument();
  // Give a stray request the chance to go out before counting.
  await new Promise((r) => setTimeout(r, 50));
  expect(posts()).toHaveLength(1);
});

test("a putt the server says was scored before (409) is shown as practice, without a score", async () => {
  attemptAnswer = () => apiError(409, "conflict", "already scored", { details: { reason: "already-scored", attemptId: "a0" } });
  renderRoute(<TrainPage />, { at: "/train?level=club&seed=77&n=2" });
  await userEvent.click(await screen.findByRole("button", { name: "Reveal the line" }));
  await screen.findByText(/You were scored on this putt before/);
  expect(screen.getByText("Practice read · not scored")).toBeInTheDocument();
  expect(screen.queryByLabelText(/^Score \d+ out of 100$/)).not.toBeInTheDocument();
});

test.each([
  ["imperial", ["3–13 ft putts", "7–26 ft putts", "10–39 ft putts"], / m putts/],
  ["metric", ["1–4 m putts", "2–8 m putts", "3–12 m putts"], / ft putts/],
] as const)("level descriptions are in the user's units (%s)", async (u, shown, absent) => {
  units = u;
  renderRoute(<TrainPage />, { at: "/train?level=club&seed=5&n=0" });
  // 1–4 m is 3.3–13.1 ft, 2–8 m is 6.6–26.2 ft, 3–12 m is 9.8–39.4 ft (0.3048 m to the foot), to the whole foot.
  for (const words of shown) expect((await screen.findAllByText(new RegExp(words))).length).toBeGreaterThan(0);
  expect(document.body.textContent).not.toMatch(absent);
});
