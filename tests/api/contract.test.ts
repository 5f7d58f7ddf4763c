// The contract: every /api route is declared with defineRoute (server/lib/route.ts) and has a zod response schema
// from shared/schemas; real answers parse with that schema and carry no field it leaves out (no database row
// leaks). The route table comes from the app (app.locals.apiRoutes), the routes Express serves from its router.
// Outside production the server itself checks every answer, so every HTTP test is also a contract test
// (authorization-matrix.test.ts sends an allowed request to every route); this file reads answers from outside.
import { afterAll, beforeAll, expect, test } from "vitest";
import { z } from "zod";
import { putts, practiceSessions, squadMembers } from "../../server/db/schema";
import { checkResponse, csvFile, noContent, undescribedFields, type RouteDef } from "../../server/lib/route";
import { coachWithSquad, confirmEmail, createLadder, createSquad, invitationTokenFor, THREE_RUNGS } from "../factories/coaching";
import { puttsCsvForm } from "../factories/csv";
import { adminClient, signedUpClient, uniqueEmail } from "../factories/users";
import { HttpClient, type HttpResponse } from "../setup/http";
import { listApiRoutes } from "../setup/routes";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let routes: RouteDef[];
const key = (method: string, path: string) => `${method.toUpperCase()} ${path}`;
/** A route as the table names it, who asks, the URL, and the body for a write. */
type Ask = [route: string, client: HttpClient, url: string, body?: unknown];

/** Logs putts written directly (one session dated today): `[distanceM, count, holed]` per band, the first `holed` made. */
async function logPutts(server: TestServer, playerId: string, bands: [distanceM: number, n: number, holed: number][]) {
  const db = server.database.db;
  const today = new Date().toISOString().slice(0, 10);
  const [s] = await db.insert(practiceSessions).values({ playerId, date: today }).returning({ id: practiceSessions.id });
  await db
    .insert(putts)
    .values(
      bands.flatMap(([distanceM, n, holed]) =>
        Array.from({ length: n }, (_, i) => ({ sessionId: s!.id, playerId, distanceM, holed: i < holed })),
      ),
    );
}

beforeAll(async () => {
  server = await startTestServer();
  routes = server.app.locals.apiRoutes as RouteDef[];
});
afterAll(async () => server?.stop());

test("every route Express serves under /api is in the route table with a zod response schema", () => {
  const table = new Map(routes.map((r) => [key(r.method, `/api${r.path}`), r]));
  const served = listApiRoutes(server.app);
  expect(served.length).toBeGreaterThan(80);
  const missing = served.filter((r) => !table.has(key(r.method, r.path))).map((r) => key(r.method, r.path));
  expect(missing, "routes mounted outside defineRoute").toEqual([]);
  for (const r of routes) expect(r.response, key(r.method, r.path)).toBeInstanceOf(z.ZodType);
});

test("the check refuses a field the schema does not describe (a database row's owner id) and a wrong type", () => {
  const def = {
    method: "post" as const,
    path: "/things",
    response: z.object({ id: z.string(), items: z.array(z.object({ n: z.number() })) }),
  };
  expect(() => checkResponse(def, { id: "a", items: [{ n: 1 }] })).not.toThrow();
  expect(() => checkResponse(def, { id: "a", userId: "u1", items: [] })).toThrow(/userId/);
  expect(() => checkResponse(def, { id: "a", items: [{ n: 1, secret: "x" }] })).toThrow(/items\.0\.secret/);
  expect(() => checkResponse(def, { id: 1, items: [] })).toThrow(/refuses/);
  expect(undescribedFields({ a: 1, b: undefined }, { a: 1 })).toEqual([]);
});

/**
 * One real answer per route of the table, read as a client would: a 2xx, parsed with the route's schema from the
 * table and carrying no field the schema leaves out; a 204 only where the schema is `noContent` (and then no body);
 * a CSV file only where it is `csvFile`. Writes and deletions act on throwaway objects made here. The set of asked
 * routes must equal the table, so a new route without a real-answer check fails this test.
 */
