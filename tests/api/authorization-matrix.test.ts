// The authorization matrix: every API route (listApiRoutes) × six personas, one table row per route.
// Personas: signed out; P1, a player in squad S1 of coach C1; P2, a player in squad S2 of coach C2; C1; C2;
// an admin. Expected statuses follow the product brief's roles table and the handlers: a player reads
// only their own practice; a coach also reads (never writes) the practice of the players in their own
// squads; an admin reads any practice and manages any squad or ladder; saved reads and training history are
// their owner's alone; a green is its owner's, and the players and coach of the squad it is shared with read it. Every request is also checked for leaks: a response never carries a
// marker (an id or a distinctive text) of data the persona may not see, a refused request answers the
// error shape without the ids from its path, and it changes nothing (the database fingerprint, and the
// resource read back by its owner). A route missing from the table fails the first test.
import { databaseFingerprint } from "../setup/fingerprint";
import { afterAll, beforeAll, expect, test } from "vitest";
import { squadMembers } from "../../server/db/schema";
import { THREE_RUNGS, createLadder, createSquad, invitationTokenFor, joinedPlayer, type Person } from "../factories/coaching";
import { adminClient, signedUpClient, uniqueEmail } from "../factories/users";
import { HttpClient, type HttpResponse } from "../setup/http";
import { fillPath, listApiRoutes } from "../setup/routes";
import { startTestServer, type TestServer } from "../setup/server";

type Persona = "anon" | "p1" | "p2" | "c1" | "c2" | "admin";
/** Fixed order within a row: the outsiders first, then P1, their coach and the admin. */
const PERSONAS: Persona[] = ["anon", "p2", "c2", "p1", "c1", "admin"];
type Expect = Record<Persona, number>;
type Params = Record<string, string>;

type Row = {
  /** Method and path exactly as listApiRoutes names the route. */
  route: string;
  /** Whose resource the path names, for the reader. */
  target: string;
  /** Path parameters, asked for before each persona's request: rows that change their target make a fresh one. */
  params?: () => Params | Promise<Params>;
  query?: () => string;
  body?: () => unknown;
  expect: Expect;
  /** A marker every allowed persona of its audience must find in the answer (proves the fixture is really read). */
  reveals?: MarkerName;
  /** Who must find `reveals`, when not every allowed persona of the marker's audience does (e.g. a list of one's own). */
  revealsTo?: Persona[];
  /** The owner's view of the target, compared before and after every refused request. */
  readBack?: (p: Params) => { as: Persona; path: string };
};

/** A resource of P1's that only P1 may touch: every write, and greens, saved reads and height maps. */
const OWNER_ONLY = (ok: number): Expect => ({ anon: 401, p1: ok, p2: 404, c1: 404, c2: 404, admin: 404 });
/** P1's practice data by id: P1, P1's coach (read-only) and an admin read it; others find nothing. */
const SQUAD_READ: Expect = { anon: 401, p1: 200, p2: 404, c1: 200, c2: 404, admin: 200 };
/** P1's data through ?playerId= (server/lib/player-access.ts): another player is told 403, a coach outside the squad 404. */
const PLAYER_ID_QUERY: Expect = { anon: 401, p1: 200, p2: 403, c1: 200, c2: 404, admin: 200 };
/** Anyone signed in, on their own account. */
const SIGNED_IN = (ok: number): Expect => ({ anon: 401, p1: ok, p2: ok, c1: ok, c2: ok, admin: ok });
const PUBLIC: Expect = { anon: 200, p1: 200, p2: 200, c1: 200, c2: 200, admin: 200 };
/** C1's squad, ladder or invitation: players are refused by role (403), another coach finds nothing (404), an admin may. */
const C1_COACHING = (ok: number): Expect => ({ anon: 401, p1: 403, p2: 403, c1: ok, c2: 404, admin: ok });
/** The admin screens' API: everyone else is refused by role. */
const ADMIN_ONLY = (ok: number): Expect => ({ anon: 401, p1: 403, p2: 403, c1: 403, c2: 403, admin: ok });
/** A coach's own library or squads (players refused by role). */
const ANY_COACH = (ok: number): Expect => ({ anon: 401, p1: 403, p2: 403, c1: ok, c2: ok, admin: ok });

// ---- fixtures ------------------------------------------------------------------------------------

let server: TestServer;
let clients: Record<Persona, HttpClient>;
let people: Record<Exclude<Persona, "anon">, Person>;
let fx: {
  s1: string;
  s2: string;
  l1: string;
  a1: string;
  green: string;
  session: string;
  scratchSession: string;
  putt: string;
  round: string;
  read: string;
  attempt: string;
  p2Session: string;
  l2: string;
  a2: string;
  coachGreen: string;
  inviteToken: string;
};

type MarkerName =
  | "p1Id"
  | "p1SessionId"
  | "p1Notes"
  | "p1PuttId"
  | "p1RoundId"
  | "p1RoundNotes"
  | "p1GreenId"
  | "p1GreenName"
  | "p1GreenNote"
  | "p1ReadId"
  | "p1ReadLabel"
  | "p1AttemptId"
  | "s1Id"
  | "s1Name"
  | "l1Id"
  | "l1Name"
  | "a1Id"
  | "c1Id"
  | "p2Id"
  | "p2SessionId"
  | "p2Notes"
  | "s2Id"
  | "s2Name"
  | "l2Id"
  | "l2Name"
  | "a2Id"
  | "c2Id"
  | "p1NoteText";
/** Each marker and the personas who may see it anywhere; nobody else's answer may contain it. */
let markers: Record<MarkerName, { value: string; audience: Persona[] }>;

