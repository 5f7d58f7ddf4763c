import { afterAll, beforeAll, expect, test } from "vitest";
import { METRES_PER_FOOT } from "../../shared/units";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";
import { makeSquad, OTHER_UUID } from "./practice-helpers";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

const ft = (x: number) => x * METRES_PER_FOOT;

test("POST /api/rounds stores the holes and answers per-round totals with strokes gained vs the baseline", async () => {
  const { client } = await signedUpClient(server);
  const res = await client.post("/api/rounds", {
    date: "2024-06-01",
    course: "Larkspur Heath",
    holes: [
      { holeNumber: 1, firstPuttM: ft(8), putts: 1 },
      { holeNumber: 2, firstPuttM: ft(33), putts: 3, leftAfterFirstM: 1.8 },
      { holeNumber: 3, firstPuttM: ft(3), putts: 2, leftAfterFirstM: 0.3 },
      { holeNumber: 4, putts: 0 },
    ],
  });
  expect(res.status).toBe(201);
  expect(res.body.totals).toMatchObject({ holes: 4, putts: 6, onePutts: 1, threePutts: 1, longFirstPutts: 1, longLagsOutside1m: 1 });
  // Broadie, "Putts Gained", 2011 [published]: 1.5 putts from 8 ft, 2.0 from 33 ft; 3 ft 1.04 from the [memory] table.
  expect(res.body.totals.strokesGained).toBeCloseTo(0.5 + (2.0 - 3) + (1.04 - 2), 1);
  expect(res.body.holes[0]).toMatchObject({
    holeNumber: 1,
    putts: 1,
    expectedPutts: expect.closeTo(1.5, 6),
    strokesGained: expect.closeTo(0.5, 6),
  });
  expect(res.body.holes[3]).toEqual({
    holeNumber: 4,
    firstPuttM: null,
    putts: 0,
    leftAfterFirstM: null,
    expectedPutts: null,
    strokesGained: null,
  });
  const got = await client.get(`/api/rounds/${res.body.id}`);
  expect(got.body).toEqual(res.body);
});

test("PUT /api/rounds/:id/holes/:n adds or replaces one hole at a time", async () => {
  const { client } = await signedUpClient(server);
  const id = (await client.post("/api/rounds", { date: "2024-06-02" })).body.id;
  const one = await client.put(`/api/rounds/${id}/holes/1`, { firstPuttM: 4, putts: 2, leftAfterFirstM: 0.5 });
  expect(one.status).toBe(200);
  expect(one.body.totals).toMatchObject({ holes: 1, putts: 2 });
  const replaced = await client.put(`/api/rounds/${id}/holes/1`, { firstPuttM: 4, putts: 3, leftAfterFirstM: 1.5 });
  expect(replaced.body.totals).toMatchObject({ holes: 1, putts: 3, threePutts: 1 });
  await client.put(`/api/rounds/${id}/holes/18`, { firstPuttM: 1, putts: 1 });
  expect((await client.get(`/api/rounds/${id}`)).body.holes.map((h: { holeNumber: number }) => h.holeNumber)).toEqual([1, 18]);
});

test("round and hole validation names the field and stores nothing", async () => {
  const { client } = await signedUpClient(server);
  const id = (await client.post("/api/rounds", { date: "2024-06-02" })).body.id;
  const bodies: [Record<string, unknown>, string][] = [
    [{ date: "2024-06-02", holes: [{ holeNumber: 19, firstPuttM: 3, putts: 2 }] }, "holes.0.holeNumber"],
    [{ date: "2024-06-02", holes: [{ holeNumber: 1, firstPuttM: 3, putts: 7 }] }, "holes.0.putts"],
    [{ date: "2024-06-02", holes: [{ holeNumber: 1, putts: 2 }] }, "holes.0.firstPuttM"],
    [{ date: "2024-06-02", holes: [{ holeNumber: 1, firstPuttM: 3, putts: 1, leftAfterFirstM: 1 }] }, "holes.0.leftAfterFirstM"],
    [
      {
        date: "2024-06-02",
        holes: [
          { holeNumber: 2, firstPuttM: 3, putts: 2 },
          { holeNumber: 2, firstPuttM: 5, putts: 2 },
        ],
      },
      "holes.1.holeNumber",
    ],
    [{ holes: [] }, "date"],
  ];
  for (const [payload, field] of bodies) {
    const res = await client.post("/api/rounds", payload);
    expect(res.status, JSON.stringify(payload)).toBe(400);
    expect(res.body.error.fields, JSON.stringify(payload)).toHaveProperty(field);
  }
  expect((await client.get("/api/rounds")).body.total).toBe(1);
  const hole = await client.put(`/api/rounds/${id}/holes/0`, { firstPuttM: 3, putts: 2 });
  expect(hole.status).toBe(400);
  expect(hole.body.error.fields).toHaveProperty("n");
  const body = await client.put(`/api/rounds/${id}/holes/3`, { firstPuttM: -1, putts: 2 });
  expect(body.status).toBe(400);
  expect(body.body.error.fields).toHaveProperty("firstPuttM");
  expect((await client.get(`/api/rounds/${id}`)).body.holes).toEqual([]);
});

