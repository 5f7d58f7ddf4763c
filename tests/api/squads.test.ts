import crypto from "node:crypto";
import { afterAll, beforeAll, expect, test } from "vitest";
import { eq } from "drizzle-orm";
import { invitations, squadMembers } from "../../server/db/schema";
import { coachWithSquad, confirmEmail, createSquad, invitationTokenFor, joinedPlayer } from "../factories/coaching";
import { TEST_PASSWORD, signedUpClient, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

const sha256 = (s: string) => crypto.createHash("sha256").update(s).digest("hex");

async function invite(coach: HttpClient, squadId: string, email: string) {
  const res = await coach.post(`/api/squads/${squadId}/invitations`, { email });
  expect(res.status).toBe(201);
  return { id: res.body.invitation.id as string, token: await invitationTokenFor(server, email) };
}

test("POST /api/squads creates a squad and GET /api/squads lists it with members and counts", async () => {
  const coach = await signedUpClient(server, "coach", "Coach Lists");
  const created = await coach.client.post("/api/squads", { name: "  Juniors  ", description: "Saturday mornings" });
  expect(created.status).toBe(201);
  expect(created.body).toMatchObject({
    name: "Juniors",
    description: "Saturday mornings",
    coach: { id: coach.id, name: "Coach Lists" },
    members: [],
    counts: { members: 0, pendingInvitations: 0, assignments: 0 },
  });
  const squadId = created.body.id as string;
  const player = await joinedPlayer(server, coach.client, squadId, "Alma Member");
  await coach.client.post(`/api/squads/${squadId}/invitations`, { email: uniqueEmail("pending") });

  const list = await coach.client.get("/api/squads");
  expect(list.status).toBe(200);
  expect(list.body.squads).toHaveLength(1);
  expect(list.body.squads[0]).toMatchObject({
    id: squadId,
    members: [{ id: player.id, name: "Alma Member", email: player.email }],
    counts: { members: 1, pendingInvitations: 1, assignments: 0 },
  });

  // A player sees the squads they belong to, without the other members' details.
  const mine = await player.client.get("/api/squads");
  expect(mine.status).toBe(200);
  expect(mine.body.squads).toEqual([
    expect.objectContaining({ id: squadId, name: "Juniors", coach: { id: coach.id, name: "Coach Lists" }, counts: { members: 1 } }),
  ]);
  expect(mine.body.squads[0]).not.toHaveProperty("members");
});

test("POST /api/squads and PATCH /api/squads/:id with bad input are 400s naming the fields", async () => {
  const coach = await signedUpClient(server, "coach");
  const empty = await coach.client.post("/api/squads", { name: "   " });
  expect(empty.status).toBe(400);
  expect(empty.body.error.fields).toHaveProperty("name");
  const extra = await coach.client.post("/api/squads", { name: "A", colour: "red" });
  expect(extra.status).toBe(400);
  const long = await coach.client.post("/api/squads", { name: "A", description: "x".repeat(501) });
  expect(long.body.error.fields).toHaveProperty("description");
  const squadId = await createSquad(coach.client);
  const nothing = await coach.client.patch(`/api/squads/${squadId}`, {});
  expect(nothing.status).toBe(400);
  expect(nothing.body.error.fields).toHaveProperty("body");
  const badId = await coach.client.get("/api/squads/not-a-uuid");
  expect(badId.status).toBe(400);
  expect((await coach.client.get("/api/squads")).body.squads).toHaveLength(1);
});

test("PATCH /api/squads/:id renames and clears the description; DELETE /api/squads/:id removes it", async () => {
  const coach = await signedUpClient(server, "coach");
  const created = await coach.client.post("/api/squads", { name: "Old name", description: "Something" });
  const id = created.body.id as string;
  const patched = await coach.client.patch(`/api/squads/${id}`, { name: "New name", description: null });
  expect(patched.status).toBe(200);
  expect(patched.body).toMatchObject({ name: "New name", description: null });
  expect((await coach.client.get(`/api/squads/${id}`)).body.name).toBe("New name");
  expect((await coach.client.delete(`/api/squads/${id}`)).status).toBe(204);
  expect((await coach.client.get(`/api/squads/${id}`)).status).toBe(404);
});

test("the invitation e-mail reaches the SMTP fake and a newly signed-up player accepts it and appears in the squad", async () => {
  const coach = await signedUpClient(server, "coach", "Dana Coach");
  const squadId = await createSquad(coach.client, "Heath juniors");
  const email = uniqueEmail("newcomer");
  const sent = await coach.client.post(`/api/squads/${squadId}/invitations`, { email: email.toUpperCase() });
  expect(sent.status).toBe(201);
  expect(sent.body.invitation).toMatchObject({ email, status: "pending", squadId });
  expect(JSON.stringify(sent.body)).not.toMatch(/token/i);
  const days = (Date.parse(sent.body.invitation.expiresAt) - Date.now()) / 86_400_000;
  expect(days).toBeGreaterThan(13.9);
  expect(days).toBeLessThanOrEqual(14);

  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(email) && m.subject.startsWith("Join "));
  expect(mail.subject).toBe("Join Heath juniors on Borrowline");
  expect(mail.text).toContain("Dana Coach");
  const link = mail.text.match(/https?:\/\/\S+\/join\/\S+/)![0];
  const token = new URL(link).pathname.split("/").pop()!;
  expect(new URL(link).pathname).toBe(`/join/${token}`);

  // Only the SHA-256 of the token is stored.
  const [row] = await server.database.db.select().from(invitations).where(eq(invitations.id, sent.body.invitation.id));
  expect(row!.tokenHash).toBe(sha256(token));
  expect(JSON.stringify(row)).not.toContain(token);

  // The join page can show the invitation before anyone signs in.
  const anon = new HttpClient(server.url);
  const preview = await anon.get(`/api/invitations/${token}`);
  expect(preview.status).toBe(200);
  expect(preview.body).toEqual({
    squad: { name: "Heath juniors" },
    coach: { name: "Dana Coach" },
    email,
    status: "pending",
    expiresAt: expect.any(String),
    provesAddress: true,
  });

  // A new person follows the link, signs up as a player with that address, then accepts.
  expect((await anon.post(`/api/invitations/${token}/accept`)).status).toBe(401);
  const signUp = await anon.post("/api/auth/sign-up/email", { name: "New Junior", email, password: TEST_PASSWORD, accountType: "player" });
  expect(signUp.status).toBe(200);
  // The coach's share link proves nothing about the address: not before the e-mail is confirmed.
  const shareToken = new URL(sent.body.link).pathname.split("/").pop()!;
  expect(shareToken).not.toBe(token);
  expect((await anon.get(`/api/invitations/${shareToken}`)).body.provesAddress).toBe(false);
  const unconfirmed = await anon.post(`/api/invitations/${shareToken}/accept`);
  expect(unconfirmed.status).toBe(403);
  expect(unconfirmed.body.error.message).toMatch(/Confirm your e-mail/);
  expect((await coach.client.get(`/api/squads/${squadId}`)).body.members).toEqual([]);
  // The e-mailed link does: only someone who reads that inbox has it, so following it confirms the address.
  const accepted = await anon.post(`/api/invitations/${token}/accept`);
  expect(accepted.status).toBe(200);
  expect(accepted.body).toMatchObject({ squad: { id: squadId, name: "Heath juniors", coach: { name: "Dana Coach" } } });
  expect((await anon.get("/api/me")).body.user.emailVerified).toBe(true);

  const squad = await coach.client.get(`/api/squads/${squadId}`);
  expect(squad.body.members).toEqual([expect.objectContaining({ id: signUp.body.user.id, name: "New Junior", email })]);
  expect((await anon.get("/api/squads")).body.squads.map((s: { id: string }) => s.id)).toEqual([squadId]);
  const listed = await coach.client.get(`/api/squads/${squadId}/invitations`);
  expect(listed.body.invitations[0]).toMatchObject({ status: "accepted", acceptedBy: signUp.body.user.id });
  expect((await anon.get(`/api/invitations/${token}`)).body.status).toBe("accepted");
});