const sideHill = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } };
const plane = { kind: "grid", spacingM: 1, heightsM: Array.from({ length: 5 }, () => [0, 0.01, 0.02, 0.03, 0.04]) };
const csvForm = () => {
  const form = new FormData();
  form.append("file", new Blob(["Date,Distance (m),Made\n2026-03-01,2,yes\n2026-03-01,4,no\n"], { type: "text/csv" }), "putts.csv");
  form.append("mapping", JSON.stringify({ date: "Date", distance: "Distance (m)", distanceUnit: "m", holed: "Made" }));
  return form;
};

async function ok<T = any>(res: Promise<HttpResponse<T>>, status = 201): Promise<T> {
  const r = await res;
  if (r.status !== status) throw new Error(`fixture: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body;
}

/** Throwaway resources, made per persona for rows that change or destroy their target. */
const fresh = {
  session: async () => (await ok(clients.p1.post("/api/sessions", { date: "2026-05-02", notes: "throwaway" }))).id as string,
  putt: async () => (await ok(clients.p1.post(`/api/sessions/${fx.scratchSession}/putts`, { distanceM: 2, holed: true }))).id as string,
  round: async () => (await ok(clients.p1.post("/api/rounds", { date: "2026-05-02", notes: "throwaway" }))).id as string,
  read: async () => (await ok(clients.p1.post("/api/reads", { read: sideHill, label: "throwaway" }))).id as string,
  /** A green of C1's with a reading, not shared yet. */
  coachGreen: async () => {
    const id = (await ok(clients.c1.post("/api/greens", { name: "Throwaway coach green" }))).id as string;
    await ok(clients.c1.post(`/api/greens/${id}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 10 }));
    return id;
  },
  green: async (withMap = false) => {
    const id = (await ok(clients.p1.post("/api/greens", { name: "Throwaway green" }))).id as string;
    if (withMap) await ok(clients.p1.put(`/api/greens/${id}/height-map`, plane), 200);
    return id;
  },
  /** A squad of C1's; with P1 in it when `withP1` (inserted directly: the invitation flow has its own row). */
  squad: async (withP1: boolean) => {
    const id = await createSquad(clients.c1, "Throwaway squad");
    if (withP1) await server.database.db.insert(squadMembers).values({ squadId: id, playerId: people.p1.id });
    return id;
  },
  invitation: async (squadId: string, email: string) => {
    const seen = new Set(server.smtpFake!.messages.map((m) => m.id));
    const body = await ok(clients.c1.post(`/api/squads/${squadId}/invitations`, { email }));
    return { id: body.invitation.id as string, token: await invitationTokenFor(server, email, seen) };
  },
  ladder: async () => createLadder(clients.c1, { ...THREE_RUNGS, name: "Throwaway ladder" }),
  /** A new player account nobody coaches (the admin rows change it). */
  user: async () => (await signedUpClient(server, "player", "Throwaway Player")).id,
  assignment: async (withPutt: boolean) => {
    const id = (await ok(clients.c1.post(`/api/ladders/${fx.l1}/assignments`, { playerIds: [people.p1.id] }))).assignments[0].id as string;
    if (withPutt) await ok(clients.p1.post(`/api/assignments/${id}/putts`, { holed: true }));
    return id;
  },
};

