// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { cleanup, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { apiError, http, HttpResponse, serve, type Call } from "../../../testing/network";
import { OddsPanel, type OddsPanelProps } from "./odds-panel";
import { fakeDispersion, fakeOdds } from "./test-data";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

let calls: Call[] = [];

function stubApi(odds: () => Response = () => HttpResponse.json(fakeOdds()), dispersion = fakeDispersion()) {
  calls = serve(
    http.post("/api/reads/make-probability", odds),
    http.get("/api/players/me/dispersion", () => HttpResponse.json(dispersion)),
  );
}

const read = { distanceM: 3.048, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.4318 } };

function renderPanel(props: Partial<OddsPanelProps> = {}) {
  const onApplyRollPast = vi.fn();
  const result = renderRoute(
    <OddsPanel read={read} units="metric" signedIn signInHref="/sign-in?next=%2Fread" onApplyRollPast={onApplyRollPast} {...props} />,
    { at: "/read" },
  );
  return { ...result, onApplyRollPast };
}

beforeEach(() => {
  calls = [];
});
afterEach(() => {
  cleanup();
});

test("a signed-in player sees how often they hole the read, from POST /api/reads/make-probability with that read", async () => {
  stubApi();
  const { container } = renderPanel();
  expect(await screen.findByText("You hole this about 34 % of the time")).toBeInTheDocument();
  const posts = calls.filter((c) => c.path === "/api/reads/make-probability");
  expect(posts).toHaveLength(1);
  // No dispersion in the body: the server uses the player's own, from their logged putts.
  expect(posts[0]!.body).toEqual({ read, seed: expect.any(Number) });
  expect(screen.getByText("A second putt over 1 m").nextSibling).toHaveTextContent("8 % of the time");
  expect(screen.getByTestId("odds-basis")).toHaveTextContent("Based on 212 of your putts.");
  expect(screen.getByText(/^1\.4° either way/)).toHaveTextContent("1.4° either way (one standard deviation), likely 1.1–1.9°");
  expect(screen.getByText(/^11 % of the roll/)).toHaveTextContent("11 % of the roll long or short, likely 8.5–14 %");
  expect(container.querySelectorAll("[data-finish]")).toHaveLength(100);
  expect(container.querySelectorAll('[data-finish="holed"]')).toHaveLength(34);
});

test("the best pace sits beside the read's own, and its button hands that roll-past to the form", async () => {
  stubApi();
  const { onApplyRollPast } = renderPanel();
  const best = within(await screen.findByTestId("best-pace"));
  expect(best.getByText("This read (finish 43 cm past)").nextSibling).toHaveTextContent("holes 34 %");
  expect(best.getByText("Best for you (finish 35 cm past)").nextSibling).toHaveTextContent("holes 38 %");
  await userEvent.click(best.getByRole("button", { name: "Use my best pace (35 cm past)" }));
  expect(onApplyRollPast).toHaveBeenCalledWith(0.35);
});

test("with few putts logged the panel says it leans on typical club-golfer values", async () => {
  stubApi(
    () =>
      HttpResponse.json(
        fakeOdds({
          dispersion: { angleDeg: 1.2, pace: 0.12, source: "my-putts", putts: 0, usedPrior: true, readSlopePct: 0.5, greenLateralM: 0.02 },
        }),
      ),
    fakeDispersion({ putts: 0, usedPrior: true }),
  );
  renderPanel();
  expect(await screen.findByTestId("odds-basis")).toHaveTextContent("No putts logged yet — using typical club-golfer values.");
});

test("a ball that would not stop (422) is explained, not shown as a failure", async () => {
  stubApi(() => apiError(422, "unprocessable", "The ball cannot stop", { fields: {} }));
  renderPanel();
  expect(await screen.findByText(/would not stop on that slope/)).toBeInTheDocument();
  expect(screen.queryByRole("alert")).not.toBeInTheDocument();
});

test("signed out: one line inviting the golfer to sign in, and no simulation is asked for", async () => {
  stubApi();
  renderPanel({ signedIn: false });
  const line = screen.getByTestId("odds-sign-in");
  expect(line).toHaveTextContent("Sign in to see how often you hole this putt, from your own logged putts.");
  expect(within(line).getByRole("link", { name: "Sign in" })).toHaveAttribute("href", "/sign-in?next=%2Fread");
  await new Promise((r) => setTimeout(r, 20));
  expect(calls).toEqual([]);
});

test("odds outside the player's own logged rate come with the reason, never silently", async () => {
  stubApi(() =>
    HttpResponse.json(
      fakeOdds({
        logged: {
          fromM: 2.4,
          toM: 3.75,
          attempts: 40,
          made: 36,
          rate: 0.9,
          ci95: [0.77, 0.96],
          oddsOutside: true,
          why: "These odds are for this putt: its slope.",
        },
      }),
    ),
  );
  renderPanel();
  const note = await screen.findByTestId("odds-vs-log");
  expect(note).toHaveTextContent("Your log: 90 % holed");
  expect(note).toHaveTextContent("Why these odds differ: These odds are for this putt: its slope.");
});
