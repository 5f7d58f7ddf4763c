// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { act, cleanup, fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useLocation } from "react-router";
import { renderRoute } from "../../../testing/render";
import { http, HttpResponse, meAnswer, serve, type Call } from "../../../testing/network";
import { ReadPage } from "./read-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

let calls: Call[] = [];

const fakeRead = {
  launchSpeedMps: 1.94,
  startLineDeg: -5.22,
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
    [0.1, 3.4],
  ],
  model: { name: "m", v0Mps: 1.83, rollingDecelMps2: 0.55, gravityDecelMps2: 0.14, maxStoppableSlopePct: 7.86 },
};

function stubApi(solve: (body: Record<string, unknown>) => Response = () => HttpResponse.json(fakeRead)) {
  calls = serve(
    meAnswer(null),
    http.post("/api/reads/solve", async ({ request }) => solve((await request.json()) as Record<string, unknown>)),
  );
}

function Where() {
  const location = useLocation();
  return <output data-testid="where">{location.search}</output>;
}

function renderPage(at = "/read") {
  return renderRoute(
    <>
      <ReadPage />
      <Where />
    </>,
    { at },
  );
}

const solveBodies = () => calls.filter((c) => c.path === "/api/reads/solve").map((c) => c.body);

beforeEach(() => {
  calls = [];
  window.localStorage.clear();
});
afterEach(() => {
  cleanup();
  vi.useRealTimers();
});

test("a shared link fills the form in the user's units and asks the API for exactly that read", async () => {
  stubApi();
  renderPage("/read?d=3.048&s=2.5&f=225&st=11&rp=0.3048");
  expect(await screen.findByLabelText("Distance (ft)")).toHaveValue("10");
  expect(screen.getByLabelText("Slope (%)")).toHaveValue("2.5");
  expect(screen.getByLabelText("Stimp (ft)")).toHaveValue("11");
  expect(screen.getByLabelText("Past the hole (in)")).toHaveValue("12");
  expect(screen.getByLabelText("Or type degrees")).toHaveValue("225");
  expect(screen.getByRole("slider", { name: "Which way the green falls" })).toHaveAttribute("aria-valuetext", "uphill, falls left, 225°");
  await waitFor(() =>
    expect(solveBodies()).toContainEqual({ distanceM: 3.048, slopePct: 2.5, fallLineDeg: 225, stimpFt: 11, pace: { rollPastM: 0.3048 } }),
  );
  expect(await screen.findByTestId("aim-headline")).toHaveTextContent("outside the left edge");
});

test("the same link read by a metric user shows metres and centimetres but the same putt", async () => {
  window.localStorage.setItem("borrowline.units", "metric");
  stubApi();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  expect(await screen.findByLabelText("Distance (m)")).toHaveValue("3.05");
  expect(screen.getByLabelText("Past the hole (cm)")).toHaveValue("43");
  await waitFor(() =>
    expect(solveBodies()).toContainEqual({ distanceM: 3.048, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.4318 } }),
  );
  // Showing the rounded text must not rewrite the link, not even when the unchanged form is submitted.
  await userEvent.setup().click(screen.getByRole("button", { name: "Read the putt" }));
  await new Promise((r) => setTimeout(r, 50));
  expect(screen.getByTestId("where")).toHaveTextContent("?d=3.048&s=2&f=90&st=10&rp=0.4318");
  expect(solveBodies().every((b) => (b as { distanceM: number }).distanceM === 3.048)).toBe(true);
});

test("out-of-range values are named in the user's units and nothing is sent for them", async () => {
  stubApi();
  const user = userEvent.setup();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  const distance = await screen.findByLabelText("Distance (ft)");
  await waitFor(() => expect(solveBodies()).toHaveLength(1));
  await user.clear(distance);
  await user.type(distance, "120");
  await user.tab();
  expect(
    await within(screen.getByRole("form", { name: "The putt" })).findByText("Enter a distance from 1 to 98.4 ft."),
  ).toBeInTheDocument();
  expect(distance).toHaveAccessibleDescription("Enter a distance from 1 to 98.4 ft.");
  await user.clear(screen.getByLabelText("Slope (%)"));
  await user.type(screen.getByLabelText("Slope (%)"), "9");
  await user.tab();
  expect(await within(screen.getByRole("form", { name: "The putt" })).findByText("Enter a slope from 0 to 8%.")).toBeInTheDocument();
  await new Promise((r) => setTimeout(r, 600));
  expect(solveBodies()).toHaveLength(1);

  // In metric the same field speaks metres.
  await user.click(screen.getByRole("radio", { name: "Metres and centimetres" }));
  expect(await within(screen.getByRole("form", { name: "The putt" })).findByText("Enter a distance from 0.3 to 30 m.")).toBeInTheDocument();
  expect(screen.getByLabelText("Distance (m)")).toHaveValue("36.58");
});

