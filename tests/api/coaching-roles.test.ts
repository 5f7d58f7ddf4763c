// The role matrix of every coaching route: signed out 401; a player cannot manage squads, invitations or
// ladders (403); a coach gets 404 for another coach's squads, ladders, assignments and players; an admin may.
import { afterAll, beforeAll, expect, test } from "vitest";
import {
  THREE_RUNGS,
  coachWithSquad,
  createLadder,
  createSquad,
  invitationTokenFor,
  joinedPlayer,
  type Person,
} from "../factories/coaching";
import { adminClient, signedUpClient, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
type Actor = "signedOut" | "outsider" | "member" | "otherCoach" | "owner" | "admin";
// Failures first, so a route that changes something does so only at the end of its row.
const ORDER: Actor[] = ["signedOut", "outsider", "member", "otherCoach", "owner", "admin"];
let clients: Record<Actor, HttpClient>;
let f: {
  squadId: string;
  spareSquadId: string;
  ladderId: string;
  spareLadderId: string;
  assignmentId: string;
  invitationId: string;
  token: string;
  member: Person;
  leaver: Person;
  removable: Person;
};

beforeAll(async () => {
  server = await startTestServer();
  const { coach, squadId, members } = await coachWithSquad(server, 3);
  const [member, leaver, removable] = members as [Person, Person, Person];
  const other = await coachWithSquad(server, 1);
  await createLadder(other.coach.client, { ...THREE_RUNGS, name: "Other coach's" });
  const admin = await adminClient(server);
  const outsider = await signedUpClient(server, "player");
  const ladderId = await createLadder(coach.client);
  const spareLadderId = await createLadder(coach.client, { ...THREE_RUNGS, name: "Spare" });
  const spareSquadId = await createSquad(coach.client, "Spare squad");
  const assigned = await coach.client.post(`/api/ladders/${ladderId}/assignments`, { playerIds: [member.id] });
  const email = uniqueEmail("matrix");
  expect((await coach.client.post(`/api/squads/${squadId}/invitations`, { email })).status).toBe(201);
  const token = await invitationTokenFor(server, email);
  const toRevoke = await coach.client.post(`/api/squads/${squadId}/invitations`, { email: uniqueEmail("revoke") });
  f = {
    squadId,
    spareSquadId,
    ladderId,
    spareLadderId,
    assignmentId: assigned.body.assignments[0].id,
    invitationId: toRevoke.body.invitation.id,
    token,
    member,
    leaver,
    removable,
  };
  clients = {
    signedOut: new HttpClient(server.url),
    outsider: outsider.client,
    member: member.client,
    otherCoach: other.coach.client,
    owner: coach.client,
    admin: admin.client,
  };
});
afterAll(async () => {
  await server?.stop();
});

type Row = {
  method: "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
  path: () => string;
  body?: () => unknown;
  expect: Partial<Record<Actor, number>>;
};
/** Coach routes on the owner's resources. A route that destroys its target leaves the success to the admin alone. */
const coachOnly = (ok: number, ownerToo = true) => ({
  signedOut: 401,
  outsider: 403,
  member: 403,
  otherCoach: 404,
  ...(ownerToo ? { owner: ok } : {}),
  admin: ok,
});

const ROWS: Record<string, Row> = {
  "POST /api/squads": {
    method: "POST",
    path: () => "/api/squads",
    body: () => ({ name: "New" }),
    expect: { signedOut: 401, outsider: 403, member: 403, otherCoach: 201, owner: 201, admin: 201 },
  },
  "GET /api/squads": {
    method: "GET",
    path: () => "/api/squads",
    expect: { signedOut: 401, outsider: 200, member: 200, otherCoach: 200, owner: 200, admin: 200 },
  },
  "GET /api/squads/:id": { method: "GET", path: () => `/api/squads/${f.squadId}`, expect: coachOnly(200) },
  "PATCH /api/squads/:id": {
    method: "PATCH",
    path: () => `/api/squads/${f.squadId}`,
    body: () => ({ description: "Edited" }),
    expect: coachOnly(200),
  },
  "DELETE /api/squads/:id": { method: "DELETE", path: () => `/api/squads/${f.spareSquadId}`, expect: coachOnly(204, false) },
  "DELETE /api/squads/:id/members/:playerId": {
    method: "DELETE",
    path: () => `/api/squads/${f.squadId}/members/${f.removable.id}`,
    expect: coachOnly(204, false),
  },
  "POST /api/squads/:id/leave": {
    method: "POST",
    path: () => `/api/squads/${f.squadId}/leave`,
    expect: { signedOut: 401, outsider: 404, otherCoach: 404, owner: 404 },
  },
  "POST /api/squads/:id/invitations": {
    method: "POST",
    path: () => `/api/squads/${f.squadId}/invitations`,
    body: () => ({ email: uniqueEmail("row") }),
    expect: coachOnly(201),
  },
  "GET /api/squads/:id/invitations": { method: "GET", path: () => `/api/squads/${f.squadId}/invitations`, expect: coachOnly(200) },
  "DELETE /api/invitations/:id": { method: "DELETE", path: () => `/api/invitations/${f.invitationId}`, expect: coachOnly(204, false) },
  "GET /api/invitations/:token": { method: "GET", path: () => `/api/invitations/${f.token}`, expect: { signedOut: 200, outsider: 200 } },
  "POST /api/invitations/:token/accept": {
    method: "POST",
    path: () => `/api/invitations/${f.token}/accept`,
    expect: { signedOut: 401, outsider: 403, otherCoach: 403 },
  },
  "POST /api/ladders": {
    method: "POST",
    path: () => "/api/ladders",
    body: () => THREE_RUNGS,
    expect: { signedOut: 401, outsider: 403, member: 403, otherCoach: 201, owner: 201, admin: 201 },
  },
  "GET /api/ladders": {
    method: "GET",
    path: () => "/api/ladders",
    expect: { signedOut: 401, outsider: 403, member: 403, otherCoach: 200, owner: 200, admin: 200 },
  },
  "GET /api/ladders/:id": { method: "GET", path: () => `/api/ladders/${f.ladderId}`, expect: coachOnly(200) },
  "PUT /api/ladders/:id": { method: "PUT", path: () => `/api/ladders/${f.ladderId}`, body: () => THREE_RUNGS, expect: coachOnly(200) },
  "DELETE /api/ladders/:id": { method: "DELETE", path: () => `/api/ladders/${f.spareLadderId}`, expect: coachOnly(204, false) },
  "POST /api/ladders/:id/copy": { method: "POST", path: () => `/api/ladders/${f.ladderId}/copy`, expect: coachOnly(201) },
  "POST /api/ladders/:id/assignments": {
    method: "POST",
    path: () => `/api/ladders/${f.ladderId}/assignments`,
    body: () => ({ playerIds: [f.member.id] }),
    expect: coachOnly(201),
  },
  "GET /api/assignments": {
    method: "GET",
    path: () => "/api/assignments",
    expect: { signedOut: 401, outsider: 200, member: 200, owner: 200, admin: 200 },
  },
  "GET /api/assignments/:id": {
    method: "GET",
    path: () => `/api/assignments/${f.assignmentId}`,
    expect: { signedOut: 401, outsider: 404, member: 200, otherCoach: 404, owner: 200, admin: 200 },
  },
  "POST /api/assignments/:id/putts": {
    method: "POST",
    path: () => `/api/assignments/${f.assignmentId}/putts`,
    body: () => ({ holed: true }),
    expect: { signedOut: 401, outsider: 404, otherCoach: 404, owner: 404, admin: 404, member: 201 },
  },
  "DELETE /api/assignments/:id/putts/last": {
    method: "DELETE",
    path: () => `/api/assignments/${f.assignmentId}/putts/last`,
    expect: { signedOut: 401, outsider: 404, otherCoach: 404, owner: 404, admin: 404 },
  },
  "GET /api/coach/players": {
    method: "GET",
    path: () => "/api/coach/players",
    expect: { signedOut: 401, outsider: 403, member: 403, otherCoach: 200, owner: 200, admin: 200 },
  },
  "GET /api/coach/players/:playerId": { method: "GET", path: () => `/api/coach/players/${f.member.id}`, expect: coachOnly(200) },
  "GET /api/coach/squads/:id/assignments": {
    method: "GET",
    path: () => `/api/coach/squads/${f.squadId}/assignments`,
    expect: coachOnly(200),
  },
};

test.each(Object.keys(ROWS))("%s answers each role as the policy says", async (name) => {
  const row = ROWS[name]!;
  for (const actor of ORDER) {
    const want = row.expect[actor];
    if (want === undefined) continue;
    const res = await clients[actor].request(
      row.method,
      row.path(),
      row.body?.() ?? (["POST", "PUT", "PATCH"].includes(row.method) ? {} : undefined),
    );
    expect(res.status, `${name} as ${actor}: ${JSON.stringify(res.body)}`).toBe(want);
    if (want >= 400) expect(res.body.error.code, `${name} as ${actor}`).toBeTypeOf("string");
  }
});

test("a coach's lists show nothing of another coach's squads, ladders, players or assignments", async () => {
  const other = clients.otherCoach;
  const squads = (await other.get("/api/squads")).body.squads.map((s: { id: string }) => s.id);
  expect(squads).not.toContain(f.squadId);
  const ladders = (await other.get("/api/ladders")).body.ladders.map((l: { id: string }) => l.id);
  expect(ladders).not.toContain(f.ladderId);
  const players = (await other.get("/api/coach/players")).body.players;
  expect(players.map((p: { id: string }) => p.id)).not.toContain(f.member.id);
  expect(JSON.stringify(players)).not.toContain(f.assignmentId);
  // Assigning their own ladder to a player of another squad is refused, naming the player.
  const own = (await other.get("/api/ladders")).body.ladders.find((l: { builtIn: boolean }) => !l.builtIn);
  const res = await other.post(`/api/ladders/${own.id}/assignments`, { playerIds: [f.member.id] });
  expect(res.status).toBe(404);
  expect(res.body.error.message).toContain(f.member.id);
  expect((await other.get(`/api/coach/players/${f.member.id}`)).status).toBe(404);
});

test("an admin sees every squad and player; a player's own lists hold only their own", async () => {
  const adminSquads = (await clients.admin.get("/api/squads")).body.squads.map((s: { id: string }) => s.id);
  expect(adminSquads).toContain(f.squadId);
  const adminPlayers = (await clients.admin.get("/api/coach/players")).body.players.map((p: { id: string }) => p.id);
  expect(adminPlayers).toContain(f.member.id);
  expect((await clients.outsider.get("/api/assignments")).body.assignments).toEqual([]);
  expect((await clients.outsider.get("/api/squads")).body.squads).toEqual([]);
  const mine = (await clients.member.get("/api/assignments")).body.assignments;
  expect(mine.length).toBeGreaterThan(0);
  expect(mine.every((a: { player: { id: string } }) => a.player.id === f.member.id)).toBe(true);
});

test("POST /api/squads/:id/leave lets a member leave (and only once)", async () => {
  expect((await f.leaver.client.post(`/api/squads/${f.squadId}/leave`)).status).toBe(204);
  expect((await f.leaver.client.post(`/api/squads/${f.squadId}/leave`)).status).toBe(404);
  expect((await clients.owner.get(`/api/coach/players/${f.leaver.id}`)).status).toBe(404);
});

test("a player removed from the squad drops out of the coach's view; a new invitation brings them back", async () => {
  const coach = clients.owner;
  const p = await joinedPlayer(server, coach, f.squadId, "Comes back");
  expect((await coach.get(`/api/coach/players/${p.id}`)).status).toBe(200);
  expect((await coach.delete(`/api/squads/${f.squadId}/members/${p.id}`)).status).toBe(204);
  expect((await coach.get(`/api/coach/players/${p.id}`)).status).toBe(404);
  const seen = new Set(server.smtpFake!.messages.map((m) => m.id));
  expect((await coach.post(`/api/squads/${f.squadId}/invitations`, { email: p.email })).status).toBe(201);
  const token = await invitationTokenFor(server, p.email, seen);
  expect((await p.client.post(`/api/invitations/${token}/accept`)).status).toBe(200);
  expect((await coach.get(`/api/coach/players/${p.id}`)).status).toBe(200);
});
