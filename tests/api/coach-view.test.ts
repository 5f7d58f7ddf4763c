// The coach's view of a player and of a squad (issue 15): the pattern of misses, notes, the squad overview
// and its CSV export; invitations resent and the link counting as proof of the address.
import Papa from "papaparse";
import { afterAll, beforeAll, expect, test } from "vitest";
import { eq } from "drizzle-orm";
import { invitations, squadMembers, user } from "../../server/db/schema";
import { coachWithSquad, createSquad, invitationTokenFor } from "../factories/coaching";
import { signedUpClient, uniqueEmail, TEST_PASSWORD } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";
import { addPutts, newSession } from "./practice-helpers";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

const metric = (c: HttpClient) => c.patch("/api/me/preferences", { units: "metric" });

test("GET /api/stats/misses counts left/right and short/long misses per band and the strokes each band gains or loses", async () => {
  const { coach, members } = await coachWithSquad(server, 1);
  const p = members[0]!;
  await metric(coach.client);
  const s = await newSession(p.client, { date: "2026-11-02" });
  await addPutts(p.client, s, [
    { distanceM: 0.8, holed: true },
    { distanceM: 0.8, holed: true },
    { distanceM: 2.5, holed: false, missSide: "left", missLengthM: -0.3 },
    { distanceM: 2.5, holed: false, missSide: "left", missLengthM: -0.5 },
    { distanceM: 2.5, holed: false, missSide: "right", missLengthM: 0.4 },
    { distanceM: 2.5, holed: false },
  ]);
  const res = await coach.client.get(`/api/stats/misses?playerId=${p.id}`);
  expect(res.status).toBe(200);
  const [b0, , b2] = res.body.bands; // metric bands: 0–1, 1–2, 2–3 m …
  expect(b0).toMatchObject({ fromM: 0, toM: 1, attempts: 2, made: 2, missed: 0, left: 0, right: 0 });
  expect(b2).toMatchObject({ fromM: 2, toM: 3, attempts: 4, made: 0, missed: 4, left: 2, right: 1, short: 2, long: 1, leavesAssumed: 1 });
  // A holed putt takes one stroke where the tour needs at least one: never a loss. Four misses from 2.5 m
  // take at least two strokes each where the tour needs under two: a loss (Broadie 2012, strokes gained).
  expect(b0.strokesGained).toBeGreaterThanOrEqual(0);
  expect(b2.strokesGained).toBeLessThan(-1);
  // The bands add up to what the per-session figures say for the same putts.
  const sessions = await coach.client.get(`/api/stats/sessions?playerId=${p.id}`);
  const total = res.body.bands.reduce((t: number, b: { strokesGained: number }) => t + b.strokesGained, 0);
  expect(total).toBeCloseTo(sessions.body.items[0].strokesGained, 9);
  expect((await coach.client.get(`/api/stats/misses?playerId=${p.id}&from=2026-12-01&to=2026-11-01`)).status).toBe(400);
});

test("notes: a coach leaves a dated note, the player reads it; another coach's player and bad input are refused", async () => {
  const { coach, members } = await coachWithSquad(server, 1);
  const p = members[0]!;
  const stranger = await signedUpClient(server, "player");
  const post = await coach.client.post(`/api/players/${p.id}/notes`, { body: "  Start the stroke from a still putter.  " });
  expect(post.status).toBe(201);
  expect(post.body).toMatchObject({ playerId: p.id, author: { id: coach.id }, body: "Start the stroke from a still putter." });
  const mine = await p.client.get(`/api/players/${p.id}/notes`);
  expect(mine.body.notes).toEqual([
    expect.objectContaining({ body: "Start the stroke from a still putter.", createdAt: post.body.createdAt }),
  ]);
  expect((await coach.client.post(`/api/players/${stranger.id}/notes`, { body: "hi" })).status).toBe(404);
  expect((await coach.client.post(`/api/players/${coach.id}/notes`, { body: "to myself" })).status).toBe(404);
  const empty = await coach.client.post(`/api/players/${p.id}/notes`, { body: "   " });
  expect(empty.status).toBe(400);
  expect(empty.body.error.fields).toHaveProperty("body");
  expect((await coach.client.post(`/api/players/${p.id}/notes`, { body: "x".repeat(2001) })).status).toBe(400);
  expect((await p.client.get(`/api/players/${p.id}/notes`)).body.notes).toHaveLength(1);
});