test("real answers of every route in the table match their response schemas", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const admin = await adminClient(server);
  const p = player.client;
  const c = coach.client;
  const a = admin.client;
  const ok = async (res: Promise<HttpResponse>) => {
    const r = await res;
    expect(r.status, JSON.stringify(r.body)).toBeLessThan(300);
    return r.body;
  };
  const read = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };
  const plane = { kind: "grid", spacingM: 1, heightsM: Array.from({ length: 5 }, () => [0, 0.01, 0.02, 0.03, 0.04]) };
  const newGreen = async (who: HttpClient, withMap = false) => {
    const id = (await ok(who.post("/api/greens", { name: "Contract green" }))).id as string;
    if (withMap) await ok(who.put(`/api/greens/${id}/height-map`, plane));
    return id;
  };
  const green = await newGreen(p, true);
  await ok(p.post(`/api/greens/${green}/stimp-readings`, { measuredOn: "2026-04-01", stimpFt: 9.5 }));
  const session = (await ok(p.post("/api/sessions", { date: "2026-05-01", greenId: green }))).id as string;
  const putt = (await ok(p.post(`/api/sessions/${session}/putts`, { distanceM: 3, holed: false, missSide: "left", missLengthM: 0.4 })))
    .id as string;
  const round = (await ok(p.post("/api/rounds", { date: "2026-05-04", holes: [{ holeNumber: 1, firstPuttM: 4, putts: 2 }] }))).id as string;
  const ladder = await createLadder(c, THREE_RUNGS);
  const assign = async (withPutt: boolean) => {
    const id = (await ok(c.post(`/api/ladders/${ladder}/assignments`, { playerIds: [player.id] }))).assignments[0].id as string;
    if (withPutt) await ok(p.post(`/api/assignments/${id}/putts`, { holed: true }));
    return id;
  };
  const assignment = await assign(true);
  await ok(c.post(`/api/players/${player.id}/notes`, { body: "Contract note" }));
  await ok(p.post("/api/training/attempts", { level: "club", putt: read, guess: { aimOffsetM: -0.15, flatPuttLengthM: 3.5 } }));
  // Enough putts for a practice plan (start and adopt answer 409 below 40 per band): the 8 ft band is weak.
  await logPutts(server, player.id, [
    [0.6, 40, 40],
    [1.2, 40, 35],
    [2.4, 40, 8],
    [4.6, 40, 9],
    [6.1, 40, 6],
    [12.2, 40, 2],
  ]);

  // Throwaways for the routes that change or destroy their target.
  const throwaway = {
    read: (await ok(p.post("/api/reads", { read, label: "throwaway" }))).id as string,
    green: await newGreen(p),
    mapGreen: await newGreen(p, true),
    readingGreen: await newGreen(p),
    coachGreen: await newGreen(c),
    session: (await ok(p.post("/api/sessions", { date: "2026-05-02" }))).id as string,
    putt: (await ok(p.post(`/api/sessions/${session}/putts`, { distanceM: 2, holed: true }))).id as string,
    round: (await ok(p.post("/api/rounds", { date: "2026-05-02" }))).id as string,
    ladder: await createLadder(c, { ...THREE_RUNGS, name: "Throwaway ladder" }),
    squad: await createSquad(c, "Throwaway squad"),
    squadWithMember: await createSquad(c, "Squad to remove from"),
    squadToLeave: await createSquad(c, "Squad to leave"),
    assignment: await assign(false),
    user: (await signedUpClient(server, "player", "Throwaway Player")).id,
  };
  const reading = (await ok(p.post(`/api/greens/${throwaway.readingGreen}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 10 })))
    .readings[0].id as string;
  await server.database.db.insert(squadMembers).values([
    { squadId: throwaway.squadWithMember, playerId: player.id },
    { squadId: throwaway.squadToLeave, playerId: player.id },
  ]);
  const invitation = async (email: string) => (await ok(c.post(`/api/squads/${squadId}/invitations`, { email }))).invitation.id as string;
  const [toRevoke, toResend] = [await invitation(uniqueEmail("revoke")), await invitation(uniqueEmail("resend"))];
  // A second player, invited and accepting through the e-mailed token.
  const joiner = await signedUpClient(server, "player", "Joining Player");
  await confirmEmail(server, joiner.email);
  const joinSquad = await createSquad(c, "Squad to join");
  await ok(c.post(`/api/squads/${joinSquad}/invitations`, { email: joiner.email }));
  const token = await invitationTokenFor(server, joiner.email);

  const stats = (path: string, q = "") => `/api/stats/${path}${q}`;
  const asked: Ask[] = [
    ["GET /api/health", p, "/api/health"],
    ["GET /api/me", p, "/api/me"],
    ["PATCH /api/me/preferences", p, "/api/me/preferences", { units: "imperial" }],
    ["POST /api/reads/solve", p, "/api/reads/solve", read],
    ["POST /api/reads/chart", p, "/api/reads/chart", { slopePct: 2, stimpFt: 10, distances: [1, 3], fallLineDegs: [0, 90] }],
    ["POST /api/reads", p, "/api/reads", { read, greenId: green, label: "contract" }],
    ["GET /api/reads", p, "/api/reads"],
    ["DELETE /api/reads/:id", p, `/api/reads/${throwaway.read}`],
    ["POST /api/reads/make-probability", p, "/api/reads/make-probability", { read, samples: 500 }],
    ["GET /api/players/me/dispersion", p, "/api/players/me/dispersion"],

    ["POST /api/squads", c, "/api/squads", { name: "Contract squad" }],
    ["GET /api/squads", p, "/api/squads"],
    ["GET /api/squads/:id", c, `/api/squads/${squadId}`],
    ["PATCH /api/squads/:id", c, `/api/squads/${throwaway.squad}`, { description: "Edited" }],
    ["DELETE /api/squads/:id", c, `/api/squads/${throwaway.squad}`],
    ["DELETE /api/squads/:id/members/:playerId", c, `/api/squads/${throwaway.squadWithMember}/members/${player.id}`],
    ["POST /api/squads/:id/leave", p, `/api/squads/${throwaway.squadToLeave}/leave`, {}],
    ["POST /api/squads/:id/invitations", c, `/api/squads/${squadId}/invitations`, { email: uniqueEmail("contract") }],
    ["GET /api/squads/:id/invitations", c, `/api/squads/${squadId}/invitations`],
    ["DELETE /api/invitations/:id", c, `/api/invitations/${toRevoke}`],
    ["POST /api/invitations/:id/resend", c, `/api/invitations/${toResend}/resend`, {}],
    ["GET /api/invitations/:token", new HttpClient(server.url), `/api/invitations/${token}`],
    ["POST /api/invitations/:token/accept", joiner.client, `/api/invitations/${token}/accept`, {}],

    ["POST /api/ladders", c, "/api/ladders", THREE_RUNGS],
    ["GET /api/ladders", c, "/api/ladders"],
    ["GET /api/ladders/:id", c, `/api/ladders/${ladder}`],
    ["PUT /api/ladders/:id", c, `/api/ladders/${throwaway.ladder}`, { ...THREE_RUNGS, name: "Edited" }],
    ["POST /api/ladders/:id/copy", c, `/api/ladders/${ladder}/copy`, {}],
    ["DELETE /api/ladders/:id", c, `/api/ladders/${throwaway.ladder}`],
    ["POST /api/ladders/:id/assignments", c, `/api/ladders/${ladder}/assignments`, { playerIds: [player.id] }],
    ["GET /api/assignments", p, "/api/assignments"],
    ["GET /api/assignments/:id", p, `/api/assignments/${assignment}`],
    ["POST /api/assignments/:id/putts", p, `/api/assignments/${throwaway.assignment}/putts`, { holed: false }],
    ["DELETE /api/assignments/:id/putts/last", p, `/api/assignments/${throwaway.assignment}/putts/last`],

    ["GET /api/coach/players", c, "/api/coach/players"],
    ["GET /api/coach/players/:playerId", c, `/api/coach/players/${player.id}`],
    ["GET /api/coach/squads/:id/assignments", c, `/api/coach/squads/${squadId}/assignments`],
    ["GET /api/coach/squads/:id/overview", c, `/api/coach/squads/${squadId}/overview`],
    ["GET /api/coach/squads/:id/overview/export", c, `/api/coach/squads/${squadId}/overview/export`],
    ["GET /api/players/:playerId/notes", c, `/api/players/${player.id}/notes`],
    ["POST /api/players/:playerId/notes", c, `/api/players/${player.id}/notes`, { body: "Keep the putter low." }],

    ["GET /api/greens", p, "/api/greens"],
    ["POST /api/greens", p, "/api/greens", { name: "Another green" }],
    ["GET /api/greens/:id", p, `/api/greens/${green}`],
    ["PATCH /api/greens/:id", p, `/api/greens/${throwaway.green}`, { name: "Renamed" }],
    ["POST /api/greens/:id/stimp-readings", p, `/api/greens/${throwaway.green}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 10 }],
    ["DELETE /api/greens/:id/stimp-readings/:readingId", p, `/api/greens/${throwaway.readingGreen}/stimp-readings/${reading}`],
    ["DELETE /api/greens/:id", p, `/api/greens/${throwaway.green}`],
    ["PUT /api/greens/:id/squad", c, `/api/greens/${throwaway.coachGreen}/squad`, { squadId }],
    ["GET /api/greens/:id/height-map", p, `/api/greens/${green}/height-map`],
    ["PUT /api/greens/:id/height-map", p, `/api/greens/${throwaway.mapGreen}/height-map`, { ...plane, spacingM: 0.5 }],
    ["DELETE /api/greens/:id/height-map", p, `/api/greens/${throwaway.mapGreen}/height-map`],
    ["POST /api/greens/:id/reads/solve", p, `/api/greens/${green}/reads/solve`, { ball: [2, 0.5], hole: [2, 3.5], stimpFt: 10 }],

    ["GET /api/sessions", p, "/api/sessions"],
    ["POST /api/sessions", p, "/api/sessions", { date: "2026-05-05" }],
    ["GET /api/sessions/:id", p, `/api/sessions/${session}`],
    ["PATCH /api/sessions/:id", p, `/api/sessions/${throwaway.session}`, { notes: "changed" }],
    ["POST /api/sessions/:id/putts", p, `/api/sessions/${throwaway.session}/putts`, { distanceM: 2, holed: true }],
    ["GET /api/sessions/:id/putts", p, `/api/sessions/${session}/putts`],
    ["DELETE /api/sessions/:id", p, `/api/sessions/${throwaway.session}`],
    ["GET /api/putts", p, "/api/putts"],
    ["GET /api/putts/:id", p, `/api/putts/${putt}`],
    ["DELETE /api/putts/:id", p, `/api/putts/${throwaway.putt}`],

    ["GET /api/rounds", p, "/api/rounds"],
    ["POST /api/rounds", p, "/api/rounds", { date: "2026-05-05" }],
    ["GET /api/rounds/:id", p, `/api/rounds/${round}`],
    ["PUT /api/rounds/:id/holes/:n", p, `/api/rounds/${throwaway.round}/holes/1`, { firstPuttM: 3, putts: 1 }],
    ["DELETE /api/rounds/:id", p, `/api/rounds/${throwaway.round}`],

    ["GET /api/stats/make-rates", p, stats("make-rates")],
    ["GET /api/stats/trend", p, stats("trend")],
    ["GET /api/stats/compare", p, stats("compare", "?aFrom=2026-01-01&aTo=2026-04-30&bFrom=2026-05-01&bTo=2026-12-31")],
    ["GET /api/stats/baseline", p, stats("baseline")],
    ["GET /api/stats/sessions", p, stats("sessions")],
    ["GET /api/stats/misses", p, stats("misses")],

    ["GET /api/practice-plan", p, "/api/practice-plan"],
    ["POST /api/practice-plan/adopt", c, "/api/practice-plan/adopt", { playerId: player.id }],
    ["POST /api/practice-plan/start", p, "/api/practice-plan/start", {}],

    ["POST /api/csv/putts/preview", p, "/api/csv/putts/preview", puttsCsvForm(3)],
    ["POST /api/csv/putts/import", p, "/api/csv/putts/import", puttsCsvForm(3)],
    ["GET /api/csv/putts/export", p, "/api/csv/putts/export"],
    ["GET /api/csv/sessions/export", p, "/api/csv/sessions/export"],

    [
      "POST /api/training/attempts",
      p,
      "/api/training/attempts",
      {
        level: "club",
        putt: { ...read, distanceM: 3.3 },
        guess: { aimOffsetM: -0.1, flatPuttLengthM: 3.4 },
      },
    ],
    ["GET /api/training/attempts", p, "/api/training/attempts"],

    ["GET /api/admin/users", a, "/api/admin/users"],
    ["POST /api/admin/users/:id/role", a, `/api/admin/users/${throwaway.user}/role`, { role: "coach" }],
    ["POST /api/admin/users/:id/revoke-sessions", a, `/api/admin/users/${throwaway.user}/revoke-sessions`, {}],
    ["POST /api/admin/users/:id/password-reset", a, `/api/admin/users/${throwaway.user}/password-reset`, {}],
    ["POST /api/admin/users/:id/ban", a, `/api/admin/users/${throwaway.user}/ban`, { reason: "contract" }],
    ["POST /api/admin/users/:id/unban", a, `/api/admin/users/${throwaway.user}/unban`, {}],
    ["GET /api/admin/audit", a, "/api/admin/audit"],
    ["GET /api/admin/coaching", a, "/api/admin/coaching"],
    ["GET /api/dev/mail", a, "/api/dev/mail"],
  ];

  const table = new Map(routes.map((r) => [key(r.method, `/api${r.path}`), r]));
  const names = asked.map(([route]) => route);
  expect(new Set(names).size, "a route is asked twice").toBe(names.length);
  expect([...new Set(names)].sort(), "the asked routes are exactly the route table").toEqual([...table.keys()].sort());

  for (const [route, client, url, body] of asked) {
    const def = table.get(route)!;
    const res = await client.request(def.method.toUpperCase(), url, body);
    expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBeGreaterThanOrEqual(200);
    expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBeLessThan(300);
    if (res.status === 204) {
      expect(def.response, `${route} answers 204: its schema must be noContent`).toBe(noContent);
      expect(res.body, `${route}: a 204 has no body`).toBe("");
      continue;
    }
    expect(def.response, `${route} answers ${res.status} with a body, its schema says 204`).not.toBe(noContent);
    let value: unknown = res.body;
    if (def.response === csvFile) {
      expect(res.headers.get("content-type"), route).toMatch(/^text\/csv/);
      const filename = res.headers.get("content-disposition")?.match(/filename="?([^";]+)"?/)?.[1];
      value = { filename, csv: res.body };
    } else {
      expect(res.headers.get("content-type"), route).toMatch(/^application\/json/);
    }
    const parsed = def.response.safeParse(value);
    expect(parsed.success, `${route}: ${parsed.success ? "" : z.prettifyError(parsed.error)}`).toBe(true);
    expect(undescribedFields(value, parsed.data), route).toEqual([]);
  }
});

test("POST /api/reads answers the saved read, never the database row (no owner id)", async () => {
  const { members } = await coachWithSquad(server, 1);
  const res = await members[0]!.client.post("/api/reads", {
    read: { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
    label: "mine",
  });
  expect(res.status).toBe(201);
  expect(res.body).not.toHaveProperty("userId");
  expect(Object.keys(res.body).sort()).toEqual(["createdAt", "greenId", "greenName", "id", "input", "label", "result"]);
  expect(res.body.result).not.toHaveProperty("path");
});
