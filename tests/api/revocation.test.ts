// Revocation is prompt: after sign-out, a password change, a password reset, "revoke other sessions", a role
// change or a ban, a copy of the old cookie is refused on every route once the session cookie cache (at most
// 5 s) has run out; changing the password revokes the other sessions.
import { afterAll, beforeAll, expect, test } from "vitest";
import { SESSION_CACHE_SECONDS } from "../../server/auth";
import { adminClient, signedUpClient, TEST_PASSWORD } from "../factories/users";
import { HttpClient } from "../setup/http";
import { fillPath, listApiRoutes } from "../setup/routes";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
}, 60_000);
afterAll(async () => {
  await server?.stop();
});

async function signIn(email: string, password = TEST_PASSWORD): Promise<HttpClient> {
  const client = new HttpClient(server.url);
  const res = await client.post("/api/auth/sign-in/email", { email, password });
  expect(res.status, `sign-in ${email}`).toBe(200);
  return client;
}

const PARAMS: Record<string, string> = { token: "A".repeat(43), playerId: "someone", n: "1" };
const param = (name: string) => PARAMS[name] ?? "00000000-0000-4000-8000-000000000000";

/** Every API route answers `client` exactly as it answers someone signed out. */
async function answersAsSignedOut(client: HttpClient, what: string) {
  const anon = new HttpClient(server.url);
  for (const route of listApiRoutes(server.app)) {
    const path = fillPath(route.path, param);
    const body = ["POST", "PUT", "PATCH"].includes(route.method) ? {} : undefined;
    const [a, b] = [await anon.request(route.method, path, body), await client.request(route.method, path, body)];
    expect(b.status, `${what}: ${route.method} ${route.path}`).toBe(a.status);
  }
  const session = await client.get("/api/auth/get-session");
  expect(session.body, `${what}: get-session`).toBeNull();
}

test(`old cookies are refused on every route within ${SESSION_CACHE_SECONDS} s of sign-out, password change or reset, revoking, a ban; a role change applies`, async () => {
  expect(SESSION_CACHE_SECONDS).toBeLessThanOrEqual(5);
  const admin = await adminClient(server);
  const stolen: Record<string, HttpClient> = {};

  // Sign-out: a copy of the cookie taken before signing out.
  const a = await signedUpClient(server, "player");
  stolen["sign-out"] = a.client.copy();
  expect((await a.client.post("/api/auth/sign-out")).status).toBe(200);

  // Password change from one session: the other session (and the changing session's old cookie) end.
  const b = await signedUpClient(server, "player");
  const bElsewhere = await signIn(b.email);
  stolen["password change (other session)"] = bElsewhere;
  stolen["password change (own old cookie)"] = b.client.copy();
  const changed = await b.client.post("/api/auth/change-password", { currentPassword: TEST_PASSWORD, newPassword: "a-brand-new-password" });
  expect(changed.status).toBe(200);
  expect((await b.client.get("/api/me")).status, "the session that changed the password goes on").toBe(200);

  // Password reset through the e-mailed link.
  const c = await signedUpClient(server, "player");
  stolen["password reset"] = c.client;
  expect(
    (await new HttpClient(server.url).post("/api/auth/request-password-reset", { email: c.email, redirectTo: "/reset-password" })).status,
  ).toBe(200);
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(c.email) && /reset/i.test(m.subject));
  const token = mail.text.match(/reset-password\/([A-Za-z0-9_-]+)/)?.[1];
  expect(token).toBeDefined();
  expect((await new HttpClient(server.url).post("/api/auth/reset-password", { token, newPassword: "another-new-password" })).status).toBe(
    200,
  );

  // "Revoke other sessions".
  const d = await signedUpClient(server, "player");
  stolen["revoke other sessions"] = await signIn(d.email);
  expect((await d.client.post("/api/auth/revoke-other-sessions")).status).toBe(200);

  // A ban by an admin.
  const e = await signedUpClient(server, "player");
  stolen["ban"] = e.client;
  expect((await admin.client.post(`/api/admin/users/${e.id}/ban`, {})).status).toBe(200);

  // A role change by an admin: the coach becomes a player.
  const coach = await signedUpClient(server, "coach");
  expect(
    (
      await coach.client.post("/api/ladders", {
        name: "Before",
        failRule: "restart",
        rungs: [{ distanceM: 1, balls: 1, passRule: { kind: "make", made: 1 } }],
      })
    ).status,
  ).toBe(201);
  expect((await admin.client.post(`/api/admin/users/${coach.id}/role`, { role: "player" })).status).toBe(200);

  for (const [what, client] of Object.entries(stolen)) expect(client.hasCookies(), what).toBe(true);
  // The signed copy of a session in the cookie is trusted for at most SESSION_CACHE_SECONDS after it was made.
  await new Promise((resolve) => setTimeout(resolve, SESSION_CACHE_SECONDS * 1000 + 500));

  for (const [what, client] of Object.entries(stolen)) await answersAsSignedOut(client, what);
  const demoted = await coach.client.post("/api/ladders", {
    name: "After",
    failRule: "restart",
    rungs: [{ distanceM: 1, balls: 1, passRule: { kind: "make", made: 1 } }],
  });
  expect(demoted.status).toBe(403);
  expect((await coach.client.get("/api/me")).body.user.role).toBe("player");
}, 120_000);