test("switching units converts every field and switching back gives back what was typed", async () => {
  stubApi();
  const user = userEvent.setup();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  const distance = await screen.findByLabelText("Distance (ft)");
  await user.clear(distance);
  await user.type(distance, "13.7");
  await user.clear(screen.getByLabelText("Past the hole (in)"));
  await user.type(screen.getByLabelText("Past the hole (in)"), "19");

  for (let i = 0; i < 3; i++) {
    await user.click(screen.getByRole("radio", { name: "Metres and centimetres" }));
    expect(await screen.findByLabelText("Distance (m)")).toHaveValue("4.18");
    expect(screen.getByLabelText("Past the hole (cm)")).toHaveValue("48");
    await user.click(screen.getByRole("radio", { name: "Feet and inches" }));
    expect(await screen.findByLabelText("Distance (ft)")).toHaveValue("13.7");
    expect(screen.getByLabelText("Past the hole (in)")).toHaveValue("19");
  }
  expect(window.localStorage.getItem("borrowline.units")).toBe("imperial");
  // The committed read is the typed one, in exact SI.
  await waitFor(() => expect(screen.getByTestId("where")).toHaveTextContent("d=4.17576&s=2&f=90&st=10&rp=0.4826"));
});

test("picking a named direction turns the dial and re-reads the putt at once", async () => {
  stubApi();
  const user = userEvent.setup();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  const dial = await screen.findByRole("slider", { name: "Which way the green falls" });
  expect(dial).toHaveAttribute("aria-valuenow", "90");
  expect(dial).toHaveAttribute("aria-valuetext", "falls to the right, 90°");

  await user.click(screen.getByRole("radio", { name: "Downhill, falls right" }));
  expect(dial).toHaveAttribute("aria-valuenow", "45");
  expect(dial).toHaveAttribute("aria-valuetext", "downhill, falls right, 45°");
  expect(screen.getByLabelText("Or type degrees")).toHaveValue("45");
  expect(screen.getByRole("radio", { name: "Downhill, falls right" })).toBeChecked();
  await waitFor(() => expect(screen.getByTestId("where")).toHaveTextContent("f=45"));

  await user.click(screen.getByRole("radio", { name: "Straight uphill" }));
  expect(dial).toHaveAttribute("aria-valuenow", "180");
  expect(screen.getByRole("radio", { name: "Downhill, falls right" })).not.toBeChecked();
});

test("the dial answers the arrow keys, and typing degrees moves it", async () => {
  stubApi();
  const user = userEvent.setup();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  const dial = await screen.findByRole("slider", { name: "Which way the green falls" });
  dial.focus();
  await user.keyboard("{ArrowRight}");
  expect(dial).toHaveAttribute("aria-valuenow", "95");
  await user.keyboard("{Shift>}{ArrowLeft}{/Shift}");
  expect(dial).toHaveAttribute("aria-valuenow", "94");
  await user.keyboard("{PageDown}");
  expect(dial).toHaveAttribute("aria-valuenow", "49");
  await user.keyboard("{Home}{ArrowLeft}");
  expect(dial).toHaveAttribute("aria-valuenow", "355");

  const degrees = screen.getByLabelText("Or type degrees");
  await user.clear(degrees);
  await user.type(degrees, "300");
  expect(dial).toHaveAttribute("aria-valuetext", "downhill, falls left, 300°");
});

