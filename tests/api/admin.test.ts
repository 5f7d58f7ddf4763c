// The admin screens' API: better-auth's admin plugin behind /api/admin, every change in the audit list,
// and the two rules an admin cannot break: their own admin role and banning themselves.
import { afterAll, beforeAll, expect, test } from "vitest";
import { eq } from "drizzle-orm";
import { adminAudit, session, user } from "../../server/db/schema";
import { createLadder, createSquad } from "../factories/coaching";
import { adminClient, signedUpClient, TEST_PASSWORD } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let admin: Awaited<ReturnType<typeof adminClient>>;
beforeAll(async () => {
  server = await startTestServer();
  admin = await adminClient(server);
});
afterAll(async () => {
  await server?.stop();
});

const auditOf = async (targetId: string) =>
  (await admin.client.get("/api/admin/audit")).body.entries.filter((e: { target: { id: string } }) => e.target.id === targetId);

test("GET /api/admin/users lists and searches accounts by e-mail or name, and filters by role", async () => {
  const coach = await signedUpClient(server, "coach", "Findable Coachname");
  const player = await signedUpClient(server, "player", "Other Person");
  const all = await admin.client.get("/api/admin/users");
  expect(all.status).toBe(200);
  expect(all.body.total).toBeGreaterThanOrEqual(3);
  const byName = await admin.client.get("/api/admin/users?search=Coachname&field=name");
  expect(byName.body.users.map((u: { id: string }) => u.id)).toEqual([coach.id]);
  const byEmail = await admin.client.get(`/api/admin/users?search=${encodeURIComponent(player.email)}`);
  expect(byEmail.body.users).toEqual([expect.objectContaining({ id: player.id, role: "player", banned: false })]);
  const coaches = await admin.client.get("/api/admin/users?role=coach");
  expect(coaches.body.users.every((u: { role: string }) => u.role === "coach")).toBe(true);
  expect(coaches.body.users.map((u: { id: string }) => u.id)).toContain(coach.id);
  const bad = await admin.client.get("/api/admin/users?role=owner&page=0");
  expect(bad.status).toBe(400);
  expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["role", "page"]));
});

test("POST /api/admin/users/:id/role moves an account between player and coach and records who, what and when", async () => {
  const p = await signedUpClient(server, "player", "Becomes Coach");
  const before = Date.now();
  const res = await admin.client.post(`/api/admin/users/${p.id}/role`, { role: "coach" });
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({ id: p.id, role: "coach" });
  const [row] = await server.database.db.select({ role: user.role }).from(user).where(eq(user.id, p.id));
  expect(row!.role).toBe("coach");
  const [entry] = await auditOf(p.id);
  expect(entry).toMatchObject({
    actor: { id: admin.id, email: admin.email },
    action: "role.set",
    target: { id: p.id, email: p.email },
    detail: { from: "player", to: "coach" },
  });
  expect(Date.parse(entry.createdAt)).toBeGreaterThanOrEqual(before - 1000);
  // Admin is never given here; bad input is a 400 and records nothing.
  const toAdmin = await admin.client.post(`/api/admin/users/${p.id}/role`, { role: "admin" });
  expect(toAdmin.status).toBe(400);
  expect(toAdmin.body.error.fields).toHaveProperty("role");
  expect(await auditOf(p.id)).toHaveLength(1);
  expect((await admin.client.post("/api/admin/users/nobody-here/role", { role: "coach" })).status).toBe(404);
});

test("an admin cannot change their own role or ban themselves, and nothing is recorded", async () => {
  const rowsBefore = (await server.database.db.select().from(adminAudit)).length;
  const demote = await admin.client.post(`/api/admin/users/${admin.id}/role`, { role: "coach" });
  expect(demote.status).toBe(403);
  const ban = await admin.client.post(`/api/admin/users/${admin.id}/ban`, {});
  expect(ban.status).toBe(403);
  const [me] = await server.database.db.select({ role: user.role, banned: user.banned }).from(user).where(eq(user.id, admin.id));
  expect(me).toEqual({ role: "admin", banned: false });
  expect((await server.database.db.select().from(adminAudit)).length).toBe(rowsBefore);
  // Another admin's role is not changed here either.
  const other = await adminClient(server);
  expect((await admin.client.post(`/api/admin/users/${other.id}/role`, { role: "player" })).status).toBe(403);
});