test("POST /api/invitations/:token/accept works once", async () => {
  const { coach, squadId } = await coachWithSquad(server, 0);
  const player = await signedUpClient(server, "player");
  await confirmEmail(server, player.email);
  const { token } = await invite(coach.client, squadId, player.email);
  expect((await player.client.post(`/api/invitations/${token}/accept`)).status).toBe(200);
  const again = await player.client.post(`/api/invitations/${token}/accept`);
  expect(again.status).toBe(409);
  expect(again.body.error.message).toMatch(/already been used/);
  const members = await server.database.db.select().from(squadMembers).where(eq(squadMembers.squadId, squadId));
  expect(members).toHaveLength(1);
});

test("an expired invitation is shown as expired and refused", async () => {
  const { coach, squadId } = await coachWithSquad(server, 0);
  const player = await signedUpClient(server, "player");
  const { id, token } = await invite(coach.client, squadId, player.email);
  await server.database.db
    .update(invitations)
    .set({ expiresAt: new Date(Date.now() - 60_000) })
    .where(eq(invitations.id, id));
  expect((await new HttpClient(server.url).get(`/api/invitations/${token}`)).body.status).toBe("expired");
  const res = await player.client.post(`/api/invitations/${token}/accept`);
  expect(res.status).toBe(409);
  expect(res.body.error.message).toMatch(/expired/);
  expect((await coach.client.get(`/api/squads/${squadId}/invitations`)).body.invitations[0].status).toBe("expired");
  expect((await coach.client.get(`/api/squads/${squadId}`)).body.members).toEqual([]);
});