test("GET /api/rounds lists my rounds newest first with totals, filtered and paged", async () => {
  const { client } = await signedUpClient(server);
  for (const date of ["2024-06-01", "2024-06-08", "2024-06-15"]) {
    await client.post("/api/rounds", { date, holes: [{ holeNumber: 1, firstPuttM: 6, putts: 3, leftAfterFirstM: 1.2 }] });
  }
  const res = await client.get("/api/rounds?pageSize=2");
  expect(res.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
  expect(res.body.items.map((r: { date: string }) => r.date)).toEqual(["2024-06-15", "2024-06-08"]);
  expect(res.body.items[0].totals).toMatchObject({ putts: 3, threePutts: 1 });
  expect((await client.get("/api/rounds?from=2024-06-08&to=2024-06-08")).body.total).toBe(1);
  expect((await client.get("/api/rounds?from=junk")).status).toBe(400);
});

test("rounds feed the first-putt make rate by distance (GET /api/stats/make-rates?source=rounds)", async () => {
  const { client } = await signedUpClient(server);
  await client.post("/api/rounds", {
    date: "2024-06-01",
    holes: [
      { holeNumber: 1, firstPuttM: 0.8, putts: 1 },
      { holeNumber: 2, firstPuttM: 0.9, putts: 2, leftAfterFirstM: 0.1 },
      { holeNumber: 3, firstPuttM: 12, putts: 2, leftAfterFirstM: 0.6 },
      { holeNumber: 4, putts: 0 },
    ],
  });
  const res = await client.get("/api/stats/make-rates?source=rounds&bands=1,2");
  expect(res.status).toBe(200);
  expect(res.body.bands.map((b: { attempts: number; made: number }) => [b.attempts, b.made])).toEqual([
    [2, 1],
    [0, 0],
    [1, 0],
  ]);
});

test("DELETE /api/rounds/:id removes it; other players get 404 on every round id route", async () => {
  const owner = await signedUpClient(server);
  const id = (
    await owner.client.post("/api/rounds", {
      date: "2024-06-01",
      holes: [{ holeNumber: 1, firstPuttM: 3, putts: 2, leftAfterFirstM: 0.4 }],
    })
  ).body.id;
  const other = (await signedUpClient(server)).client;
  expect((await other.get(`/api/rounds/${id}`)).status).toBe(404);
  expect((await other.put(`/api/rounds/${id}/holes/2`, { firstPuttM: 3, putts: 1 })).status).toBe(404);
  expect((await other.delete(`/api/rounds/${id}`)).status).toBe(404);
  expect((await other.get(`/api/rounds?playerId=${owner.id}`)).status).toBe(403);
  expect((await owner.client.get(`/api/rounds/${id}`)).body.holes).toHaveLength(1);
  expect((await owner.client.delete(`/api/rounds/${id}`)).status).toBe(204);
  expect((await owner.client.get(`/api/rounds/${id}`)).status).toBe(404);
});

test("a coach reads the rounds of their squad's players only", async () => {
  const coach = await signedUpClient(server, "coach");
  const member = await signedUpClient(server);
  const outsider = await signedUpClient(server);
  await makeSquad(server, coach.id, [member.id]);
  const id = (await member.client.post("/api/rounds", { date: "2024-06-01" })).body.id;
  const theirs = (await outsider.client.post("/api/rounds", { date: "2024-06-01" })).body.id;
  expect((await coach.client.get(`/api/rounds?playerId=${member.id}`)).body.total).toBe(1);
  expect((await coach.client.get(`/api/rounds/${id}`)).status).toBe(200);
  expect((await coach.client.get(`/api/rounds/${theirs}`)).status).toBe(404);
  expect((await coach.client.get(`/api/rounds?playerId=${outsider.id}`)).status).toBe(404);
  expect((await coach.client.put(`/api/rounds/${id}/holes/1`, { firstPuttM: 2, putts: 1 })).status).toBe(404);
});

test("non-uuid round ids are 400; signed out every round route is 401", async () => {
  const { client } = await signedUpClient(server);
  const bad = await client.get("/api/rounds/abc");
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("id");
  expect((await client.delete("/api/rounds/abc")).status).toBe(400);
  expect((await client.put("/api/rounds/abc/holes/1", { firstPuttM: 2, putts: 1 })).status).toBe(400);
  const anon = new HttpClient(server.url);
  for (const [method, url] of [
    ["GET", "/api/rounds"],
    ["POST", "/api/rounds"],
    ["GET", `/api/rounds/${OTHER_UUID}`],
    ["DELETE", `/api/rounds/${OTHER_UUID}`],
    ["PUT", `/api/rounds/${OTHER_UUID}/holes/1`],
  ] as const) {
    expect(
      (await anon.request(method, url, method === "POST" || method === "PUT" ? { date: "2024-06-01" } : undefined)).status,
      `${method} ${url}`,
    ).toBe(401);
  }
});
