import { afterAll, beforeAll, expect, test } from "vitest";
import { HOLE_DIAMETER_M } from "../../shared/units";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let anon: HttpClient;
beforeAll(async () => {
  server = await startTestServer();
  anon = new HttpClient(server.url);
});
afterAll(async () => {
  await server?.stop();
});

const sideHill = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } };

test("POST /api/reads/solve answers a full read without an account", async () => {
  const res = await anon.post("/api/reads/solve", sideHill);
  expect(res.status).toBe(200);
  const r = res.body;
  // Falls to the golfer's right → breaks left-to-right → aim left of the hole (negative).
  expect(r.breaks).toBe("left-to-right");
  expect(r.aimOffsetM).toBeLessThan(0);
  expect(r.startLineDeg).toBeLessThan(0);
  // A golfer's sanity check: a few hole widths of borrow on a 3 m side-hill putt at 2 % and Stimp 10.
  const holeWidths = Math.abs(r.aimOffsetM) / HOLE_DIAMETER_M;
  expect(holeWidths).toBeGreaterThan(1);
  expect(holeWidths).toBeLessThan(6);
  expect(r.rollPastM).toBeCloseTo(0.45, 2);
  expect(r.capture.holed).toBe(true);
  expect(r.flatPuttLengthM).toBeGreaterThan(0);
  expect(r.aimGiven).toBe("offset");
  expect(r.path.length).toBeGreaterThan(10);
  expect(r.path[0]).toEqual([0, 0]);
  expect(r.model).toMatchObject({ v0Mps: expect.any(Number), rollingDecelMps2: expect.any(Number) });
});

test("POST /api/reads/solve: a dying pace needs more borrow than a firm one", async () => {
  const dying = await anon.post("/api/reads/solve", { ...sideHill, pace: { rollPastM: 0.05 } });
  const firm = await anon.post("/api/reads/solve", { ...sideHill, pace: { rollPastM: 1.2 } });
  expect(Math.abs(dying.body.aimOffsetM)).toBeGreaterThan(Math.abs(firm.body.aimOffsetM));
});

test("POST /api/reads/solve takes an entry speed instead of a roll-past", async () => {
  const res = await anon.post("/api/reads/solve", { ...sideHill, pace: { entrySpeedMps: 0.9 } });
  expect(res.status).toBe(200);
  expect(res.body.entrySpeedMps).toBeCloseTo(0.9, 2);
});

test("POST /api/reads/solve defaults the pace to 0.45 m past", async () => {
  const { pace: _pace, ...noPace } = sideHill;
  const res = await anon.post("/api/reads/solve", noPace);
  expect(res.status).toBe(200);
  expect(res.body.rollPastM).toBeCloseTo(0.45, 2);
});

test.each([
  ["distanceM", { distanceM: 0.1 }],
  ["distanceM", { distanceM: 31 }],
  ["slopePct", { slopePct: -1 }],
  ["slopePct", { slopePct: 9 }],
  ["fallLineDeg", { fallLineDeg: 361 }],
  ["stimpFt", { stimpFt: 3 }],
  ["stimpFt", { stimpFt: "fast" }],
  ["pace", { pace: { rollPastM: 4 } }],
  ["pace", { pace: { entrySpeedMps: 3 } }],
  ["extra", { extra: 1 }],
])("POST /api/reads/solve refuses %s out of its limits with a 400 naming it", async (field, change) => {
  const res = await anon.post("/api/reads/solve", { ...sideHill, ...change });
  expect(res.status).toBe(400);
  const named = Object.keys(res.body.error.fields ?? {});
  expect(named.some((k) => k.startsWith(field) || (field === "extra" && k === "body"))).toBe(true);
});

test("POST /api/reads/solve answers 422 when the ball cannot stop on that slope", async () => {
  // Stoppable only while (5/7)·g·sinθ < a_r: about 7.9 % at Stimp 10 in this model (docs/sources.md, derived).
  const res = await anon.post("/api/reads/solve", { ...sideHill, slopePct: 8, stimpFt: 10 });
  expect(res.status).toBe(422);
  expect(res.body.error.message).toMatch(/cannot stop/i);
  expect(res.body.error.fields).toHaveProperty("slopePct");
  const fine = await anon.post("/api/reads/solve", { ...sideHill, slopePct: 7.5, stimpFt: 10 });
  expect(fine.status).toBe(200);
});

