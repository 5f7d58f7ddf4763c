// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useLocation } from "react-router";
import { renderRoute } from "../../testing/render";
import { http, HttpResponse, meAnswer, network } from "../../testing/network";
import { fakeDispersion, fakeOdds } from "../../features/make-probability/components/test-data";
import { ReadRoute } from "./read";

vi.mock("../../lib/auth-client", () => ({ authClient: {} }));

afterEach(() => {
  cleanup();
});

const me = {
  user: { id: "u1", name: "Ivo", email: "ivo@example.com", role: "player", emailVerified: true },
  preferences: { units: "metric" },
};
const solved = {
  launchSpeedMps: 1.94,
  startLineDeg: -5.2,
  aimOffsetM: -0.274,
  entrySpeedMps: 0.67,
  rollPastM: 0.45,
  flatPuttLengthM: 2.97,
  aimGiven: "offset",
  aimNote: null,
  breaks: "left-to-right",
  capture: { holed: true, outcome: "holed", maxCaptureSpeedMps: 1.64, marginMps: 0.96 },
  path: [
    [0, 0],
    [-0.1, 1.5],
    [0, 3],
  ],
  model: { name: "m", v0Mps: 1.83, rollingDecelMps2: 0.55, gravityDecelMps2: 0.14, maxStoppableSlopePct: 7.86 },
};

function Where() {
  return <output data-testid="where">{useLocation().search}</output>;
}

test("on /read the odds panel's best-pace button puts that roll-past into the read form and the address", async () => {
  const bodies: unknown[] = [];
  network.use(
    meAnswer(me),
    http.post("/api/reads/solve", () => HttpResponse.json(solved)),
    http.get("/api/reads", () => HttpResponse.json({ items: [] })),
    http.get("/api/greens", () => HttpResponse.json([])),
    http.get("/api/players/me/dispersion", () => HttpResponse.json(fakeDispersion())),
    http.post("/api/reads/make-probability", async ({ request }) => {
      bodies.push(await request.json());
      return HttpResponse.json(fakeOdds());
    }),
  );
  renderRoute(
    <>
      <ReadRoute />
      <Where />
    </>,
    { at: "/read?d=3&s=2&f=90&st=10&rp=0.45" },
  );
  const panel = await screen.findByRole("region", { name: "Your odds from here" });
  await within(panel).findByText("You hole this about 34 % of the time");
  await userEvent.click(within(panel).getByRole("button", { name: "Use my best pace (35 cm past)" }));
  await waitFor(() => expect(screen.getByTestId("where")).toHaveTextContent("?d=3&s=2&f=90&st=10&rp=0.35"));
  expect(screen.getByLabelText("Past the hole (cm)")).toHaveValue("35");
  await waitFor(() => expect(bodies.at(-1)).toMatchObject({ read: { pace: { rollPastM: 0.35 } } }));
});
