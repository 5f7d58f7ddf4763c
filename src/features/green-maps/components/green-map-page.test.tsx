// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { cleanup, fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { apiError, http, HttpResponse, meAnswer, network, watchUploads } from "../../../testing/network";
import { mapLayout } from "../utils/map-view";
import { GreenMapPage } from "./green-map-page";
import { HeightMapUpload } from "./height-map-upload";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

type Call = { url: string; method: string; body: unknown };
let calls: Call[] = [];

const GREEN_ID = "6c9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f";
const me = {
  user: { id: "u1", name: "Ivo", email: "ivo@example.com", role: "player", emailVerified: true },
  preferences: { units: "metric" },
};
const green = {
  id: GREEN_ID,
  name: "Top green",
  locationNote: null,
  currentStimpFt: 9.5,
  createdAt: "2026-01-01T00:00:00Z",
  squad: null,
  ownerName: "Test Golfer",
  mine: true,
  hasHeightMap: true,
  readings: [],
};
// A 12 m × 12 m plane falling to the east, 5 × 5 heights 3 m apart, origin at (0, 0).
const heightsM = Array.from({ length: 5 }, () => [0.12, 0.09, 0.06, 0.03, 0]);
const heightMap = {
  nx: 5,
  ny: 5,
  spacingM: 3,
  originM: [0, 0],
  widthM: 12,
  depthM: 12,
  minHeightM: 0,
  maxHeightM: 0.12,
  maxSlopePct: 1,
  source: "grid",
  spotCount: null,
  heightsM,
};
const surfaceRead = {
  launchSpeedMps: 2.1,
  startLineDeg: -3.1,
  aimOffsetM: -0.41,
  entrySpeedMps: 0.7,
  rollPastM: 0.45,
  flatPuttLengthM: 7.15,
  aimGiven: "offset",
  aimNote: null,
  breaks: "right-to-left",
  capture: { holed: true, outcome: "holed", maxCaptureSpeedMps: 1.6, marginMps: 0.9 },
  path: [
    [3, 2],
    [3.2, 5],
    [6, 9],
    [6.1, 9.4],
  ],
  puttFramePath: [
    [0, 0],
    [0, 7.6],
  ],
  restM: [6.1, 9.4],
  distanceM: 7.62,
  meanPlane: { slopePct: 1, fallLineDeg: 60 },
  model: { name: "m", v0Mps: 1.83, rollingDecelMps2: 0.55, gravityDecelMps2: 0.14, maxStoppableSlopePct: 7.86 },
  diagnostics: { method: "surface-newton", iterations: 4, integrations: 12 },
};

/** The API as this page sees it; reads and uploads are recorded (JSON bodies parsed). */
function stubApi(put?: () => Response) {
  const record = async (request: Request) => {
    const json = request.headers.get("Content-Type")?.includes("json");
    calls.push({ url: new URL(request.url).pathname, method: request.method, body: json ? await request.json() : undefined });
  };
  network.use(
    meAnswer(me),
    http.get(`/api/greens/${GREEN_ID}`, () => HttpResponse.json(green)),
    http.get(`/api/greens/${GREEN_ID}/height-map`, () => HttpResponse.json(heightMap)),
    http.post(`/api/greens/${GREEN_ID}/reads/solve`, async ({ request }) => {
      await record(request);
      return HttpResponse.json(surfaceRead);
    }),
  );
  if (put)
    network.use(
      http.put(`/api/greens/${GREEN_ID}/height-map`, async ({ request }) => {
        await record(request);
        return put();
      }),
    );
}

beforeEach(() => {
  calls = [];
  // jsdom has no canvas: the WebGL probe answers "no", as a browser without WebGL would.
  vi.spyOn(HTMLCanvasElement.prototype, "getContext").mockReturnValue(null);
});
afterEach(() => {
  cleanup();
});

