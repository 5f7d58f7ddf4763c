import { afterAll, beforeAll, expect, test } from "vitest";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";
import { OTHER_UUID } from "./practice-helpers";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

test("POST /api/greens creates a green; GET /api/greens lists only mine", async () => {
  const { client } = await signedUpClient(server);
  const made = await client.post("/api/greens", { name: "Home practice green", locationNote: "By the first tee" });
  expect(made.status).toBe(201);
  expect(made.body).toMatchObject({ name: "Home practice green", locationNote: "By the first tee", currentStimpFt: null, readings: [] });
  const other = await signedUpClient(server);
  await other.client.post("/api/greens", { name: "Someone else's" });
  const list = await client.get("/api/greens");
  expect(list.status).toBe(200);
  expect(list.body.items.map((g: { name: string }) => g.name)).toEqual(["Home practice green"]);
});

test("POST /api/greens/:id/stimp-readings corrects a two-way reading with Brede's formula", async () => {
  const { client } = await signedUpClient(server);
  const green = (await client.post("/api/greens", { name: "Sloped green" })).body;
  // A. D. Brede, "Measuring Green Speed on Sloped Putting Greens", USGA Green Section Record 28(6), 1990:
  // worked example [secondary, quoted with the formula]: down 981 cm, up 185 cm → 10.2 ft (plain average 19.1 ft).
  const res = await client.post(`/api/greens/${green.id}/stimp-readings`, {
    measuredOn: "2024-05-01",
    upFt: 1.85 / 0.3048,
    downFt: 9.81 / 0.3048,
  });
  expect(res.status).toBe(201);
  expect(res.body.currentStimpFt).toBeCloseTo(10.2, 1);
  expect(res.body.readings[0]).toMatchObject({ measuredOn: "2024-05-01", upFt: expect.closeTo(6.07, 2), downFt: expect.closeTo(32.19, 2) });
  expect(res.body.currentStimpFt).not.toBeCloseTo(19.1, 0);
});

test("a green's currentStimpFt is its latest reading by date, whatever order they were entered in", async () => {
  const { client } = await signedUpClient(server);
  const id = (await client.post("/api/greens", { name: "Top" })).body.id;
  await client.post(`/api/greens/${id}/stimp-readings`, { measuredOn: "2024-06-10", stimpFt: 10.5 });
  const older = await client.post(`/api/greens/${id}/stimp-readings`, { measuredOn: "2024-05-01", stimpFt: 8.5 });
  expect(older.body.currentStimpFt).toBe(10.5);
  expect(older.body.readings.map((r: { stimpFt: number }) => r.stimpFt)).toEqual([10.5, 8.5]);
  expect((await client.get("/api/greens")).body.items[0].currentStimpFt).toBe(10.5);
  const readingId = older.body.readings[0].id;
  expect((await client.delete(`/api/greens/${id}/stimp-readings/${readingId}`)).status).toBe(204);
  expect((await client.get(`/api/greens/${id}`)).body.currentStimpFt).toBe(8.5);
});

test("POST /api/greens/:id/stimp-readings refuses mixed, half and out-of-range readings, naming the field", async () => {
  const { client } = await signedUpClient(server);
  const id = (await client.post("/api/greens", { name: "Top" })).body.id;
  const cases: [Record<string, unknown>, string, number][] = [
    [{ measuredOn: "2024-05-01", stimpFt: 10, upFt: 8 }, "stimpFt", 400],
    [{ measuredOn: "2024-05-01", upFt: 8 }, "downFt", 400],
    [{ measuredOn: "2024-05-01" }, "stimpFt", 400],
    [{ measuredOn: "2024-05-01", stimpFt: 30 }, "stimpFt", 400],
    [{ measuredOn: "2024-13-01", stimpFt: 10 }, "measuredOn", 400],
    [{ measuredOn: "2024-05-01", stimpFt: "fast" }, "stimpFt", 400],
    // Both rolls inside their own range, but 2·1·1.2/2.2 ≈ 1.1 ft is no green speed: 422.
    [{ measuredOn: "2024-05-01", upFt: 1, downFt: 1.2 }, "upFt", 422],
  ];
  for (const [payload, field, status] of cases) {
    const res = await client.post(`/api/greens/${id}/stimp-readings`, payload);
    expect(res.status, JSON.stringify(payload)).toBe(status);
    expect(res.body.error.fields, JSON.stringify(payload)).toHaveProperty(field);
  }
  expect((await client.get(`/api/greens/${id}`)).body.readings).toEqual([]);
});