test("dragging the dial with a pointer previews the line live and commits on release", async () => {
  stubApi();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  const dial = await screen.findByRole("slider", { name: "Which way the green falls" });
  await screen.findByTestId("aim-headline");
  // jsdom lays nothing out: give the dial a 260 px box at the origin (its centre is then 130, 130).
  dial.getBoundingClientRect = () => ({
    left: 0,
    top: 0,
    width: 260,
    height: 260,
    right: 260,
    bottom: 260,
    x: 0,
    y: 0,
    toJSON: () => ({}),
  });
  const before = solveBodies().length;
  fireEvent.pointerDown(dial, { clientX: 250, clientY: 130, button: 0, pointerId: 1 });
  fireEvent.pointerMove(dial, { clientX: 130, clientY: 250, pointerId: 1 });
  expect(dial).toHaveAttribute("aria-valuenow", "180");
  // The engine is fetched at the first move (a dynamic import, not part of the page's first download).
  expect(await screen.findByText("Live while you turn the dial", undefined, { timeout: 15_000 })).toBeInTheDocument();
  // The live answer is the engine's, in the browser: straight uphill runs straight.
  expect(within(screen.getByRole("region", { name: "The read" })).getByText("Runs straight")).toBeInTheDocument();
  expect(solveBodies().length).toBe(before);
  fireEvent.pointerUp(dial, { clientX: 10, clientY: 130, pointerId: 1 });
  expect(dial).toHaveAttribute("aria-valuenow", "270");
  await waitFor(() => expect(solveBodies()).toContainEqual(expect.objectContaining({ fallLineDeg: 270 })));
  expect(screen.queryByText("Live while you turn the dial")).not.toBeInTheDocument();
});

test("a 422 is shown as 'would not stop' with the steepest stoppable slope, not as a failure", async () => {
  stubApi(() =>
    HttpResponse.json(
      {
        error: {
          code: "UNPROCESSABLE",
          // The number travels in details (as cannotStopBody sends it), not in the words: the page must not parse prose.
          message: "A ball cannot stop on this green.",
          fields: { slopePct: "too steep to stop a ball at Stimp 10 ft" },
          details: { reason: "cannot-stop", maxStoppableSlopePct: 7.86 },
        },
      },
      { status: 422 },
    ),
  );
  renderPage("/read?d=3&s=8&f=90&st=10&rp=0.45");
  // In the answer panel, and in the phone answer bar.
  expect(await screen.findAllByText("This ball would not stop")).toHaveLength(2);
  expect(
    screen.getByText(/On an 8 % slope at Stimp 10 the ball would not stop — the steepest it stops on is 7\.9 %\./),
  ).toBeInTheDocument();
  expect(screen.getByLabelText("Slope (%)")).toHaveAccessibleDescription("Steepest a ball stops on at this Stimp: 7.9 %");
  expect(screen.queryByRole("alert")).not.toBeInTheDocument();
});

test("a 400 from the API is shown beside the field it names", async () => {
  stubApi(() =>
    HttpResponse.json(
      {
        error: {
          code: "BAD_REQUEST",
          message: "The request body is not valid.",
          fields: { distanceM: "distanceM must be at least 0.3 m" },
        },
      },
      { status: 400 },
    ),
  );
  renderPage("/read?d=0.3&s=2&f=90&st=10&rp=0.45");
  const distance = await screen.findByLabelText("Distance (ft)");
  await waitFor(() => expect(distance).toHaveAccessibleDescription("distanceM must be at least 0.3 m"));
});

test("a bare /read writes the defaults into the browser's address so it can be shared, without a navigation", async () => {
  stubApi();
  window.history.replaceState({ kept: true }, "", "/read");
  renderPage("/read");
  await waitFor(() => expect(window.location.search).toBe("?d=3.048&s=2&f=90&st=10&rp=0.4318"));
  expect(window.history.state).toEqual({ kept: true });
  // The router was not asked to navigate (a navigation renders the whole page again as a drawn /read hydrates).
  expect(screen.getByTestId("where")).toHaveTextContent(/^$/);
});

test("the defaults are not written over the address of another page the browser has already moved to", async () => {
  stubApi();
  window.history.replaceState(null, "", "/rehearse?d=2");
  renderPage("/read");
  await screen.findByTestId("aim-headline");
  expect(window.location.pathname + window.location.search).toBe("/rehearse?d=2");
  expect(await screen.findByRole("link", { name: "Rehearse this putt" })).toHaveAttribute(
    "href",
    "/rehearse?d=3.048&s=2&f=90&st=10&rp=0.4318",
  );
});

test("typing is read again only after a pause", async () => {
  stubApi();
  const user = userEvent.setup();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  const distance = await screen.findByLabelText("Distance (ft)");
  await waitFor(() => expect(solveBodies()).toHaveLength(1));
  await user.clear(distance);
  await user.type(distance, "25");
  expect(solveBodies()).toHaveLength(1);
  await act(async () => {
    await new Promise((r) => setTimeout(r, 500));
  });
  await waitFor(() => expect(solveBodies()).toContainEqual(expect.objectContaining({ distanceM: 25 * 0.3048 })));
  expect(solveBodies().filter((b) => (b as { distanceM: number }).distanceM === 2 * 0.3048)).toHaveLength(0);
});