test("tapping the ball and then the hole asks for the read with both positions in metres in the green's frame", async () => {
  stubApi();
  renderRoute(<GreenMapPage greenId={GREEN_ID} />, { at: "/greens/x/map" });
  const svg = await screen.findByTestId("surface-map");
  // Drawn at half its viewBox size, 40 px in and 200 px down the page.
  const layout = mapLayout({ minX: 0, maxX: 12, minY: 0, maxY: 12 });
  const scale = 0.5;
  svg.getBoundingClientRect = () => ({ left: 40, top: 200, width: layout.width * scale, height: layout.height * scale }) as DOMRect;
  const tapAt = (xM: number, yM: number) =>
    fireEvent.click(svg, { clientX: 40 + layout.toX(xM) * scale, clientY: 200 + layout.toY(yM) * scale });

  tapAt(3, 2);
  expect(screen.getByTestId("placement")).toHaveTextContent("Ball 3.0 m east, 2.0 m north · hole not placed");
  tapAt(6, 9);
  await waitFor(() => expect(calls.filter((c) => c.url.endsWith("/reads/solve"))).toHaveLength(1));
  expect(calls.find((c) => c.url.endsWith("/reads/solve"))!.body).toEqual({
    ball: [3, 2],
    hole: [6, 9],
    // The green's latest Stimp reading is the default.
    stimpFt: 9.5,
    pace: { rollPastM: 0.45 },
  });
  expect(await screen.findByTestId("surface-aim")).toHaveTextContent("Aim 41 cm left of the hole");
  expect(screen.getByTestId("surface-flat-putt")).toHaveTextContent("as hard as a flat 7.15 m putt");
  expect(screen.getByTestId("surface-line")).toBeInTheDocument();
  // Without WebGL the 3D view says so; the map above stands in for it.
  expect(screen.getByText(/cannot draw the 3D green/)).toBeInTheDocument();
});

test("with both placed, a tap moves the one chosen; the summary shows the map's size and steepest grade", async () => {
  stubApi();
  renderRoute(<GreenMapPage greenId={GREEN_ID} />, { at: "/greens/x/map" });
  const svg = await screen.findByTestId("surface-map");
  const layout = mapLayout({ minX: 0, maxX: 12, minY: 0, maxY: 12 });
  svg.getBoundingClientRect = () => ({ left: 0, top: 0, width: layout.width, height: layout.height }) as DOMRect;
  const tapAt = (xM: number, yM: number) => fireEvent.click(svg, { clientX: layout.toX(xM), clientY: layout.toY(yM) });
  tapAt(3, 2);
  tapAt(6, 9);
  await userEvent.click(screen.getByRole("button", { name: "the ball" }));
  tapAt(1.5, 1);
  await waitFor(() =>
    expect(calls.filter((c) => c.url.endsWith("/reads/solve")).at(-1)?.body).toMatchObject({ ball: [1.5, 1], hole: [6, 9] }),
  );
  const summary = within(screen.getByRole("region", { name: "The height map" }));
  expect(summary.getByText("Size").nextSibling).toHaveTextContent("12.0 m east–west × 12.0 m north–south (5 × 5 heights)");
  expect(summary.getByText("Steepest").nextSibling).toHaveTextContent("1.0 % between neighbouring heights");
});

test("a refused upload lists the server's row and column errors, and the spacing error beside its field", async () => {
  stubApi(() =>
    apiError(400, "bad_request", "The grid has 3 problem(s).", {
      fields: {
        "row 3, column 2": '"x" is not a height in metres',
        "row 2": "has 1 values; row 1 has 3 (every row needs the same number)",
        spacingM: "spacingM must be at least 0.05 m",
      },
    }),
  );
  const uploads = watchUploads();
  renderRoute(<HeightMapUpload greenId={GREEN_ID} replacing={false} />, { at: "/greens/x/map" });
  await userEvent.upload(screen.getByLabelText("CSV file"), new File(["0,0,0\n0\n0,x,0\n"], "bumpy.csv", { type: "text/csv" }));
  await userEvent.clear(screen.getByLabelText("Spacing (m)"));
  await userEvent.type(screen.getByLabelText("Spacing (m)"), "0.01");
  await userEvent.click(screen.getByRole("button", { name: "Upload height map" }));

  const alert = await screen.findByRole("alert");
  expect(alert).toHaveTextContent("The grid has 3 problem(s).");
  const items = within(within(alert).getByRole("list", { name: "Problems in the file" })).getAllByRole("listitem");
  // In the order the file reads: row 2 before row 3.
  expect(items.map((li) => li.textContent)).toEqual([
    "Row 2 has 1 values; row 1 has 3 (every row needs the same number)",
    'Row 3, column 2 "x" is not a height in metres',
  ]);
  expect(screen.getByText("spacingM must be at least 0.05 m")).toBeInTheDocument();
  expect(calls.filter((c) => c.method === "PUT")).toHaveLength(1);
  expect(uploads.map((u) => u.path)).toEqual([`/api/greens/${GREEN_ID}/height-map`]);
  const form = uploads[0]!.form;
  expect(form.get("format")).toBe("grid");
  expect(form.get("spacingM")).toBe("0.01");
  expect(form.get("originXM")).toBe("0");
  expect((form.get("file") as File).name).toBe("bumpy.csv");
});

