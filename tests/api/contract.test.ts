// The contract: every /api route is declared with defineRoute (server/lib/route.ts) and has a zod response schema
// from shared/schemas; real answers parse with that schema and carry no field it leaves out (no database row
// leaks). The route table comes from the app (app.locals.apiRoutes), the routes Express serves from its router.
// Outside production the server itself checks every answer, so every HTTP test is also a contract test
// (authorization-matrix.test.ts sends an allowed request to every route); this file reads answers from outside.
import { afterAll, beforeAll, expect, test } from "vitest";
import { z } from "zod";
import { checkResponse, undescribedFields, type RouteDef } from "../../server/lib/route";
import { coachWithSquad, createLadder, THREE_RUNGS } from "../factories/coaching";
import { adminClient } from "../factories/users";
import type { HttpClient, HttpResponse } from "../setup/http";
import { listApiRoutes } from "../setup/routes";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let routes: RouteDef[];
const key = (method: string, path: string) => `${method.toUpperCase()} ${path}`;

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

/** One real answer per route, read as a client would: status 2xx, parsed with the route's schema from the table. */
test("real answers of the route table match their response schemas", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const admin = await adminClient(server);
  const p = player.client;
  const c = coach.client;
  const ok = async (res: Promise<HttpResponse>) => {
    const r = await res;
    expect(r.status, JSON.stringify(r.body)).toBeLessThan(300);
    return r.body;
  };
  const read = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };
  const green = (await ok(p.post("/api/greens", { name: "Contract green" }))).id as string;
  await ok(p.post(`/api/greens/${green}/stimp-readings`, { measuredOn: "2026-04-01", stimpFt: 9.5 }));
  await ok(
    p.put(`/api/greens/${green}/height-map`, {
      kind: "grid",
      spacingM: 1,
      heightsM: Array.from({ length: 5 }, () => [0, 0.01, 0.02, 0.03, 0.04]),
    }),
  );
  const session = (await ok(p.post("/api/sessions", { date: "2026-05-01", greenId: green }))).id as string;
  const putt = (await ok(p.post(`/api/sessions/${session}/putts`, { distanceM: 3, holed: false, missSide: "left", missLengthM: 0.4 })))
    .id as string;
  const round = (await ok(p.post("/api/rounds", { date: "2026-05-04", holes: [{ holeNumber: 1, firstPuttM: 4, putts: 2 }] }))).id as string;
  const ladder = await createLadder(c, THREE_RUNGS);
  const assignment = (await ok(c.post(`/api/ladders/${ladder}/assignments`, { playerIds: [player.id] }))).assignments[0].id as string;
  await ok(p.post(`/api/assignments/${assignment}/putts`, { holed: true }));

  const asked: Array<[string, HttpClient, string, unknown?]> = [
    ["GET /api/health", p, "/api/health"],
    ["GET /api/me", p, "/api/me"],
    ["POST /api/reads/solve", p, "/api/reads/solve", read],
    ["POST /api/reads/chart", p, "/api/reads/chart", { slopePct: 2, stimpFt: 10, distances: [1, 3], fallLineDegs: [0, 90] }],
    ["POST /api/reads", p, "/api/reads", { read, greenId: green, label: "contract" }],
    ["GET /api/reads", p, "/api/reads"],
    ["GET /api/greens", p, "/api/greens"],
    ["GET /api/greens/:id", p, `/api/greens/${green}`],
    ["GET /api/greens/:id/height-map", p, `/api/greens/${green}/height-map`],
    ["POST /api/greens/:id/reads/solve", p, `/api/greens/${green}/reads/solve`, { ball: [2, 0.5], hole: [2, 3.5], stimpFt: 10 }],
    ["GET /api/sessions", p, "/api/sessions"],
    ["GET /api/sessions/:id", p, `/api/sessions/${session}`],
    ["GET /api/sessions/:id/putts", p, `/api/sessions/${session}/putts`],
    ["GET /api/putts", p, "/api/putts"],
    ["GET /api/putts/:id", p, `/api/putts/${putt}`],
    ["GET /api/rounds", p, "/api/rounds"],
    ["GET /api/rounds/:id", p, `/api/rounds/${round}`],
    ["GET /api/stats/make-rates", p, "/api/stats/make-rates"],
    ["GET /api/stats/trend", p, "/api/stats/trend"],
    ["GET /api/stats/compare", p, "/api/stats/compare?aFrom=2026-01-01&aTo=2026-04-30&bFrom=2026-05-01&bTo=2026-12-31"],
    ["GET /api/stats/baseline", p, "/api/stats/baseline"],
    ["GET /api/stats/sessions", p, "/api/stats/sessions"],
    ["GET /api/stats/misses", p, "/api/stats/misses"],
    ["GET /api/players/me/dispersion", p, "/api/players/me/dispersion"],
    ["POST /api/reads/make-probability", p, "/api/reads/make-probability", { read, samples: 500 }],
    ["GET /api/assignments", p, "/api/assignments"],
    ["GET /api/assignments/:id", p, `/api/assignments/${assignment}`],
    ["GET /api/squads", p, "/api/squads"],
    ["GET /api/squads/:id", c, `/api/squads/${squadId}`],
    ["GET /api/squads/:id/invitations", c, `/api/squads/${squadId}/invitations`],
    ["GET /api/ladders", c, "/api/ladders"],
    ["GET /api/ladders/:id", c, `/api/ladders/${ladder}`],
    ["GET /api/coach/players", c, "/api/coach/players"],
    ["GET /api/coach/players/:playerId", c, `/api/coach/players/${player.id}`],
    ["GET /api/coach/squads/:id/assignments", c, `/api/coach/squads/${squadId}/assignments`],
    ["GET /api/coach/squads/:id/overview", c, `/api/coach/squads/${squadId}/overview`],
    ["GET /api/players/:playerId/notes", c, `/api/players/${player.id}/notes`],
    ["GET /api/training/attempts", p, "/api/training/attempts"],
    ["GET /api/admin/users", admin.client, "/api/admin/users"],
    ["GET /api/admin/audit", admin.client, "/api/admin/audit"],
    ["GET /api/admin/coaching", admin.client, "/api/admin/coaching"],
    ["GET /api/dev/mail", admin.client, "/api/dev/mail"],
  ];
  const table = new Map(routes.map((r) => [key(r.method, `/api${r.path}`), r]));
  for (const [route, client, url, body] of asked) {
    const def = table.get(route);
    expect(def, route).toBeDefined();
    const res = body === undefined ? await client.get(url) : await client.post(url, body);
    expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBeLessThan(300);
    const parsed = def!.response.safeParse(res.body);
    expect(parsed.success, `${route}: ${parsed.success ? "" : z.prettifyError(parsed.error)}`).toBe(true);
    expect(undescribedFields(res.body, parsed.data), route).toEqual([]);
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
