import { afterAll, beforeAll, expect, test } from "vitest";
import { ladderInputSchema } from "../../shared/schemas/ladders";
import { THREE_RUNGS, createLadder } from "../factories/coaching";
import { signedUpClient } from "../factories/users";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

test("POST /api/ladders stores the ladder with its rungs in order", async () => {
  const coach = await signedUpClient(server, "coach");
  const res = await coach.client.post("/api/ladders", THREE_RUNGS);
  expect(res.status).toBe(201);
  expect(res.body).toMatchObject({ ...THREE_RUNGS, builtIn: false, ownerId: coach.id, id: expect.any(String) });
  expect(res.body.rungs.map((r: { distanceM: number }) => r.distanceM)).toEqual([1, 2, 3]);
  const got = await coach.client.get(`/api/ladders/${res.body.id}`);
  expect(got.status).toBe(200);
  expect(got.body).toEqual(res.body);
});

test("GET /api/ladders lists the coach's own ladders and the built-in ones, and not another coach's", async () => {
  const coach = await signedUpClient(server, "coach");
  const other = await signedUpClient(server, "coach");
  const mine = await createLadder(coach.client, { ...THREE_RUNGS, name: "Mine" });
  await createLadder(other.client, { ...THREE_RUNGS, name: "Theirs" });
  const res = await coach.client.get("/api/ladders");
  expect(res.status).toBe(200);
  const own = res.body.ladders.filter((l: { builtIn: boolean }) => !l.builtIn);
  expect(own.map((l: { id: string }) => l.id)).toEqual([mine]);
  const builtIn = res.body.ladders.filter((l: { builtIn: boolean }) => l.builtIn);
  expect(builtIn.map((l: { name: string }) => l.name)).toEqual(["Circle of four", "Pace ladder"]);
  for (const l of builtIn) {
    expect(l.ownerId).toBeNull();
    // Every built-in ladder is one a coach could have typed in.
    const { id: _id, builtIn: _b, ownerId: _o, createdAt: _c, updatedAt: _u, ...input } = l;
    expect(ladderInputSchema.safeParse(input).success).toBe(true);
  }
});

test("POST /api/ladders with bad input is a 400 naming each field", async () => {
  const coach = await signedUpClient(server, "coach");
  const cases: Array<[unknown, string]> = [
    [{ ...THREE_RUNGS, rungs: [] }, "rungs"],
    [{ ...THREE_RUNGS, name: "" }, "name"],
    [{ ...THREE_RUNGS, failRule: "start-over" }, "failRule"],
    [{ ...THREE_RUNGS, rungs: [{ distanceM: 1, balls: 3, passRule: { kind: "make", made: 4 } }] }, "rungs.0.passRule"],
    [{ ...THREE_RUNGS, rungs: [THREE_RUNGS.rungs[0], { ...THREE_RUNGS.rungs[1], distanceM: -2 }] }, "rungs.1.distanceM"],
    [{ ...THREE_RUNGS, rungs: [{ distanceM: 1, balls: 3, passRule: { kind: "most", made: 1 } }] }, "rungs.0.passRule.kind"],
    [{ ...THREE_RUNGS, rungs: [{ ...THREE_RUNGS.rungs[0], balls: 2.5 }] }, "rungs.0.balls"],
    [{ ...THREE_RUNGS, owner: "me" }, "body"],
  ];
  for (const [input, field] of cases) {
    const res = await coach.client.post("/api/ladders", input);
    expect(res.status, field).toBe(400);
    expect(Object.keys(res.body.error.fields), field).toContain(field);
  }
  expect((await coach.client.get("/api/ladders")).body.ladders.filter((l: { builtIn: boolean }) => !l.builtIn)).toEqual([]);
});

test("PUT /api/ladders/:id replaces the ladder; DELETE /api/ladders/:id removes it", async () => {
  const coach = await signedUpClient(server, "coach");
  const id = await createLadder(coach.client);
  const changed = { ...THREE_RUNGS, name: "Renamed", failRule: "restart", rungs: THREE_RUNGS.rungs.slice(0, 2) };
  const put = await coach.client.put(`/api/ladders/${id}`, changed);
  expect(put.status).toBe(200);
  expect(put.body).toMatchObject({ id, name: "Renamed", failRule: "restart" });
  expect(put.body.rungs).toHaveLength(2);
  const bad = await coach.client.put(`/api/ladders/${id}`, { ...changed, rungs: "none" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("rungs");
  expect((await coach.client.get(`/api/ladders/${id}`)).body.name).toBe("Renamed");
  expect((await coach.client.delete(`/api/ladders/${id}`)).status).toBe(204);
  expect((await coach.client.get(`/api/ladders/${id}`)).status).toBe(404);
});

test("another coach's ladder answers 404 to GET, PUT, DELETE and copy", async () => {
  const owner = await signedUpClient(server, "coach");
  const other = await signedUpClient(server, "coach");
  const id = await createLadder(owner.client);
  expect((await other.client.get(`/api/ladders/${id}`)).status).toBe(404);
  expect((await other.client.put(`/api/ladders/${id}`, THREE_RUNGS)).status).toBe(404);
  expect((await other.client.delete(`/api/ladders/${id}`)).status).toBe(404);
  expect((await other.client.post(`/api/ladders/${id}/copy`)).status).toBe(404);
  expect((await owner.client.get(`/api/ladders/${id}`)).body.name).toBe(THREE_RUNGS.name);
});

test("built-in ladders can be read and copied but not changed or deleted", async () => {
  const coach = await signedUpClient(server, "coach");
  const builtIn = (await coach.client.get("/api/ladders")).body.ladders.find((l: { name: string }) => l.name === "Circle of four");
  expect((await coach.client.get(`/api/ladders/${builtIn.id}`)).body).toEqual(builtIn);
  expect((await coach.client.put(`/api/ladders/${builtIn.id}`, THREE_RUNGS)).status).toBe(403);
  expect((await coach.client.delete(`/api/ladders/${builtIn.id}`)).status).toBe(403);
  const copy = await coach.client.post(`/api/ladders/${builtIn.id}/copy`);
  expect(copy.status).toBe(201);
  expect(copy.body).toMatchObject({ name: "Circle of four", builtIn: false, ownerId: coach.id, failRule: "restart", rungs: builtIn.rungs });
  expect(copy.body.id).not.toBe(builtIn.id);
  // The copy is the coach's own and can be edited.
  expect((await coach.client.put(`/api/ladders/${copy.body.id}`, { ...THREE_RUNGS, name: "My circle" })).status).toBe(200);
});

test("POST /api/ladders/:id/copy of one's own ladder adds (copy) or takes the given name", async () => {
  const coach = await signedUpClient(server, "coach");
  const id = await createLadder(coach.client);
  const plain = await coach.client.post(`/api/ladders/${id}/copy`);
  expect(plain.status).toBe(201);
  expect(plain.body).toMatchObject({ name: "Test ladder (copy)", rungs: THREE_RUNGS.rungs, description: THREE_RUNGS.description });
  const named = await coach.client.post(`/api/ladders/${id}/copy`, { name: "Second version" });
  expect(named.body.name).toBe("Second version");
  const bad = await coach.client.post(`/api/ladders/${id}/copy`, { name: "" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("name");
  const all = (await coach.client.get("/api/ladders")).body.ladders.filter((l: { builtIn: boolean }) => !l.builtIn);
  expect(all).toHaveLength(3);
});

test("GET /api/ladders/:id with a malformed id is a 400", async () => {
  const coach = await signedUpClient(server, "coach");
  const res = await coach.client.get("/api/ladders/12");
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe("bad_request");
});