test("the map draws slope as equal ticks along the fall line, coloured by steepness and keyed in the legend, with no arrows", async () => {
  stubApi();
  renderRoute(<GreenMapPage greenId={GREEN_ID} />, { at: "/greens/x/map" });
  const svg = await screen.findByTestId("surface-map");
  // The test map falls 3 cm every 3 m to the east: 1 %, the "1–2 %" band, everywhere.
  const ticks = [...svg.querySelectorAll('[data-testid="slope-ticks"] > g')];
  expect(ticks.length).toBeGreaterThan(10);
  const lengths = ticks.map((g) => {
    const l = g.querySelector("line")!;
    const [x1, y1, x2, y2] = ["x1", "y1", "x2", "y2"].map((a) => Number(l.getAttribute(a)));
    // The bead sits at the low (east) end.
    const bead = g.querySelector("circle")!;
    expect(Number(bead.getAttribute("cx"))).toBeCloseTo(Math.max(x1!, x2!), 6);
    expect(y1!).toBeCloseTo(y2!, 6);
    expect(g.getAttribute("data-band")).toBe("1");
    return Math.hypot(x2! - x1!, y2! - y1!);
  });
  expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThan(1e-6);
  expect(svg.querySelector("marker")).toBeNull();
  const key = screen.getAllByRole("list", { name: "Slope colours" })[0]!;
  expect(
    within(key)
      .getAllByRole("listitem")
      .map((li) => li.textContent),
  ).toEqual(["under 1 %", "1–2 %", "2–3 %", "3 % or more"]);
});

test("a green without a map asks for none; after an upload the green is asked again and its map drawn at once", async () => {
  let stored = false;
  const gets: string[] = [];
  network.use(
    meAnswer(me),
    http.get(`/api/greens/${GREEN_ID}`, () => {
      gets.push("green");
      return HttpResponse.json({ ...green, hasHeightMap: stored });
    }),
    http.get(`/api/greens/${GREEN_ID}/height-map`, () => {
      gets.push("map");
      return stored ? HttpResponse.json(heightMap) : apiError(404, "not_found", "That green has no height map");
    }),
    http.put(`/api/greens/${GREEN_ID}/height-map`, () => {
      stored = true;
      return HttpResponse.json({
        nx: 5,
        ny: 5,
        spacingM: 3,
        originM: [0, 0],
        widthM: 12,
        depthM: 12,
        minHeightM: 0,
        maxHeightM: 0.12,
        maxSlopePct: 1,
        source: "grid",
        spotCount: null,
      });
    }),
  );
  renderRoute(<GreenMapPage greenId={GREEN_ID} />, { at: "/greens/x/map" });
  expect(await screen.findByRole("button", { name: "Upload height map" })).toBeInTheDocument();
  expect(gets).toEqual(["green"]);

  await userEvent.upload(screen.getByLabelText("CSV file"), new File(["0,0\n0,0\n"], "flat.csv", { type: "text/csv" }));
  await userEvent.click(screen.getByRole("button", { name: "Upload height map" }));
  expect(await screen.findByTestId("surface-map")).toBeInTheDocument();
  expect(gets).toEqual(["green", "green", "map"]);
});