test("POST /api/reads/chart answers a grid of aims, mirrored about the fall line", async () => {
  const distances = [1, 2, 3, 4, 5, 6];
  const fallLineDegs = [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330];
  const res = await anon.post("/api/reads/chart", { slopePct: 2, stimpFt: 10, distances, fallLineDegs });
  expect(res.status).toBe(200);
  expect(res.body.cells).toHaveLength(6);
  expect(res.body.cells[0]).toHaveLength(12);
  const at = (d: number, f: number) => res.body.cells[distances.indexOf(d)][fallLineDegs.indexOf(f)];
  expect(at(3, 90).aimOffsetM).toBeCloseTo(-at(3, 270).aimOffsetM, 3);
  expect(Math.abs(at(3, 0).aimOffsetM)).toBeLessThan(1e-3);
});

test("POST /api/reads/chart refuses more than 400 cells", async () => {
  const distances = Array.from({ length: 30 }, (_, i) => 1 + i * 0.5);
  const fallLineDegs = Array.from({ length: 24 }, (_, i) => i * 15);
  const res = await anon.post("/api/reads/chart", { slopePct: 2, stimpFt: 10, distances, fallLineDegs });
  expect(res.status).toBe(400);
  expect(res.body.error.fields).toHaveProperty("distances");
});

test("POST /api/reads saves a read for a signed-in player only; GET lists mine; DELETE of another's is 404", async () => {
  expect((await anon.post("/api/reads", { read: sideHill })).status).toBe(401);
  const a = await signedUpClient(server);
  const b = await signedUpClient(server);
  const saved = await a.client.post("/api/reads", { read: sideHill, label: "Top green, back left" });
  expect(saved.status).toBe(201);
  const mine = await a.client.get("/api/reads");
  expect(mine.body.items).toHaveLength(1);
  expect(mine.body.items[0]).toMatchObject({ label: "Top green, back left", input: { distanceM: 3 } });
  expect((await b.client.get("/api/reads")).body.items).toHaveLength(0);
  expect((await b.client.delete(`/api/reads/${saved.body.id}`)).status).toBe(404);
  expect((await a.client.delete("/api/reads/not-a-uuid")).status).toBe(400);
  expect((await a.client.delete(`/api/reads/${saved.body.id}`)).status).toBe(204);
});

test("the public read API is rate-limited with a 429, Retry-After and the error shape", async () => {
  const limited = await startTestServer({ rateLimits: { auth: { windowMs: 60_000, limit: 100 }, reads: { windowMs: 60_000, limit: 3 } } });
  try {
    const client = new HttpClient(limited.url);
    for (let i = 0; i < 3; i++) expect((await client.post("/api/reads/solve", sideHill)).status).toBe(200);
    const res = await client.post("/api/reads/solve", sideHill);
    expect(res.status).toBe(429);
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(res.body.error.code).toBe("too_many_requests");
  } finally {
    await limited.stop();
  }
});

test("POST /api/reads/chart and /solve give the start line, not an offset, past a 60° start line (issue 13: was 1576 cm R)", async () => {
  // 3 m, 7.7 % falling at 30°, Stimp 10, dying pace: the ball must start more than 90° left.
  const res = await anon.post("/api/reads/chart", {
    slopePct: 7.7,
    stimpFt: 10,
    pace: { rollPastM: 0 },
    distances: [3],
    fallLineDegs: [30],
  });
  expect(res.status).toBe(200);
  const cell = res.body.cells[0][0];
  expect(Math.abs(cell.startLineDeg)).toBeGreaterThan(90);
  expect(cell.aimGiven).toBe("start-line");
  expect(cell.aimOffsetM).toBeNull();
  const one = await anon.post("/api/reads/solve", { distanceM: 3, slopePct: 7.7, fallLineDeg: 30, stimpFt: 10, pace: { rollPastM: 0 } });
  expect(one.status).toBe(200);
  expect(one.body.aimGiven).toBe("start-line");
  expect(one.body.aimOffsetM).toBeNull();
  expect(one.body.aimNote).toMatch(/^Start the ball \d+° left of the line to the hole/);
  const gentle = await anon.post("/api/reads/solve", sideHill);
  expect(gentle.body.aimGiven).toBe("offset");
  expect(gentle.body.aimNote).toBeNull();
});

test("POST /api/reads/solve: the cannot-stop 422 carries the steepest stoppable slope as a number", async () => {
  const res = await anon.post("/api/reads/solve", { ...sideHill, slopePct: 8, stimpFt: 10 });
  expect(res.status).toBe(422);
  expect(res.body.error.details.reason).toBe("cannot-stop");
  // (7/5)·a_r/g = sinθ at the limit: ≈ 7.86 % at Stimp 10 (docs/sources.md, derived).
  expect(res.body.error.details.maxStoppableSlopePct).toBeCloseTo(7.86, 1);
});
