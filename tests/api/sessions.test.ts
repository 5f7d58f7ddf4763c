import { afterAll, beforeAll, expect, test } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { putts } from "../../server/db/schema";
import { adminClient, signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";
import { addPutts, makeSquad, newSession, OTHER_UUID, puttsAt } from "./practice-helpers";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

test("POST /api/sessions answers 201 with the id; GET /api/sessions/:id answers the session", async () => {
  const { client, id: me } = await signedUpClient(server);
  const res = await client.post("/api/sessions", { date: "2024-05-01", conditions: "Dry", tags: ["short putts"], notes: "Gate drill" });
  expect(res.status).toBe(201);
  expect(Object.keys(res.body)).toEqual(["id"]);
  const got = await client.get(`/api/sessions/${res.body.id}`);
  expect(got.status).toBe(200);
  expect(got.body).toEqual({
    id: res.body.id,
    playerId: me,
    date: "2024-05-01",
    greenId: null,
    greenName: null,
    stimpFt: null,
    conditions: "Dry",
    tags: ["short putts"],
    notes: "Gate drill",
    putts: 0,
    holed: 0,
    makeRate: null,
  });
});

test("POST /api/sessions on a green takes the green's Stimp on that date unless one is given", async () => {
  const { client } = await signedUpClient(server);
  const green = (await client.post("/api/greens", { name: "Top green" })).body;
  await client.post(`/api/greens/${green.id}/stimp-readings`, { measuredOn: "2024-05-01", stimpFt: 9 });
  await client.post(`/api/greens/${green.id}/stimp-readings`, { measuredOn: "2024-06-01", stimpFt: 10.5 });
  const may = await newSession(client, { date: "2024-05-20", greenId: green.id });
  const june = await newSession(client, { date: "2024-06-02", greenId: green.id });
  const given = await newSession(client, { date: "2024-06-02", greenId: green.id, stimpFt: 11 });
  const april = await newSession(client, { date: "2024-04-01", greenId: green.id });
  expect((await client.get(`/api/sessions/${may}`)).body).toMatchObject({ stimpFt: 9, greenName: "Top green" });
  expect((await client.get(`/api/sessions/${june}`)).body.stimpFt).toBe(10.5);
  expect((await client.get(`/api/sessions/${given}`)).body.stimpFt).toBe(11);
  expect((await client.get(`/api/sessions/${april}`)).body.stimpFt).toBeNull();
});

test("POST /api/sessions refuses bad input with the field named and stores nothing", async () => {
  const { client } = await signedUpClient(server);
  const other = await signedUpClient(server);
  const foreignGreen = (await other.client.post("/api/greens", { name: "Not yours" })).body.id;
  const cases: [Record<string, unknown>, string][] = [
    [{}, "date"],
    [{ date: "01/05/2024" }, "date"],
    [{ date: "2024-05-01", stimpFt: 40 }, "stimpFt"],
    [{ date: "2024-05-01", tags: ["x".repeat(31)] }, "tags.0"],
    [{ date: "2024-05-01", tags: "dry" }, "tags"],
    [{ date: "2024-05-01", greenId: "green-1" }, "greenId"],
    [{ date: "2024-05-01", greenId: foreignGreen }, "greenId"],
    [{ date: "2024-05-01", mood: "good" }, "body"],
    // PostgreSQL text cannot hold NUL: refused at the edge, not a 500 from the database.
    [{ date: "2024-05-01", notes: "gate\u0000drill" }, "notes"],
  ];
  for (const [payload, field] of cases) {
    const res = await client.post("/api/sessions", payload);
    expect(res.status, JSON.stringify(payload)).toBe(400);
    expect(res.body.error.fields, JSON.stringify(payload)).toHaveProperty(field);
  }
  expect((await client.get("/api/sessions")).body.total).toBe(0);
});

test("GET /api/sessions sorts, filters and paginates on the server", async () => {
  const { client } = await signedUpClient(server);
  const green = (await client.post("/api/greens", { name: "Lower green" })).body.id;
  const a = await newSession(client, { date: "2024-05-01" });
  const b = await newSession(client, { date: "2024-05-08", greenId: green });
  const c = await newSession(client, { date: "2024-05-15" });
  await newSession(client, { date: "2024-05-22" }); // no putts
  await addPutts(client, a, puttsAt(1, 1, 3)); // 4 putts, 25 %
  await addPutts(client, b, puttsAt(1, 2, 0)); // 2 putts, 100 %
  await addPutts(client, c, puttsAt(1, 3, 3)); // 6 putts, 50 %

  const page1 = await client.get("/api/sessions?pageSize=3&page=1");
  expect(page1.status).toBe(200);
  expect(page1.body).toMatchObject({ total: 4, page: 1, pageSize: 3 });
  expect(page1.body.items.map((s: { date: string }) => s.date)).toEqual(["2024-05-22", "2024-05-15", "2024-05-08"]);
  const page2 = await client.get("/api/sessions?pageSize=3&page=2");
  expect(page2.body.items.map((s: { date: string }) => s.date)).toEqual(["2024-05-01"]);

  expect((await client.get("/api/sessions?sort=date")).body.items[0].id).toBe(a);
  expect((await client.get("/api/sessions?sort=-putts")).body.items.map((s: { putts: number }) => s.putts)).toEqual([6, 4, 2, 0]);
  // makeRate: empty sessions have no rate and sort last either way.
  expect((await client.get("/api/sessions?sort=-makeRate")).body.items.map((s: { makeRate: number | null }) => s.makeRate)).toEqual([
    1,
    0.5,
    0.25,
    null,
  ]);
  expect((await client.get("/api/sessions?sort=makeRate")).body.items.map((s: { makeRate: number | null }) => s.makeRate)).toEqual([
    0.25,
    0.5,
    1,
    null,
  ]);

  const ranged = await client.get("/api/sessions?from=2024-05-08&to=2024-05-15");
  expect(ranged.body.items.map((s: { id: string }) => s.id)).toEqual([c, b]);
  const onGreen = await client.get(`/api/sessions?greenId=${green}`);
  expect(onGreen.body.items).toHaveLength(1);
  expect(onGreen.body.items[0]).toMatchObject({ id: b, greenName: "Lower green", putts: 2, holed: 2 });
});

test("GET /api/sessions refuses bad query strings with the field named", async () => {
  const { client } = await signedUpClient(server);
  for (const [qs, field] of [
    ["page=0", "page"],
    ["pageSize=1000", "pageSize"],
    ["page=abc", "page"],
    ["sort=green", "sort"],
    ["from=2024-06-01&to=2024-05-01", "to"],
    ["greenId=nope", "greenId"],
    ["colour=red", "query"],
    ["playerId=%00", "playerId"],
  ]) {
    const res = await client.get(`/api/sessions?${qs}`);
    expect(res.status, qs).toBe(400);
    expect(res.body.error.fields, qs).toHaveProperty(field!);
  }
});

test("PATCH /api/sessions/:id changes the given fields; bad input changes nothing", async () => {
  const { client } = await signedUpClient(server);
  const id = await newSession(client, { date: "2024-05-01", notes: "first" });
  const ok = await client.patch(`/api/sessions/${id}`, { date: "2024-05-02", tags: ["wind"], notes: null });
  expect(ok.status).toBe(200);
  expect(ok.body).toMatchObject({ date: "2024-05-02", tags: ["wind"], notes: null });
  const bad = await client.patch(`/api/sessions/${id}`, { date: "yesterday" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("date");
  expect((await client.patch(`/api/sessions/${id}`, {})).status).toBe(400);
  expect((await client.get(`/api/sessions/${id}`)).body.date).toBe("2024-05-02");
});

test("DELETE /api/sessions/:id removes the session and its putts", async () => {
  const { client } = await signedUpClient(server);
  const id = await newSession(client);
  const [puttId] = await addPutts(client, id, puttsAt(2, 1, 0));
  expect((await client.delete(`/api/sessions/${id}`)).status).toBe(204);
  expect((await client.get(`/api/sessions/${id}`)).status).toBe(404);
  expect(await server.database.db.select().from(putts).where(eq(putts.id, puttId!))).toHaveLength(0);
});

test("DELETE /api/greens/:id keeps the sessions logged on it and their putts", async () => {
  const { client } = await signedUpClient(server);
  const green = (await client.post("/api/greens", { name: "Going away" })).body.id;
  const id = await newSession(client, { date: "2024-05-01", greenId: green });
  await addPutts(client, id, puttsAt(2, 1, 1));
  expect((await client.delete(`/api/greens/${green}`)).status).toBe(204);
  expect((await client.get(`/api/sessions/${id}`)).body).toMatchObject({ greenId: null, greenName: null, putts: 2, holed: 1 });
});

test("POST /api/sessions/:id/putts stores a putt; the miss rules and distance limits name the field", async () => {
  const { client } = await signedUpClient(server);
  const id = await newSession(client);
  const ok = await client.post(`/api/sessions/${id}/putts`, {
    distanceM: 3.2,
    holed: false,
    missSide: "right",
    missLengthM: -0.3,
    breakType: "uphill",
  });
  expect(ok.status).toBe(201);
  const cases: [Record<string, unknown>, string][] = [
    [{ distanceM: 2, holed: true, missSide: "left" }, "missSide"],
    [{ distanceM: 2, holed: true, missLengthM: 0.5 }, "missLengthM"],
    [{ distanceM: 0.05, holed: true }, "distanceM"],
    [{ distanceM: 61, holed: false }, "distanceM"],
    [{ distanceM: 2, holed: "yes" }, "holed"],
    [{ distanceM: 2, holed: false, missSide: "centre" }, "missSide"],
    [{ distanceM: 2, holed: false, breakType: "sidehill" }, "breakType"],
    [{ distanceM: 2, holed: false, missLengthM: 45 }, "missLengthM"],
    [{ distanceM: 2, holed: false, clientId: "abc" }, "clientId"],
    [{ holed: false }, "distanceM"],
  ];
  for (const [payload, field] of cases) {
    const res = await client.post(`/api/sessions/${id}/putts`, payload);
    expect(res.status, JSON.stringify(payload)).toBe(400);
    expect(res.body.error.fields, JSON.stringify(payload)).toHaveProperty(field);
  }
  const list = await client.get(`/api/sessions/${id}/putts`);
  expect(list.body.items).toHaveLength(1);
  expect(list.body.items[0]).toMatchObject({
    distanceM: 3.2,
    holed: false,
    missSide: "right",
    missLengthM: -0.3,
    breakType: "uphill",
    date: "2024-05-01",
    sessionId: id,
  });
});

test("POST /api/sessions/:id/putts with a clientId stores the putt once: a retry answers 200 with the same id", async () => {
  const { client } = await signedUpClient(server);
  const id = await newSession(client);
  const clientId = randomUUID();
  const first = await client.post(`/api/sessions/${id}/putts`, { distanceM: 1.5, holed: true, clientId });
  expect(first.status).toBe(201);
  const retry = await client.post(`/api/sessions/${id}/putts`, { distanceM: 1.5, holed: true, clientId });
  expect(retry.status).toBe(200);
  expect(retry.body.id).toBe(first.body.id);
  // Two retries racing each other: still one row.
  const racing = randomUUID();
  const both = await Promise.all(
    [1, 2, 3].map(() => client.post(`/api/sessions/${id}/putts`, { distanceM: 2, holed: false, clientId: racing })),
  );
  expect(both.map((r) => r.status).sort()).toEqual([200, 200, 201]);
  expect(new Set(both.map((r) => r.body.id)).size).toBe(1);
  expect((await client.get(`/api/sessions/${id}/putts`)).body.items).toHaveLength(2);
  // The same clientId in another session is a conflict, not a silent move.
  const other = await newSession(client);
  expect((await client.post(`/api/sessions/${other}/putts`, { distanceM: 1.5, holed: true, clientId })).status).toBe(409);
});

test("GET /api/putts lists all my putts with server-side sorting, filters and pages", async () => {
  const { client } = await signedUpClient(server);
  const s1 = await newSession(client, { date: "2024-05-01" });
  const s2 = await newSession(client, { date: "2024-05-10" });
  await addPutts(client, s1, [
    { distanceM: 1, holed: true },
    { distanceM: 5, holed: false, breakType: "downhill" },
  ]);
  await addPutts(client, s2, [
    { distanceM: 3, holed: true, breakType: "downhill" },
    { distanceM: 9, holed: false },
    { distanceM: 0.5, holed: true },
  ]);
  const all = await client.get("/api/putts?pageSize=2&sort=-distance");
  expect(all.body).toMatchObject({ total: 5, page: 1, pageSize: 2 });
  expect(all.body.items.map((p: { distanceM: number }) => p.distanceM)).toEqual([9, 5]);
  expect(
    (await client.get("/api/putts?sort=distance&page=3&pageSize=2")).body.items.map((p: { distanceM: number }) => p.distanceM),
  ).toEqual([9]);
  expect((await client.get("/api/putts?sort=-date")).body.items[0].date).toBe("2024-05-10");
  expect((await client.get("/api/putts?holed=false")).body.total).toBe(2);
  expect((await client.get("/api/putts?breakType=downhill")).body.total).toBe(2);
  expect((await client.get("/api/putts?minM=1&maxM=5")).body.total).toBe(3);
  expect((await client.get("/api/putts?from=2024-05-05")).body.total).toBe(3);
  expect((await client.get(`/api/putts?sessionId=${s1}`)).body.total).toBe(2);
  for (const [qs, field] of [
    ["holed=maybe", "holed"],
    ["minM=5&maxM=1", "maxM"],
    ["sort=speed", "sort"],
    ["pageSize=500", "pageSize"],
  ]) {
    const res = await client.get(`/api/putts?${qs}`);
    expect(res.status, qs).toBe(400);
    expect(res.body.error.fields).toHaveProperty(field!);
  }
});

test("DELETE /api/putts/:id removes my putt", async () => {
  const { client } = await signedUpClient(server);
  const id = await newSession(client);
  const [p] = await addPutts(client, id, puttsAt(2, 1, 0));
  expect((await client.delete(`/api/putts/${p}`)).status).toBe(204);
  expect((await client.delete(`/api/putts/${p}`)).status).toBe(404);
  expect((await client.get(`/api/sessions/${id}`)).body.putts).toBe(0);
});

test("a player cannot read or write another player's sessions and putts by guessing ids (404), nor ask by playerId (403)", async () => {
  const owner = await signedUpClient(server);
  const id = await newSession(owner.client, { date: "2024-05-01", notes: "private" });
  const [p] = await addPutts(owner.client, id, puttsAt(2, 1, 0));
  const other = (await signedUpClient(server)).client;
  expect((await other.get(`/api/sessions/${id}`)).status).toBe(404);
  expect((await other.patch(`/api/sessions/${id}`, { notes: "mine now" })).status).toBe(404);
  expect((await other.delete(`/api/sessions/${id}`)).status).toBe(404);
  expect((await other.post(`/api/sessions/${id}/putts`, { distanceM: 1, holed: true })).status).toBe(404);
  expect((await other.get(`/api/sessions/${id}/putts`)).status).toBe(404);
  expect((await other.get(`/api/putts/${p}`)).status).toBe(404);
  expect((await other.delete(`/api/putts/${p}`)).status).toBe(404);
  expect((await other.get(`/api/sessions?playerId=${owner.id}`)).status).toBe(403);
  expect((await other.get(`/api/putts?playerId=${owner.id}`)).status).toBe(403);
  expect((await other.get("/api/putts")).body.total).toBe(0);
  const still = await owner.client.get(`/api/sessions/${id}`);
  expect(still.body).toMatchObject({ notes: "private", putts: 1 });
});

test("a coach reads the sessions and putts of players in their own squads only, and writes none of them", async () => {
  const coach = await signedUpClient(server, "coach");
  const member = await signedUpClient(server);
  const outsider = await signedUpClient(server);
  await makeSquad(server, coach.id, [member.id]);
  const otherCoach = await signedUpClient(server, "coach");
  await makeSquad(server, otherCoach.id, [outsider.id]);
  const mine = await newSession(member.client, { date: "2024-05-01" });
  await addPutts(member.client, mine, puttsAt(2, 2, 1));
  const theirs = await newSession(outsider.client, { date: "2024-05-01" });

  const list = await coach.client.get(`/api/sessions?playerId=${member.id}`);
  expect(list.status).toBe(200);
  expect(list.body.items.map((s: { id: string }) => s.id)).toEqual([mine]);
  expect((await coach.client.get(`/api/sessions/${mine}`)).body).toMatchObject({ putts: 3, holed: 2 });
  expect((await coach.client.get(`/api/sessions/${mine}/putts`)).body.items).toHaveLength(3);
  expect((await coach.client.get(`/api/putts?playerId=${member.id}`)).body.total).toBe(3);
  // Not the coach's player: as if absent.
  expect((await coach.client.get(`/api/sessions?playerId=${outsider.id}`)).status).toBe(404);
  expect((await coach.client.get(`/api/sessions/${theirs}`)).status).toBe(404);
  // Reading is not writing.
  expect((await coach.client.patch(`/api/sessions/${mine}`, { notes: "coach was here" })).status).toBe(404);
  expect((await coach.client.post(`/api/sessions/${mine}/putts`, { distanceM: 1, holed: true })).status).toBe(404);
  expect((await coach.client.delete(`/api/sessions/${mine}`)).status).toBe(404);
  expect((await member.client.get(`/api/sessions/${mine}`)).body.putts).toBe(3);
});

test("an admin may read any player's sessions by playerId; an unknown playerId is 404", async () => {
  const admin = await adminClient(server);
  const player = await signedUpClient(server);
  await newSession(player.client);
  expect((await admin.client.get(`/api/sessions?playerId=${player.id}`)).body.total).toBe(1);
  expect((await admin.client.get("/api/sessions?playerId=no-such-user")).status).toBe(404);
});

test("non-uuid ids on session and putt routes are 400", async () => {
  const { client } = await signedUpClient(server);
  const results = [
    await client.get("/api/sessions/123"),
    await client.patch("/api/sessions/123", { notes: "x" }),
    await client.delete("/api/sessions/123"),
    await client.post("/api/sessions/123/putts", { distanceM: 1, holed: true }),
    await client.get("/api/sessions/123/putts"),
    await client.get("/api/putts/123"),
    await client.delete("/api/putts/123"),
  ];
  for (const res of results) {
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("id");
  }
});

test("signed out, every session and putt route is 401", async () => {
  const anon = new HttpClient(server.url);
  for (const [method, url] of [
    ["GET", "/api/sessions"],
    ["POST", "/api/sessions"],
    ["GET", `/api/sessions/${OTHER_UUID}`],
    ["PATCH", `/api/sessions/${OTHER_UUID}`],
    ["DELETE", `/api/sessions/${OTHER_UUID}`],
    ["POST", `/api/sessions/${OTHER_UUID}/putts`],
    ["GET", `/api/sessions/${OTHER_UUID}/putts`],
    ["GET", "/api/putts"],
    ["GET", `/api/putts/${OTHER_UUID}`],
    ["DELETE", `/api/putts/${OTHER_UUID}`],
  ] as const) {
    const res = await anon.request(method, url, method === "GET" || method === "DELETE" ? undefined : { date: "2024-05-01" });
    expect(res.status, `${method} ${url}`).toBe(401);
  }
});