test("after an invalid entry (slope 9 %) the old answer is greyed out and the reason is given; a valid one clears it", async () => {
  stubApi();
  const user = userEvent.setup();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  await screen.findByTestId("aim-headline");
  expect(screen.queryByTestId("stale-answer")).toBeNull();
  const slope = screen.getByLabelText("Slope (%)");
  await user.clear(slope);
  await user.type(slope, "9");
  const stale = await screen.findByTestId("stale-answer");
  expect(stale).toHaveTextContent(/last putt that could be read/);
  expect(stale).toHaveTextContent(/slope from 0 to 8/i);
  expect(screen.getByTestId("answer-body")).toHaveAttribute("aria-disabled", "true");
  expect(screen.getByTestId("answer-body")).toHaveClass("opacity-40");
  await user.clear(slope);
  await user.type(slope, "3");
  await waitFor(() => expect(screen.queryByTestId("stale-answer")).toBeNull());
  expect(screen.getByTestId("answer-body")).not.toHaveAttribute("aria-disabled");
});

test("in feet and inches the answer gives speeds in ft/s, never m/s", async () => {
  stubApi();
  renderPage("/read?d=3.048&s=2&f=90&st=10&rp=0.4318");
  await screen.findByTestId("aim-headline");
  const answer = screen.getByTestId("answer-body");
  // 0.67 m/s = 2.2 ft/s (0.3048 m a foot).
  expect(answer).toHaveTextContent("Still rolling at the hole (2.2 ft/s)");
  expect(answer.textContent).not.toMatch(/m\/s/);
});

// A link followed while the next page's code is still loading must not be cancelled by the read writing its own
// address: a second navigation replaces the one in progress (React Router). Both were seen: the dial's arrow keys
// wrote the same address again a pause later (CI: Enter on "Break chart" stayed on /read), and a typed value's pause.
function renderWithSlowChart() {
  let chartAsked = 0;
  const chart = {
    path: "/chart",
    lazy: async () => {
      chartAsked++;
      await new Promise((r) => setTimeout(r, 800));
      return { element: <h1>The chart page</h1> };
    },
  };
  const rendered = renderRoute(
    <>
      <ReadPage />
      <Where />
    </>,
    { at: "/read?d=3.048&s=2&f=90&st=10&rp=0.4318", routes: [chart] },
  );
  return { ...rendered, chartAsked: () => chartAsked };
}

test("turning the dial by keyboard writes the address once, and a link followed at once is not cancelled", async () => {
  stubApi();
  const user = userEvent.setup();
  const { router, chartAsked } = renderWithSlowChart();
  const dial = await screen.findByRole("slider", { name: "Which way the green falls" });
  const writes: string[] = [];
  let lastKey = router.state.location.key;
  router.subscribe(({ location }) => {
    if (location.key !== lastKey) writes.push(location.pathname + location.search);
    lastKey = location.key;
  });
  dial.focus();
  await user.keyboard("{ArrowRight}");
  await waitFor(() => expect(screen.getByTestId("where")).toHaveTextContent("f=95"));
  // Past the typing pause: the turn was written once.
  await act(async () => {
    await new Promise((r) => setTimeout(r, 500));
  });
  expect(writes).toEqual(["/read?d=3.048&s=2&f=95&st=10&rp=0.4318"]);
  await user.keyboard("{ArrowRight}");
  await waitFor(() => expect(screen.getByTestId("where")).toHaveTextContent("f=100"));
  await user.click(screen.getByRole("link", { name: "Break chart for this green" }));
  await waitFor(() => expect(chartAsked()).toBe(1));
  expect(await screen.findByRole("heading", { name: "The chart page" }, { timeout: 3000 })).toBeInTheDocument();
  expect(router.state.location.pathname).toBe("/chart");
  expect(router.state.location.search).toContain("f=100");
});

test("a link followed during the pause after typing still opens its page", async () => {
  stubApi();
  const user = userEvent.setup();
  const { router } = renderWithSlowChart();
  const distance = await screen.findByLabelText("Distance (ft)");
  await user.clear(distance);
  await user.type(distance, "25");
  await user.click(screen.getByRole("link", { name: "Break chart for this green" }));
  expect(await screen.findByRole("heading", { name: "The chart page" }, { timeout: 3000 })).toBeInTheDocument();
  expect(router.state.location.pathname).toBe("/chart");
});