beforeAll(async () => {
  server = await startTestServer();
  const c1 = await signedUpClient(server, "coach", "Coach One");
  const c2 = await signedUpClient(server, "coach", "Coach Two");
  const s1 = await createSquad(c1.client, "secret-squad-S1");
  const s2 = await createSquad(c2.client, "secret-squad-S2");
  const p1 = await joinedPlayer(server, c1.client, s1, "Player One");
  const p2 = await joinedPlayer(server, c2.client, s2, "Player Two");
  const admin = await adminClient(server);
  people = { p1, p2, c1, c2, admin };
  clients = { anon: new HttpClient(server.url), p1: p1.client, p2: p2.client, c1: c1.client, c2: c2.client, admin: admin.client };

  // P1: a green with a reading and a height map, a session on it with putts, a round, a saved read, a training attempt.
  const green = (await ok(p1.client.post("/api/greens", { name: "secret-green-P1", locationNote: "secret-greennote-P1" }))).id;
  await ok(p1.client.post(`/api/greens/${green}/stimp-readings`, { measuredOn: "2026-04-01", stimpFt: 9.5 }));
  await ok(p1.client.put(`/api/greens/${green}/height-map`, plane), 200);
  const session = (await ok(p1.client.post("/api/sessions", { date: "2026-05-01", greenId: green, notes: "secret-notes-P1" }))).id;
  const putt = (await ok(p1.client.post(`/api/sessions/${session}/putts`, { distanceM: 3, holed: true }))).id;
  await ok(p1.client.post(`/api/sessions/${session}/putts`, { distanceM: 5, holed: false, missSide: "left", missLengthM: 0.4 }));
  const scratchSession = (await ok(p1.client.post("/api/sessions", { date: "2026-05-03" }))).id;
  const round = (
    await ok(
      p1.client.post("/api/rounds", { date: "2026-05-04", notes: "secret-round-P1", holes: [{ holeNumber: 1, firstPuttM: 4, putts: 2 }] }),
    )
  ).id;
  const read = (await ok(p1.client.post("/api/reads", { read: sideHill, greenId: green, label: "secret-read-P1" }))).id;
  const attempt = (
    await ok(
      p1.client.post("/api/training/attempts", {
        level: "club",
        putt: { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
        guess: { aimOffsetM: -0.15, flatPuttLengthM: 3.5 },
      }),
    )
  ).id;

  // C1: a ladder assigned to P1, who has played a putt of it; a green of C1's with a height map, shared with S1 (P1 practises on it).
  const l1 = await createLadder(c1.client, { ...THREE_RUNGS, name: "secret-ladder-C1" });
  const a1 = (await ok(c1.client.post(`/api/ladders/${l1}/assignments`, { playerIds: [p1.id] }))).assignments[0].id;
  await ok(p1.client.post(`/api/assignments/${a1}/putts`, { holed: true }));
  const coachGreen = (await ok(c1.client.post("/api/greens", { name: "Coach green" }))).id;
  await ok(c1.client.put(`/api/greens/${coachGreen}/height-map`, plane), 200);
  await ok(c1.client.post(`/api/greens/${coachGreen}/stimp-readings`, { measuredOn: "2026-04-01", stimpFt: 10 }));
  await ok(c1.client.put(`/api/greens/${coachGreen}/squad`, { squadId: s1 }), 200);
  // A pending invitation on a squad of no interest: its public preview shows the squad's name to anyone with the token.
  const inviteSquad = await createSquad(c1.client, "Invite squad");
  const inviteEmail = uniqueEmail("invitee");
  await ok(c1.client.post(`/api/squads/${inviteSquad}/invitations`, { email: inviteEmail }));
  const inviteToken = await invitationTokenFor(server, inviteEmail);

  // S2 / C2 / P2, minimal.
  const p2Session = (await ok(p2.client.post("/api/sessions", { date: "2026-05-01", notes: "secret-notes-P2" }))).id;
  await ok(p2.client.post(`/api/sessions/${p2Session}/putts`, { distanceM: 2, holed: true }));
  const l2 = await createLadder(c2.client, { ...THREE_RUNGS, name: "secret-ladder-C2" });
  const a2 = (await ok(c2.client.post(`/api/ladders/${l2}/assignments`, { playerIds: [p2.id] }))).assignments[0].id;

  // C1's note on P1: P1, C1 and an admin read it.
  await ok(c1.client.post(`/api/players/${p1.id}/notes`, { body: "secret-note-on-P1" }));

  fx = { s1, s2, l1, a1, green, session, scratchSession, putt, round, read, attempt, p2Session, l2, a2, coachGreen, inviteToken };
  const p1Side: Persona[] = ["p1", "c1", "admin"];
  const p2Side: Persona[] = ["p2", "c2", "admin"];
  const p1Only: Persona[] = ["p1"];
  markers = {
    p1Id: { value: p1.id, audience: p1Side },
    p1SessionId: { value: session, audience: p1Side },
    p1Notes: { value: "secret-notes-P1", audience: p1Side },
    p1PuttId: { value: putt, audience: p1Side },
    p1RoundId: { value: round, audience: p1Side },
    p1RoundNotes: { value: "secret-round-P1", audience: p1Side },
    // The coach sees the green's id and name on P1's sessions; its note only on the green itself.
    p1GreenId: { value: green, audience: p1Side },
    p1GreenName: { value: "secret-green-P1", audience: p1Side },
    p1GreenNote: { value: "secret-greennote-P1", audience: p1Only },
    p1ReadId: { value: read, audience: p1Only },
    p1ReadLabel: { value: "secret-read-P1", audience: p1Only },
    p1AttemptId: { value: attempt, audience: p1Only },
    s1Id: { value: s1, audience: p1Side },
    s1Name: { value: "secret-squad-S1", audience: p1Side },
    // P1's assignment carries a copy of the ladder (its name and source id).
    l1Id: { value: l1, audience: p1Side },
    l1Name: { value: "secret-ladder-C1", audience: p1Side },
    a1Id: { value: a1, audience: p1Side },
    c1Id: { value: c1.id, audience: p1Side },
    p2Id: { value: p2.id, audience: p2Side },
    p2SessionId: { value: p2Session, audience: p2Side },
    p2Notes: { value: "secret-notes-P2", audience: p2Side },
    s2Id: { value: s2, audience: p2Side },
    s2Name: { value: "secret-squad-S2", audience: p2Side },
    l2Id: { value: l2, audience: p2Side },
    l2Name: { value: "secret-ladder-C2", audience: p2Side },
    a2Id: { value: a2, audience: p2Side },
    c2Id: { value: c2.id, audience: p2Side },
    p1NoteText: { value: "secret-note-on-P1", audience: p1Side },
  };
}, 120_000);

afterAll(async () => {
  await server?.stop();
});

// ---- the table -----------------------------------------------------------------------------------

const p1Id = () => people.p1.id;
/** The query naming P1 as the player whose data is read. */
function ofP1(extra = ""): () => string {
  return () => `playerId=${p1Id()}${extra}`;
}

const rows: Row[] = [
  // The local mailbox (no SMTP_URL): every e-mail sent, reset and invitation links included — an admin's alone.
  {
    route: "GET /api/dev/mail",
    target: "all sent mail",
    expect: { anon: 401, p1: 403, p2: 403, c1: 403, c2: 403, admin: 200 },
    reveals: "s1Name",
    revealsTo: ["admin"],
  },
  // Public: the read calculator and the health check need no account.
  { route: "GET /api/health", target: "none", expect: PUBLIC },
  { route: "POST /api/reads/solve", target: "none", body: () => sideHill, expect: PUBLIC },
  {
    route: "POST /api/reads/chart",
    target: "none",
    body: () => ({ slopePct: 2, stimpFt: 10, distances: [1, 2, 3], fallLineDegs: [0, 90] }),
    expect: PUBLIC,
  },
  // Public on purpose: the token is the secret (invitations.routes.ts).
  {
    route: "GET /api/invitations/:token",
    target: "a pending invitation of C1's",
    params: () => ({ token: fx.inviteToken }),
    expect: PUBLIC,
  },

  // Me and saved reads: one's own only.
  // Signed out, "who am I?" answers { user: null } (a 200, so a signed-out page logs no error) and reveals nothing.
  { route: "GET /api/me", target: "own account", expect: { ...SIGNED_IN(200), anon: 200 }, reveals: "p1Id", revealsTo: ["p1"] },
  { route: "PATCH /api/me/preferences", target: "own account", body: () => ({ units: "imperial" }), expect: SIGNED_IN(200) },
  { route: "GET /api/reads", target: "own saved reads", expect: SIGNED_IN(200), reveals: "p1ReadLabel" },
  { route: "POST /api/reads", target: "own saved reads", body: () => ({ read: sideHill, label: "mine" }), expect: SIGNED_IN(201) },
  {
    route: "DELETE /api/reads/:id",
    target: "P1's saved read (fresh)",
    params: async () => ({ id: await fresh.read() }),
    expect: OWNER_ONLY(204),
    readBack: () => ({ as: "p1", path: "/api/reads" }),
  },

  // Squads: coaches (and the admin) manage their own; a player lists the squads they belong to.
  { route: "POST /api/squads", target: "own squads", body: () => ({ name: "New squad" }), expect: ANY_COACH(201) },
  { route: "GET /api/squads", target: "own squads / memberships", expect: SIGNED_IN(200), reveals: "s1Name" },
  // A member reads their squad through GET /api/squads, not by id: the route is coach-only (403).
  { route: "GET /api/squads/:id", target: "C1's squad S1", params: () => ({ id: fx.s1 }), expect: C1_COACHING(200), reveals: "s1Name" },
  {
    route: "PATCH /api/squads/:id",
    target: "C1's squad (fresh)",
    params: async () => ({ id: await fresh.squad(false) }),
    body: () => ({ description: "Edited" }),
    expect: C1_COACHING(200),
    readBack: (p) => ({ as: "c1", path: `/api/squads/${p.id}` }),
  },
  {
    route: "DELETE /api/squads/:id",
    target: "C1's squad (fresh)",
    params: async () => ({ id: await fresh.squad(false) }),
    expect: C1_COACHING(204),
    readBack: (p) => ({ as: "c1", path: `/api/squads/${p.id}` }),
  },
  {
    route: "DELETE /api/squads/:id/members/:playerId",
    target: "P1 in a squad of C1's (fresh)",
    params: async () => ({ id: await fresh.squad(true), playerId: p1Id() }),
    expect: C1_COACHING(204),
    readBack: (p) => ({ as: "c1", path: `/api/squads/${p.id}` }),
  },
  {
    // Only a member leaves; for everyone else there is no such membership.
    route: "POST /api/squads/:id/leave",
    target: "a squad of C1's with P1 in it (fresh)",
    params: async () => ({ id: await fresh.squad(true) }),
    expect: { anon: 401, p1: 204, p2: 404, c1: 404, c2: 404, admin: 404 },
    readBack: (p) => ({ as: "c1", path: `/api/squads/${p.id}` }),
  },

  // Invitations.
  {
    route: "POST /api/squads/:id/invitations",
    target: "C1's squad S1",
    params: () => ({ id: fx.s1 }),
    body: () => ({ email: uniqueEmail("matrix") }),
    expect: C1_COACHING(201),
    readBack: () => ({ as: "c1", path: `/api/squads/${fx.s1}/invitations` }),
  },
  // P1 joined S1 by invitation: the list names them as its acceptor.
  {
    route: "GET /api/squads/:id/invitations",
    target: "C1's squad S1",
    params: () => ({ id: fx.s1 }),
    expect: C1_COACHING(200),
    reveals: "p1Id",
  },
  {
    route: "DELETE /api/invitations/:id",
    target: "an invitation of C1's (fresh)",
    params: async () => ({ id: (await fresh.invitation(fx.s1, uniqueEmail("revoke"))).id }),
    expect: C1_COACHING(204),
    readBack: () => ({ as: "c1", path: `/api/squads/${fx.s1}/invitations` }),
  },
  {
    route: "POST /api/invitations/:id/resend",
    target: "an invitation of C1's (fresh)",
    params: async () => ({ id: (await fresh.invitation(fx.s1, uniqueEmail("resend"))).id }),
    expect: C1_COACHING(201),
    readBack: () => ({ as: "c1", path: `/api/squads/${fx.s1}/invitations` }),
  },
  {
    // Only the invited player account may accept (coach and admin accounts never join; another e-mail is 403).
    route: "POST /api/invitations/:token/accept",
    target: "C1's invitation for P1 to a fresh squad",
    params: async () => {
      const squadId = await fresh.squad(false);
      return { token: (await fresh.invitation(squadId, people.p1.email)).token, squadId };
    },
    expect: { anon: 401, p1: 200, p2: 403, c1: 403, c2: 403, admin: 403 },
    readBack: (p) => ({ as: "c1", path: `/api/squads/${p.squadId}/invitations` }),
  },

  // Ladders: a coach's own library (plus the built-in ones); an admin sees every coach's.
  { route: "POST /api/ladders", target: "own library", body: () => THREE_RUNGS, expect: ANY_COACH(201) },
  { route: "GET /api/ladders", target: "own library", expect: ANY_COACH(200), reveals: "l1Name" },
  { route: "GET /api/ladders/:id", target: "C1's ladder L1", params: () => ({ id: fx.l1 }), expect: C1_COACHING(200), reveals: "l1Name" },
  {
    route: "PUT /api/ladders/:id",
    target: "C1's ladder (fresh)",
    params: async () => ({ id: await fresh.ladder() }),
    body: () => ({ ...THREE_RUNGS, name: "Edited" }),
    expect: C1_COACHING(200),
    readBack: (p) => ({ as: "c1", path: `/api/ladders/${p.id}` }),
  },
  {
    route: "DELETE /api/ladders/:id",
    target: "C1's ladder (fresh)",
    params: async () => ({ id: await fresh.ladder() }),
    expect: C1_COACHING(204),
    readBack: (p) => ({ as: "c1", path: `/api/ladders/${p.id}` }),
  },
  {
    route: "POST /api/ladders/:id/copy",
    target: "C1's ladder L1",
    params: () => ({ id: fx.l1 }),
    expect: C1_COACHING(201),
    readBack: () => ({ as: "c1", path: "/api/ladders" }),
  },
  {
    route: "POST /api/ladders/:id/assignments",
    target: "C1's ladder L1, to P1",
    params: () => ({ id: fx.l1 }),
    body: () => ({ playerIds: [p1Id()] }),
    expect: C1_COACHING(201),
    readBack: () => ({ as: "c1", path: `/api/coach/squads/${fx.s1}/assignments` }),
  },

  // Assignments: the player runs their own; the coach and an admin follow it read-only.
  { route: "GET /api/assignments", target: "own assignments", expect: SIGNED_IN(200), reveals: "a1Id", revealsTo: ["p1"] },
  { route: "GET /api/assignments/:id", target: "P1's assignment A1", params: () => ({ id: fx.a1 }), expect: SQUAD_READ, reveals: "l1Name" },
  {
    route: "POST /api/assignments/:id/putts",
    target: "P1's assignment (fresh)",
    params: async () => ({ id: await fresh.assignment(false) }),
    body: () => ({ holed: true }),
    expect: OWNER_ONLY(201),
    readBack: (p) => ({ as: "p1", path: `/api/assignments/${p.id}` }),
  },
  {
    route: "DELETE /api/assignments/:id/putts/last",
    target: "P1's assignment with a putt (fresh)",
    params: async () => ({ id: await fresh.assignment(true) }),
    expect: OWNER_ONLY(200),
    readBack: (p) => ({ as: "p1", path: `/api/assignments/${p.id}` }),
  },

  // The coach's views.
  { route: "GET /api/coach/players", target: "own squads' players", expect: ANY_COACH(200), reveals: "p1Id" },
  {
    route: "GET /api/coach/players/:playerId",
    target: "P1",
    params: () => ({ playerId: p1Id() }),
    expect: C1_COACHING(200),
    reveals: "a1Id",
  },
  {
    route: "GET /api/coach/squads/:id/assignments",
    target: "C1's squad S1",
    params: () => ({ id: fx.s1 }),
    expect: C1_COACHING(200),
    reveals: "a1Id",
  },

  {
    route: "GET /api/coach/squads/:id/overview",
    target: "C1's squad S1",
    params: () => ({ id: fx.s1 }),
    expect: C1_COACHING(200),
    reveals: "p1Id",
  },
  { route: "GET /api/coach/squads/:id/overview/export", target: "C1's squad S1", params: () => ({ id: fx.s1 }), expect: C1_COACHING(200) },

  // Notes on a player: the player, their coach and an admin read them; only a coach of theirs (or an admin) writes one.
  {
    route: "GET /api/players/:playerId/notes",
    target: "P1's notes",
    params: () => ({ playerId: p1Id() }),
    expect: PLAYER_ID_QUERY,
    reveals: "p1NoteText",
  },
  {
    route: "POST /api/players/:playerId/notes",
    target: "P1's notes",
    params: () => ({ playerId: p1Id() }),
    body: () => ({ body: "Keep the putter low through the ball." }),
    expect: { anon: 401, p1: 403, p2: 403, c1: 201, c2: 404, admin: 201 },
    readBack: (p) => ({ as: "p1", path: `/api/players/${p.playerId}/notes` }),
  },

  // Admin screens (better-auth's admin plugin behind /api/admin, every change audited).
  { route: "GET /api/admin/users", target: "every account", expect: ADMIN_ONLY(200), reveals: "p1Id" },
  {
    route: "POST /api/admin/users/:id/role",
    target: "a fresh player",
    params: async () => ({ id: await fresh.user() }),
    body: () => ({ role: "coach" }),
    expect: ADMIN_ONLY(200),
    readBack: () => ({ as: "admin", path: "/api/admin/audit" }),
  },
  {
    route: "POST /api/admin/users/:id/ban",
    target: "a fresh player",
    params: async () => ({ id: await fresh.user() }),
    body: () => ({ reason: "matrix" }),
    expect: ADMIN_ONLY(200),
    readBack: () => ({ as: "admin", path: "/api/admin/audit" }),
  },
  {
    route: "POST /api/admin/users/:id/unban",
    target: "a fresh player",
    params: async () => ({ id: await fresh.user() }),
    expect: ADMIN_ONLY(200),
    readBack: () => ({ as: "admin", path: "/api/admin/audit" }),
  },
  {
    route: "POST /api/admin/users/:id/revoke-sessions",
    target: "a fresh player",
    params: async () => ({ id: await fresh.user() }),
    expect: ADMIN_ONLY(204),
    readBack: () => ({ as: "admin", path: "/api/admin/audit" }),
  },
  {
    route: "POST /api/admin/users/:id/password-reset",
    target: "a fresh player",
    params: async () => ({ id: await fresh.user() }),
    expect: ADMIN_ONLY(204),
    readBack: () => ({ as: "admin", path: "/api/admin/audit" }),
  },
  { route: "GET /api/admin/audit", target: "the audit list", expect: ADMIN_ONLY(200) },
  { route: "GET /api/admin/coaching", target: "every coach's squads and ladders", expect: ADMIN_ONLY(200), reveals: "s1Name" },

  // Greens: P1's own green is P1's alone — neither P1's coach nor an admin reads it (lib/green-access.ts); a
  // green shared with a squad has its own test below.
  { route: "GET /api/greens", target: "own greens", expect: SIGNED_IN(200), reveals: "p1GreenNote" },
  { route: "POST /api/greens", target: "own greens", body: () => ({ name: "Mine" }), expect: SIGNED_IN(201) },
  { route: "GET /api/greens/:id", target: "P1's green", params: () => ({ id: fx.green }), expect: OWNER_ONLY(200), reveals: "p1GreenNote" },
  {
    route: "PATCH /api/greens/:id",
    target: "P1's green (fresh)",
    params: async () => ({ id: await fresh.green() }),
    body: () => ({ name: "Renamed" }),
    expect: OWNER_ONLY(200),
    readBack: (p) => ({ as: "p1", path: `/api/greens/${p.id}` }),
  },
  {
    route: "DELETE /api/greens/:id",
    target: "P1's green (fresh)",
    params: async () => ({ id: await fresh.green() }),
    expect: OWNER_ONLY(204),
    readBack: (p) => ({ as: "p1", path: `/api/greens/${p.id}` }),
  },
  {
    route: "POST /api/greens/:id/stimp-readings",
    target: "P1's green (fresh)",
    params: async () => ({ id: await fresh.green() }),
    body: () => ({ measuredOn: "2026-05-01", stimpFt: 10 }),
    expect: OWNER_ONLY(201),
    readBack: (p) => ({ as: "p1", path: `/api/greens/${p.id}` }),
  },
  {
    route: "DELETE /api/greens/:id/stimp-readings/:readingId",
    target: "a reading on P1's green (fresh)",
    params: async () => {
      const id = await fresh.green();
      const green = await ok(clients.p1.post(`/api/greens/${id}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 10 }));
      return { id, readingId: green.readings[0].id as string };
    },
    expect: OWNER_ONLY(204),
    readBack: (p) => ({ as: "p1", path: `/api/greens/${p.id}` }),
  },

  // Sharing a green with a squad: a coach's, for their own green and their own squad (greens.handlers.ts shareGreen).
  {
    route: "PUT /api/greens/:id/squad",
    target: "C1's green (fresh), shared into S1",
    params: async () => ({ id: await fresh.coachGreen() }),
    body: () => ({ squadId: fx.s1 }),
    expect: { anon: 401, p1: 403, p2: 403, c1: 200, c2: 404, admin: 404 },
    readBack: (p) => ({ as: "c1", path: `/api/greens/${p.id}` }),
  },

  // Height maps: the owner writes; the owner and the players of the owner's squads read (not the owner's coach, not an admin).
  {
    route: "PUT /api/greens/:id/height-map",
    target: "P1's green with a map (fresh)",
    params: async () => ({ id: await fresh.green(true) }),
    body: () => ({ ...plane, heightsM: plane.heightsM.map((r) => r.map((h) => h * 2)) }),
    expect: OWNER_ONLY(200),
    readBack: (p) => ({ as: "p1", path: `/api/greens/${p.id}/height-map` }),
  },
  { route: "GET /api/greens/:id/height-map", target: "P1's green", params: () => ({ id: fx.green }), expect: OWNER_ONLY(200) },
  {
    route: "DELETE /api/greens/:id/height-map",
    target: "P1's green with a map (fresh)",
    params: async () => ({ id: await fresh.green(true) }),
    expect: OWNER_ONLY(204),
    readBack: (p) => ({ as: "p1", path: `/api/greens/${p.id}/height-map` }),
  },
  {
    route: "POST /api/greens/:id/reads/solve",
    target: "P1's green",
    params: () => ({ id: fx.green }),
    body: () => ({ ball: [1, 1], hole: [1, 3], stimpFt: 10 }),
    expect: OWNER_ONLY(200),
  },

  // Sessions and putts: own writes only; reads for P1's coach and an admin too.
  { route: "GET /api/sessions", target: "P1's sessions (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1Notes" },
  { route: "POST /api/sessions", target: "own log", body: () => ({ date: "2026-05-05" }), expect: SIGNED_IN(201) },
  { route: "GET /api/sessions/:id", target: "P1's session", params: () => ({ id: fx.session }), expect: SQUAD_READ, reveals: "p1Notes" },
  {
    route: "PATCH /api/sessions/:id",
    target: "P1's session (fresh)",
    params: async () => ({ id: await fresh.session() }),
    body: () => ({ notes: "changed" }),
    expect: OWNER_ONLY(200),
    readBack: (p) => ({ as: "p1", path: `/api/sessions/${p.id}` }),
  },
  {
    route: "DELETE /api/sessions/:id",
    target: "P1's session (fresh)",
    params: async () => ({ id: await fresh.session() }),
    expect: OWNER_ONLY(204),
    readBack: (p) => ({ as: "p1", path: `/api/sessions/${p.id}` }),
  },
  {
    route: "POST /api/sessions/:id/putts",
    target: "P1's session (fresh)",
    params: async () => ({ id: await fresh.session() }),
    body: () => ({ distanceM: 2, holed: true }),
    expect: OWNER_ONLY(201),
    readBack: (p) => ({ as: "p1", path: `/api/sessions/${p.id}/putts` }),
  },
  {
    route: "GET /api/sessions/:id/putts",
    target: "P1's session",
    params: () => ({ id: fx.session }),
    expect: SQUAD_READ,
    reveals: "p1PuttId",
  },
  { route: "GET /api/putts", target: "P1's putts (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1PuttId" },
  { route: "GET /api/putts/:id", target: "P1's putt", params: () => ({ id: fx.putt }), expect: SQUAD_READ, reveals: "p1SessionId" },
  {
    route: "DELETE /api/putts/:id",
    target: "P1's putt (fresh)",
    params: async () => ({ id: await fresh.putt() }),
    expect: OWNER_ONLY(204),
    readBack: (p) => ({ as: "p1", path: `/api/putts/${p.id}` }),
  },

  // Rounds.
  { route: "GET /api/rounds", target: "P1's rounds (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1RoundNotes" },
  { route: "POST /api/rounds", target: "own rounds", body: () => ({ date: "2026-05-05" }), expect: SIGNED_IN(201) },
  { route: "GET /api/rounds/:id", target: "P1's round", params: () => ({ id: fx.round }), expect: SQUAD_READ, reveals: "p1RoundNotes" },
  {
    route: "DELETE /api/rounds/:id",
    target: "P1's round (fresh)",
    params: async () => ({ id: await fresh.round() }),
    expect: OWNER_ONLY(204),
    readBack: (p) => ({ as: "p1", path: `/api/rounds/${p.id}` }),
  },
  {
    route: "PUT /api/rounds/:id/holes/:n",
    target: "hole 1 of P1's round (fresh)",
    params: async () => ({ id: await fresh.round(), n: "1" }),
    body: () => ({ firstPuttM: 3, putts: 1 }),
    expect: OWNER_ONLY(200),
    readBack: (p) => ({ as: "p1", path: `/api/rounds/${p.id}` }),
  },

  // Make rates.
  { route: "GET /api/stats/make-rates", target: "P1's stats (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1Id" },
  { route: "GET /api/stats/trend", target: "P1's stats (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1Id" },
  {
    route: "GET /api/stats/compare",
    target: "P1's stats (?playerId)",
    query: ofP1("&aFrom=2026-01-01&aTo=2026-04-30&bFrom=2026-05-01&bTo=2026-12-31"),
    expect: PLAYER_ID_QUERY,
    reveals: "p1Id",
  },
  { route: "GET /api/stats/misses", target: "P1's stats (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1Id" },
  // Not public (unlike the read calculator): the tour baseline is part of the signed-in stats pages.
  { route: "GET /api/stats/baseline", target: "none", expect: SIGNED_IN(200) },
  { route: "GET /api/stats/sessions", target: "P1's stats (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1SessionId" },

  // Practice plan (issue 17): read like the stats; a player starts only their own; a coach adopts only their players'.
  // P1 has logged too few putts for a plan, so an allowed start or adoption is a 409 that changes nothing.
  { route: "GET /api/practice-plan", target: "P1's plan (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1Id" },
  { route: "POST /api/practice-plan/start", target: "own plan", expect: SIGNED_IN(409) },
  { route: "POST /api/practice-plan/adopt", target: "P1's plan", body: () => ({ playerId: people.p1.id }), expect: C1_COACHING(409) },

  // CSV: imports go into one's own log; exports follow ?playerId like the other reads.
  { route: "POST /api/csv/putts/preview", target: "own upload", body: csvForm, expect: SIGNED_IN(200) },
  { route: "POST /api/csv/putts/import", target: "own log", body: csvForm, expect: SIGNED_IN(200) },
  { route: "GET /api/csv/putts/export", target: "P1's putts (?playerId)", query: ofP1(), expect: PLAYER_ID_QUERY, reveals: "p1PuttId" },
  {
    route: "GET /api/csv/sessions/export",
    target: "P1's sessions (?playerId)",
    query: ofP1(),
    expect: PLAYER_ID_QUERY,
    reveals: "p1Notes",
  },

  // Training history: one's own only, no playerId.
  {
    route: "POST /api/training/attempts",
    target: "own history",
    // Not the putt P1 was scored on in the setup: a second scored read of one putt is a 409 (training.test.ts).
    body: () => ({
      level: "club",
      putt: { distanceM: 3.3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
      guess: { aimOffsetM: -0.1, flatPuttLengthM: 3.4 },
    }),
    expect: SIGNED_IN(201),
  },
  { route: "GET /api/training/attempts", target: "own history", expect: SIGNED_IN(200), reveals: "p1AttemptId" },

  // Make probability.
  {
    // readablePlayer (make-probability.handlers.ts) answers 404 to a player asking for another's, where stats say 403.
    route: "GET /api/players/me/dispersion",
    target: "P1's dispersion (?playerId)",
    query: ofP1(),
    expect: { ...PLAYER_ID_QUERY, p2: 404 },
  },
  {
    route: "POST /api/reads/make-probability",
    target: "own read",
    body: () => ({ read: sideHill, dispersion: { angleDeg: 1, pace: 0.1 }, samples: 100, seed: 1 }),
    expect: SIGNED_IN(200),
  },
];

// ---- running a row -------------------------------------------------------------------------------

const fingerprint = () => databaseFingerprint(server.database.db);

const text = (body: unknown) => (typeof body === "string" ? body : JSON.stringify(body ?? ""));

async function ownerView(row: Row, p: Params): Promise<string | undefined> {
  if (!row.readBack) return undefined;
  const { as, path } = row.readBack(p);
  const res = await clients[as].get(path);
  return `${res.status} ${text(res.body)}`;
}

async function runRow(row: Row) {
  const [method, path] = row.route.split(" ") as [string, string];
  for (const who of PERSONAS) {
    const want = row.expect[who];
    const p = (await row.params?.()) ?? {};
    const url = fillPath(path, (name) => {
      if (p[name] === undefined) throw new Error(`${row.route}: no value for :${name}`);
      return p[name];
    });
    const target = row.query ? `${url}?${row.query()}` : url;
    const before = want >= 400 ? await fingerprint() : undefined;
    const viewBefore = want >= 400 ? await ownerView(row, p) : undefined;
    const res = await clients[who].request(method, target, row.body?.() ?? (["POST", "PUT", "PATCH"].includes(method) ? {} : undefined));
    const answer = text(res.body);
    const where = `${row.route} as ${who} on ${row.target}`;
    expect(res.status, `${where}: ${answer.slice(0, 300)}`).toBe(want);

    for (const [name, m] of Object.entries(markers)) {
      if (!m.audience.includes(who)) expect(answer, `${where} leaks ${name}`).not.toContain(m.value);
    }
    if (res.status >= 400) {
      expect(res.body, where).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
      for (const [name, value] of Object.entries(p)) expect(answer, `${where} echoes :${name}`).not.toContain(value);
      expect(await fingerprint(), `${where}: a refused request changed the database`).toBe(before);
      expect(await ownerView(row, p), `${where}: the owner's view changed`).toBe(viewBefore);
    } else if (row.reveals) {
      const m = markers[row.reveals];
      const to = row.revealsTo ?? m.audience;
      if (to.includes(who)) expect(answer, `${where} should show ${row.reveals}`).toContain(m.value);
    }
  }
}

// ---- tests ---------------------------------------------------------------------------------------

test("the table has exactly one row per API route", () => {
  const routes = listApiRoutes(server.app).map((r) => `${r.method} ${r.path}`);
  const covered = rows.map((r) => r.route);
  expect(new Set(covered).size, "a route appears twice in the table").toBe(covered.length);
  expect(
    routes.filter((r) => !covered.includes(r)),
    "routes with no row: add them to the table",
  ).toEqual([]);
  expect(
    covered.filter((r) => !routes.includes(r)),
    "rows for routes that do not exist",
  ).toEqual([]);
});

test("a refused id guess is always a 403 or 404, never another code", () => {
  for (const row of rows.filter((r) => r.route.includes(":"))) {
    for (const who of PERSONAS.filter((w) => w !== "anon")) {
      const want = row.expect[who];
      if (want >= 400) expect([403, 404], `${row.route} as ${who}`).toContain(want);
    }
    expect(row.expect.anon === 401 || row.route === "GET /api/invitations/:token", `${row.route} signed out`).toBe(true);
  }
});

test.each(rows)("$route answers each persona as the roles table says", async (row) => {
  await runRow(row);
});

test("ids in bodies and queries: another's green, squad or ladder cannot be used either", async () => {
  const { p1, p2, c2 } = clients;
  expect((await p2.post("/api/sessions", { date: "2026-05-06", greenId: fx.green })).status).toBe(400);
  expect((await p2.post("/api/reads", { read: sideHill, greenId: fx.green })).status).toBe(404);
  const own = (await ok(p2.post("/api/sessions", { date: "2026-05-06" }))).id;
  expect((await p2.patch(`/api/sessions/${own}`, { greenId: fx.green })).status).toBe(400);
  expect((await c2.post(`/api/ladders/${fx.l2}/assignments`, { squadId: fx.s1 })).status).toBe(404);
  // P1's filters are applied within P1's own data: P2's session id finds nothing.
  const filtered = await p1.get(`/api/putts?sessionId=${fx.p2Session}`);
  expect(filtered.status).toBe(200);
  expect(filtered.body.items).toEqual([]);
  // A squad player practises on the green their coach shared with the squad and reads its height map, but may not change it.
  expect((await p1.post("/api/sessions", { date: "2026-05-06", greenId: fx.coachGreen })).status).toBe(201);
  expect((await p1.get(`/api/greens/${fx.coachGreen}/height-map`)).status).toBe(200);
  expect((await p2.get(`/api/greens/${fx.coachGreen}/height-map`)).status).toBe(404);
  expect((await p1.delete(`/api/greens/${fx.coachGreen}/height-map`)).status).toBe(403);
  expect((await p1.put(`/api/greens/${fx.coachGreen}/height-map`, plane)).status).toBe(403);
  expect((await clients.c1.get(`/api/greens/${fx.coachGreen}/height-map`)).status).toBe(200);
  // A green of the coach's that is not shared stays the coach's alone.
  const unshared = await fresh.coachGreen();
  expect((await p1.post("/api/sessions", { date: "2026-05-06", greenId: unshared })).status).toBe(400);
  expect((await p1.get(`/api/greens/${unshared}`)).status).toBe(404);
  // C2 cannot share C1's green, nor C1 share into C2's squad.
  expect((await c2.put(`/api/greens/${unshared}/squad`, { squadId: fx.s2 })).status).toBe(404);
  expect((await clients.c1.put(`/api/greens/${unshared}/squad`, { squadId: fx.s2 })).status).toBe(400);
});

test("a green shared with S1: its players and coach see it; only its owner (C1) changes it; nobody else finds it", async () => {
  const see = { anon: 401, p2: 404, c2: 404, p1: 200, c1: 200, admin: 404 } satisfies Expect;
  const change = { anon: 401, p2: 404, c2: 404, p1: 403, c1: 200, admin: 404 } satisfies Expect;
  const id = fx.coachGreen;
  for (const who of PERSONAS) {
    const where = `as ${who}`;
    expect((await clients[who].get(`/api/greens/${id}`)).status, `GET green ${where}`).toBe(see[who]);
    expect((await clients[who].get(`/api/greens/${id}/height-map`)).status, `GET height map ${where}`).toBe(see[who]);
    expect(
      (await clients[who].post(`/api/greens/${id}/reads/solve`, { ball: [1, 1], hole: [1, 3], stimpFt: 10 })).status,
      `solve ${where}`,
    ).toBe(see[who]);
    const listed = (await clients[who].get("/api/greens")).body?.items?.some((g: { id: string }) => g.id === id) ?? false;
    expect(listed, `listed ${where}`).toBe(see[who] === 200);
    if (who === "c1") continue;
    const before = await fingerprint();
    expect((await clients[who].patch(`/api/greens/${id}`, { name: "Taken over" })).status, `PATCH ${where}`).toBe(change[who]);
    expect(
      (await clients[who].post(`/api/greens/${id}/stimp-readings`, { measuredOn: "2026-05-02", stimpFt: 8 })).status,
      `reading ${where}`,
    ).toBe(change[who]);
    expect((await clients[who].delete(`/api/greens/${id}`)).status, `DELETE ${where}`).toBe(change[who]);
    expect(await fingerprint(), `${where}: a refused change changed the database`).toBe(before);
  }
  expect((await clients.c1.patch(`/api/greens/${id}`, { locationNote: "By the clubhouse" })).status).toBe(200);
});

test("users and roles are the admin's: better-auth's admin endpoints refuse players and coaches", async () => {
  for (const who of ["p1", "c1"] as const) {
    const res = await clients[who].post("/api/auth/admin/set-role", { userId: people[who].id, role: "admin" });
    expect(res.status, `set-role as ${who}`).toBe(403);
    expect((await clients[who].get("/api/auth/admin/list-users")).status, `list-users as ${who}`).toBe(403);
    // Self-service updates drop the role (auth.ts update hook).
    await clients[who].post("/api/auth/update-user", { role: "admin" });
    expect((await clients[who].get("/api/me")).body.user.role).toBe(who === "p1" ? "player" : "coach");
  }
  expect((await clients.anon.get("/api/auth/admin/list-users")).status).toBe(401);
  expect((await clients.admin.get("/api/auth/admin/list-users")).status).toBe(200);
});