test("the plugin's own endpoints refuse changes, so no admin action escapes the audit", async () => {
  const p = await signedUpClient(server, "player");
  for (const [path, body] of [
    ["/api/auth/admin/set-role", { userId: p.id, role: "coach" }],
    ["/api/auth/admin/ban-user", { userId: p.id }],
    ["/api/auth/admin/set-role", { userId: admin.id, role: "player" }],
    ["/api/auth/admin/impersonate-user", { userId: p.id }],
    ["/api/auth/admin/remove-user", { userId: p.id }],
  ] as const) {
    const res = await admin.client.post(path, body);
    expect(res.status, path).toBe(403);
  }
  const [row] = await server.database.db.select({ role: user.role, banned: user.banned }).from(user).where(eq(user.id, p.id));
  expect(row).toEqual({ role: "player", banned: false });
});

test("ban ends the account's sessions and sign-in; unban lets them back; both are recorded", async () => {
  const p = await signedUpClient(server, "player", "Banned For A While");
  expect((await p.client.get("/api/me")).status).toBe(200);
  const ban = await admin.client.post(`/api/admin/users/${p.id}/ban`, { reason: "Shared the account" });
  expect(ban.status).toBe(200);
  expect(ban.body).toMatchObject({ banned: true, banReason: "Shared the account" });
  const again = new HttpClient(server.url);
  expect((await again.post("/api/auth/sign-in/email", { email: p.email, password: TEST_PASSWORD })).status).toBe(403);
  const unban = await admin.client.post(`/api/admin/users/${p.id}/unban`);
  expect(unban.status).toBe(200);
  expect(unban.body.banned).toBe(false);
  expect((await again.post("/api/auth/sign-in/email", { email: p.email, password: TEST_PASSWORD })).status).toBe(200);
  expect((await auditOf(p.id)).map((e: { action: string }) => e.action)).toEqual(["user.unban", "user.ban"]);
  expect((await admin.client.post(`/api/admin/users/${p.id}/ban`, { reason: "x".repeat(201) })).status).toBe(400);
});

test("revoke sessions signs the account out everywhere; password reset e-mails them a link", async () => {
  const p = await signedUpClient(server, "player", "Lost Phone");
  const second = new HttpClient(server.url);
  expect((await second.post("/api/auth/sign-in/email", { email: p.email, password: TEST_PASSWORD })).status).toBe(200);
  const revoke = await admin.client.post(`/api/admin/users/${p.id}/revoke-sessions`);
  expect(revoke.status).toBe(204);
  // The sessions are gone from the database (the signed cookie cache may carry one for up to a minute).
  expect(await server.database.db.select().from(session).where(eq(session.userId, p.id))).toEqual([]);

  const reset = await admin.client.post(`/api/admin/users/${p.id}/password-reset`);
  expect(reset.status).toBe(204);
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(p.email) && m.subject.includes("Reset"));
  expect(mail.text).toMatch(/reset-password/);
  expect((await auditOf(p.id)).map((e: { action: string }) => e.action)).toEqual(["password-reset.send", "sessions.revoke"]);
});

test("GET /api/admin/coaching names the owner of every squad and ladder", async () => {
  const c1 = await signedUpClient(server, "coach", "Owner Anna");
  const c2 = await signedUpClient(server, "coach", "Owner Bert");
  const s1 = await createSquad(c1.client, "Anna's juniors");
  const l2 = await createLadder(c2.client);
  const res = await admin.client.get("/api/admin/coaching");
  expect(res.status).toBe(200);
  expect(res.body.squads).toContainEqual(expect.objectContaining({ id: s1, owner: { id: c1.id, name: "Owner Anna", email: c1.email } }));
  expect(res.body.ladders).toContainEqual(
    expect.objectContaining({ id: l2, owner: { id: c2.id, name: "Owner Bert", email: c2.email }, rungs: 3 }),
  );
});