test("DELETE /api/invitations/:id revokes: the token then fails; an accepted one cannot be revoked", async () => {
  const { coach, squadId } = await coachWithSquad(server, 0);
  const player = await signedUpClient(server, "player");
  const { id, token } = await invite(coach.client, squadId, player.email);
  expect((await coach.client.delete(`/api/invitations/${id}`)).status).toBe(204);
  expect((await new HttpClient(server.url).get(`/api/invitations/${token}`)).body.status).toBe("revoked");
  const res = await player.client.post(`/api/invitations/${token}/accept`);
  expect(res.status).toBe(409);
  expect(res.body.error.message).toMatch(/withdrawn/);
  expect((await coach.client.get(`/api/squads/${squadId}`)).body.members).toEqual([]);

  const other = await signedUpClient(server, "player");
  await confirmEmail(server, other.email);
  const second = await invite(coach.client, squadId, other.email);
  expect((await other.client.post(`/api/invitations/${second.token}/accept`)).status).toBe(200);
  const late = await coach.client.delete(`/api/invitations/${second.id}`);
  expect(late.status).toBe(409);
});

test("POST /api/invitations/:token/accept refuses another e-mail address and a coach account, and the link stays usable", async () => {
  const { coach, squadId } = await coachWithSquad(server, 0);
  const invited = await signedUpClient(server, "player");
  await confirmEmail(server, invited.email);
  const { token } = await invite(coach.client, squadId, invited.email);
  const stranger = await signedUpClient(server, "player");
  await confirmEmail(server, stranger.email);
  const wrong = await stranger.client.post(`/api/invitations/${token}/accept`);
  expect(wrong.status).toBe(403);
  expect(wrong.body.error.message).toContain(invited.email);
  expect((await invited.client.post(`/api/invitations/${token}/accept`)).status).toBe(200);

  const otherCoach = await signedUpClient(server, "coach");
  const forCoach = await invite(coach.client, squadId, otherCoach.email);
  const refused = await otherCoach.client.post(`/api/invitations/${forCoach.token}/accept`);
  expect(refused.status).toBe(403);
  expect(refused.body.error.message).toMatch(/player accounts/);
});

test("POST /api/squads/:id/invitations: a bad e-mail is a 400; a member is a 409; inviting again withdraws the older link", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const bad = await coach.client.post(`/api/squads/${squadId}/invitations`, { email: "not-an-address" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("email");
  const missing = await coach.client.post(`/api/squads/${squadId}/invitations`, {});
  expect(missing.body.error.fields).toHaveProperty("email");
  expect((await coach.client.post(`/api/squads/${squadId}/invitations`, { email: members[0]!.email })).status).toBe(409);

  const email = uniqueEmail("twice");
  const first = await invite(coach.client, squadId, email);
  await coach.client.post(`/api/squads/${squadId}/invitations`, { email });
  await server.smtpFake!.waitFor((m) => m.to.includes(email) && !m.text.includes(first.token));
  const statuses = (await coach.client.get(`/api/squads/${squadId}/invitations`)).body.invitations
    .filter((i: { email: string }) => i.email === email)
    .map((i: { status: string }) => i.status);
  expect(statuses.sort()).toEqual(["pending", "revoked"]);
});

test("GET /api/invitations/:token: a malformed token is a 400, an unknown one a 404", async () => {
  const anon = new HttpClient(server.url);
  const bad = await anon.get("/api/invitations/short");
  expect(bad.status).toBe(400);
  const unknown = await anon.get(`/api/invitations/${crypto.randomBytes(32).toString("base64url")}`);
  expect(unknown.status).toBe(404);
});

test("DELETE /api/squads/:id/members/:playerId removes a member; POST /api/squads/:id/leave lets a player leave", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 2);
  const [first, second] = members as [(typeof members)[0], (typeof members)[0]];
  expect((await coach.client.delete(`/api/squads/${squadId}/members/${first.id}`)).status).toBe(204);
  expect((await coach.client.delete(`/api/squads/${squadId}/members/${first.id}`)).status).toBe(404);
  expect((await first.client.get("/api/squads")).body.squads).toEqual([]);

  expect((await second.client.post(`/api/squads/${squadId}/leave`)).status).toBe(204);
  expect((await second.client.post(`/api/squads/${squadId}/leave`)).status).toBe(404);
  expect((await coach.client.get(`/api/squads/${squadId}`)).body.members).toEqual([]);
  expect((await coach.client.get("/api/coach/players")).body.players).toEqual([]);
});
