// Greens belong to a person or to a squad (issue 14): the owner shares a green with a squad they coach; its
// players see it, log sessions on it and read on its height map; only the owner changes it.
import { afterAll, beforeAll, expect, test } from "vitest";
import { createSquad, joinedPlayer, type Person } from "../factories/coaching";
import { signedUpClient } from "../factories/users";
import type { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let coach: Person;
let otherCoach: Person;
let squad: string;
let otherSquad: string;
let member: Person;
let outsider: Person;
let green: string;

const plane = { kind: "grid", spacingM: 1, heightsM: Array.from({ length: 5 }, () => [0, 0.01, 0.02, 0.03, 0.04]) };
const names = async (client: HttpClient) => ((await client.get("/api/greens")).body.items as { name: string }[]).map((g) => g.name);

beforeAll(async () => {
  server = await startTestServer();
  coach = await signedUpClient(server, "coach", "Coach Ash");
  otherCoach = await signedUpClient(server, "coach", "Coach Birch");
  squad = await createSquad(coach.client, "Juniors");
  otherSquad = await createSquad(otherCoach.client, "Seniors");
  member = await joinedPlayer(server, coach.client, squad, "Member Player");
  outsider = await joinedPlayer(server, otherCoach.client, otherSquad, "Outsider Player");
  const made = await coach.client.post("/api/greens", { name: "Club green", locationNote: "By the first tee" });
  expect(made.status).toBe(201);
  green = made.body.id;
  expect((await coach.client.post(`/api/greens/${green}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 10.5 })).status).toBe(201);
  expect((await coach.client.put(`/api/greens/${green}/height-map`, plane)).status).toBe(200);
}, 60_000);
afterAll(async () => {
  await server?.stop();
});

test("PUT /api/greens/:id/squad shares the green: the squad's players see it with who keeps it; others do not", async () => {
  // Before sharing, the coach's green is the coach's alone.
  expect(await names(member.client)).toEqual([]);
  expect((await member.client.get(`/api/greens/${green}`)).status).toBe(404);

  const shared = await coach.client.put(`/api/greens/${green}/squad`, { squadId: squad });
  expect(shared.status).toBe(200);
  expect(shared.body).toMatchObject({ squad: { id: squad, name: "Juniors" }, ownerName: "Coach Ash", mine: true });

  const list = await member.client.get("/api/greens");
  expect(list.body.items).toEqual([
    expect.objectContaining({
      id: green,
      name: "Club green",
      currentStimpFt: 10.5,
      squad: { id: squad, name: "Juniors" },
      ownerName: "Coach Ash",
      mine: false,
    }),
  ]);
  const one = await member.client.get(`/api/greens/${green}`);
  expect(one.status).toBe(200);
  expect(one.body.readings).toEqual([expect.objectContaining({ measuredOn: "2026-05-01", stimpFt: 10.5 })]);

  // Not a member: as if there were no such green.
  expect(await names(outsider.client)).toEqual([]);
  expect((await outsider.client.get(`/api/greens/${green}`)).status).toBe(404);
  expect((await otherCoach.client.get(`/api/greens/${green}`)).status).toBe(404);
  expect((await outsider.client.get(`/api/greens/${green}/height-map`)).status).toBe(404);
});

test("a squad player logs a session on the shared green (with its Stimp) and reads on its height map", async () => {
  await coach.client.put(`/api/greens/${green}/squad`, { squadId: squad });
  const session = await member.client.post("/api/sessions", { date: "2026-05-06", greenId: green });
  expect(session.status).toBe(201);
  expect((await member.client.get(`/api/sessions/${session.body.id}`)).body).toMatchObject({
    greenId: green,
    greenName: "Club green",
    stimpFt: 10.5,
  });
  expect((await member.client.get(`/api/greens/${green}/height-map`)).status).toBe(200);
  const read = await member.client.post(`/api/greens/${green}/reads/solve`, { ball: [1, 1], hole: [1, 3], stimpFt: 10 });
  expect(read.status).toBe(200);
  expect(
    (
      await member.client.post("/api/reads", {
        read: { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } },
        greenId: green,
      })
    ).status,
  ).toBe(201);
  // Someone outside the squad cannot use it.
  const refused = await outsider.client.post("/api/sessions", { date: "2026-05-06", greenId: green });
  expect(refused.status).toBe(400);
  expect(refused.body.error.fields).toHaveProperty("greenId");
});

test("a squad player cannot change the shared green: name, readings, height map, sharing, deletion are refused and nothing changes", async () => {
  await coach.client.put(`/api/greens/${green}/squad`, { squadId: squad });
  const before = (await coach.client.get(`/api/greens/${green}`)).body;
  const mapBefore = (await coach.client.get(`/api/greens/${green}/height-map`)).body;
  const p = member.client;
  expect((await p.patch(`/api/greens/${green}`, { name: "Mine now" })).status).toBe(403);
  expect((await p.post(`/api/greens/${green}/stimp-readings`, { measuredOn: "2026-05-02", stimpFt: 8 })).status).toBe(403);
  expect((await p.delete(`/api/greens/${green}/stimp-readings/${before.readings[0].id}`)).status).toBe(403);
  expect((await p.put(`/api/greens/${green}/height-map`, plane)).status).toBe(403);
  expect((await p.delete(`/api/greens/${green}/height-map`)).status).toBe(403);
  expect((await p.delete(`/api/greens/${green}`)).status).toBe(403);
  // Sharing is a coach's: a player is refused by role.
  expect((await p.put(`/api/greens/${green}/squad`, { squadId: null })).status).toBe(403);
  expect((await coach.client.get(`/api/greens/${green}`)).body).toEqual(before);
  expect((await coach.client.get(`/api/greens/${green}/height-map`)).body).toEqual(mapBefore);
});

test("PUT /api/greens/:id/squad with null takes the green back: the squad's players no longer see or use it", async () => {
  await coach.client.put(`/api/greens/${green}/squad`, { squadId: squad });
  const back = await coach.client.put(`/api/greens/${green}/squad`, { squadId: null });
  expect(back.status).toBe(200);
  expect(back.body.squad).toBeNull();
  expect(await names(member.client)).toEqual([]);
  expect((await member.client.get(`/api/greens/${green}`)).status).toBe(404);
  expect((await member.client.post("/api/sessions", { date: "2026-05-07", greenId: green })).status).toBe(400);
  expect((await member.client.get(`/api/greens/${green}/height-map`)).status).toBe(404);
  // Sessions already logged on it keep the green.
  const sessions = await member.client.get("/api/sessions");
  expect(sessions.body.items.some((s: { greenId: string | null }) => s.greenId === green)).toBe(true);
});

test("a coach cannot share into a squad that is not theirs, nor share another's green; nothing changes", async () => {
  const refused = await coach.client.put(`/api/greens/${green}/squad`, { squadId: otherSquad });
  expect(refused.status).toBe(400);
  expect(refused.body.error.fields).toHaveProperty("squadId");
  expect((await coach.client.get(`/api/greens/${green}`)).body.squad).toBeNull();
  expect(await names(outsider.client)).toEqual([]);
  // Another coach cannot share this coach's green into their own squad.
  expect((await otherCoach.client.put(`/api/greens/${green}/squad`, { squadId: otherSquad })).status).toBe(404);
  expect(await names(outsider.client)).toEqual([]);
});

test("PUT /api/greens/:id/squad: a bad squadId or an extra field is a 400 naming it", async () => {
  const bad = await coach.client.put(`/api/greens/${green}/squad`, { squadId: "not-a-uuid" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("squadId");
  const missing = await coach.client.put(`/api/greens/${green}/squad`, {});
  expect(missing.status).toBe(400);
  expect(missing.body.error.fields).toHaveProperty("squadId");
});

test("a player who leaves the squad loses the shared green; deleting the squad leaves the green its owner's", async () => {
  const squad2 = await createSquad(coach.client, "Thursday group");
  const leaver = await joinedPlayer(server, coach.client, squad2, "Leaving Player");
  const g = (await coach.client.post("/api/greens", { name: "Short-game green" })).body.id as string;
  expect((await coach.client.put(`/api/greens/${g}/squad`, { squadId: squad2 })).status).toBe(200);
  expect(await names(leaver.client)).toEqual(["Short-game green"]);
  expect((await leaver.client.post(`/api/squads/${squad2}/leave`, {})).status).toBeLessThan(300);
  expect(await names(leaver.client)).toEqual([]);
  expect((await coach.client.delete(`/api/squads/${squad2}`)).status).toBeLessThan(300);
  const kept = await coach.client.get(`/api/greens/${g}`);
  expect(kept.status).toBe(200);
  expect(kept.body.squad).toBeNull();
});