test("PATCH /api/greens/:id renames; bad input names the field and changes nothing", async () => {
  const { client } = await signedUpClient(server);
  const id = (await client.post("/api/greens", { name: "Top" })).body.id;
  const ok = await client.patch(`/api/greens/${id}`, { name: "Top green", locationNote: null });
  expect(ok.status).toBe(200);
  expect(ok.body).toMatchObject({ name: "Top green", locationNote: null });
  const bad = await client.patch(`/api/greens/${id}`, { name: "" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("name");
  const unknown = await client.patch(`/api/greens/${id}`, { colour: "green" });
  expect(unknown.status).toBe(400);
  expect((await client.get(`/api/greens/${id}`)).body.name).toBe("Top green");
});

test("another player's green is not found by id: GET, PATCH, DELETE and readings answer 404", async () => {
  const owner = await signedUpClient(server);
  const id = (await owner.client.post("/api/greens", { name: "Mine" })).body.id;
  const intruder = (await signedUpClient(server)).client;
  expect((await intruder.get(`/api/greens/${id}`)).status).toBe(404);
  expect((await intruder.patch(`/api/greens/${id}`, { name: "Taken" })).status).toBe(404);
  expect((await intruder.post(`/api/greens/${id}/stimp-readings`, { measuredOn: "2024-05-01", stimpFt: 9 })).status).toBe(404);
  expect((await intruder.delete(`/api/greens/${id}`)).status).toBe(404);
  const still = await owner.client.get(`/api/greens/${id}`);
  expect(still.body).toMatchObject({ name: "Mine", readings: [] });
  expect((await owner.client.get(`/api/greens/${OTHER_UUID}`)).status).toBe(404);
});

test("DELETE /api/greens/:id removes it", async () => {
  const { client } = await signedUpClient(server);
  const id = (await client.post("/api/greens", { name: "Temporary" })).body.id;
  expect((await client.delete(`/api/greens/${id}`)).status).toBe(204);
  expect((await client.get(`/api/greens/${id}`)).status).toBe(404);
});

test("non-uuid green ids are 400 with the field named", async () => {
  const { client } = await signedUpClient(server);
  for (const res of [
    await client.get("/api/greens/not-a-uuid"),
    await client.patch("/api/greens/not-a-uuid", { name: "x" }),
    await client.delete("/api/greens/not-a-uuid"),
    await client.post("/api/greens/not-a-uuid/stimp-readings", { measuredOn: "2024-05-01", stimpFt: 9 }),
  ]) {
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("id");
  }
  const reading = await client.delete(`/api/greens/${OTHER_UUID}/stimp-readings/xyz`);
  expect(reading.status).toBe(400);
  expect(reading.body.error.fields).toHaveProperty("readingId");
});

test("signed out, every greens route is 401", async () => {
  const anon = new HttpClient(server.url);
  for (const [method, url] of [
    ["GET", "/api/greens"],
    ["POST", "/api/greens"],
    ["GET", `/api/greens/${OTHER_UUID}`],
    ["PATCH", `/api/greens/${OTHER_UUID}`],
    ["DELETE", `/api/greens/${OTHER_UUID}`],
    ["POST", `/api/greens/${OTHER_UUID}/stimp-readings`],
    ["DELETE", `/api/greens/${OTHER_UUID}/stimp-readings/${OTHER_UUID}`],
  ] as const) {
    const res = await anon.request(method, url, method === "GET" || method === "DELETE" ? undefined : { name: "x" });
    expect(res.status, `${method} ${url}`).toBe(401);
  }
});