test("GET /api/coach/squads/:id/overview sets each player's recent putts against their own past, with ladders", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 2);
  await metric(coach.client);
  const [a, b] = members as [(typeof members)[0], (typeof members)[0]];
  const today = new Date().toISOString().slice(0, 10);
  const old = new Date(Date.now() - 60 * 86_400_000).toISOString().slice(0, 10);
  const recent = await newSession(a.client, { date: today });
  await addPutts(a.client, recent, [
    { distanceM: 1.5, holed: true },
    { distanceM: 1.5, holed: true },
    { distanceM: 1.5, holed: true },
    { distanceM: 1.5, holed: false, missSide: "left", missLengthM: 0.3 },
  ]);
  const before = await newSession(a.client, { date: old });
  await addPutts(a.client, before, [
    { distanceM: 1.5, holed: true },
    { distanceM: 1.5, holed: false, missSide: "left", missLengthM: 0.3 },
  ]);
  const res = await coach.client.get(`/api/coach/squads/${squadId}/overview`);
  expect(res.status).toBe(200);
  expect(res.body.days).toBe(28);
  const pa = res.body.players.find((x: { id: string }) => x.id === a.id);
  const pb = res.body.players.find((x: { id: string }) => x.id === b.id);
  expect(pa.recent).toMatchObject({ sessions: 1, putts: 4, lastSession: today });
  expect(pa.past).toMatchObject({ putts: 2 });
  expect(pa.bands[1]).toEqual({ recent: { attempts: 4, made: 3, rate: 0.75 }, past: { attempts: 2, made: 1, rate: 0.5 } });
  expect(pb.recent).toMatchObject({ sessions: 0, putts: 0, strokesGainedPerPutt: null, lastSession: null });
  expect((await coach.client.get(`/api/coach/squads/${squadId}/overview?days=3`)).status).toBe(400);
  // Out-of-squad sessions do not count: a session of a stranger on the same day is absent.
  const stranger = await signedUpClient(server, "player");
  await newSession(stranger.client, { date: today });
  expect((await coach.client.get(`/api/coach/squads/${squadId}/overview`)).body.players).toHaveLength(2);
});

test("GET /api/coach/squads/:id/overview/export is a CSV whose formula-like text cannot run in a spreadsheet", async () => {
  const coach = await signedUpClient(server, "coach");
  const squadId = await createSquad(coach.client, "Export squad");
  const evil = await signedUpClient(server, "player", '=HYPERLINK("http://x")');
  await server.database.db.insert(squadMembers).values({ squadId, playerId: evil.id });
  const res = await coach.client.get(`/api/coach/squads/${squadId}/overview/export`);
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
  expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="?borrowline-export-squad-overview\.csv"?/);
  const parsed = Papa.parse<string[]>(res.body as string, { skipEmptyLines: true }).data;
  expect(parsed[0]![0]).toBe("Player");
  expect(parsed).toHaveLength(2);
  // OWASP "CSV Injection": a cell starting with = is written with a leading ' so it stays text.
  expect(parsed[1]![0]).toBe('\'=HYPERLINK("http://x")');
});

test("POST /api/invitations/:id/resend e-mails a new link; the old link is withdrawn", async () => {
  const coach = await signedUpClient(server, "coach");
  const squadId = await createSquad(coach.client);
  const email = uniqueEmail("resent");
  const first = await coach.client.post(`/api/squads/${squadId}/invitations`, { email });
  const oldToken = await invitationTokenFor(server, email);
  const seenAfterFirst = new Set(server.smtpFake!.messages.map((m) => m.id));
  const resent = await coach.client.post(`/api/invitations/${first.body.invitation.id}/resend`);
  expect(resent.status).toBe(201);
  const newToken = await invitationTokenFor(server, email, seenAfterFirst);
  expect(newToken).not.toBe(oldToken);
  // The answer's link is the share link for the coach to copy: a different token to the same new invitation.
  const shareToken = new URL(resent.body.link).pathname.split("/").pop()!;
  expect(shareToken).not.toBe(newToken);
  expect((await new HttpClient(server.url).get(`/api/invitations/${shareToken}`)).body).toMatchObject({
    status: "pending",
    provesAddress: false,
  });
  expect((await new HttpClient(server.url).get(`/api/invitations/${oldToken}`)).body.status).toBe("revoked");
  expect((await new HttpClient(server.url).get(`/api/invitations/${newToken}`)).body.status).toBe("pending");

  // The invited person signs up and follows the new link: joined, and the address counts as confirmed.
  const player = new HttpClient(server.url);
  expect(
    (await player.post("/api/auth/sign-up/email", { name: "Resent Player", email, password: TEST_PASSWORD, accountType: "player" })).status,
  ).toBe(200);
  expect((await player.post(`/api/invitations/${oldToken}/accept`)).status).toBe(409);
  const [unverified] = await server.database.db.select({ v: user.emailVerified }).from(user).where(eq(user.email, email));
  expect(unverified!.v).toBe(false);
  expect((await player.post(`/api/invitations/${newToken}/accept`)).status).toBe(200);
  const [verified] = await server.database.db.select({ v: user.emailVerified }).from(user).where(eq(user.email, email));
  expect(verified!.v).toBe(true);
  // At once, not after the session cookie's cached copy (a minute) runs out: no "confirm your e-mail" notice.
  const me = (await player.get("/api/me")).body.user;
  expect(me.emailVerified).toBe(true);
  // A brand-new account: the home page greets it as new from createdAt.
  expect(Date.now() - Date.parse(me.createdAt)).toBeLessThan(60_000);
  // Accepted: nothing left to resend.
  const rows = await server.database.db.select().from(invitations).where(eq(invitations.email, email));
  const accepted = rows.find((r) => r.status === "accepted")!;
  expect((await coach.client.post(`/api/invitations/${accepted.id}/resend`)).status).toBe(409);
});

test("a refused accept (another address) confirms nothing", async () => {
  const coach = await signedUpClient(server, "coach");
  const squadId = await createSquad(coach.client);
  const email = uniqueEmail("meant-for");
  await coach.client.post(`/api/squads/${squadId}/invitations`, { email });
  const token = await invitationTokenFor(server, email);
  const other = await signedUpClient(server, "player");
  expect((await other.client.post(`/api/invitations/${token}/accept`)).status).toBe(403);
  const [row] = await server.database.db.select({ v: user.emailVerified }).from(user).where(eq(user.id, other.id));
  expect(row!.v).toBe(false);
});
