import { afterAll, beforeAll, expect, test } from "vitest";
import { eq } from "drizzle-orm";
import { user } from "../../server/db/schema";
import { TEST_PASSWORD, adminClient, signedUpClient, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

test("GET /api/health answers ok with the database kind", async () => {
  const res = await new HttpClient(server.url).get("/api/health");
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ ok: true, db: process.env.DATABASE_URL ? "postgres" : "pglite" });
});

test("POST /api/auth/sign-up/email creates a player who is signed in at once", async () => {
  const { client, email } = await signedUpClient(server, "player", "Ivy Test");
  const me = await client.get("/api/me");
  expect(me.status).toBe(200);
  expect(me.body.user).toMatchObject({ email, name: "Ivy Test", role: "player", emailVerified: false });
  expect(me.body.preferences).toEqual({ units: "imperial" });
});

test("POST /api/auth/sign-up/email with accountType coach makes a coach", async () => {
  const { client } = await signedUpClient(server, "coach");
  expect((await client.get("/api/me")).body.user.role).toBe("coach");
});

test("POST /api/auth/sign-up/email refuses role admin, and accountType admin", async () => {
  const client = new HttpClient(server.url);
  const email = uniqueEmail("sneaky");
  const withRole = await client.post("/api/auth/sign-up/email", {
    name: "Sneaky",
    email,
    password: TEST_PASSWORD,
    accountType: "player",
    role: "admin",
  });
  expect(withRole.status).toBe(400);
  const withType = await client.post("/api/auth/sign-up/email", { name: "Sneaky", email, password: TEST_PASSWORD, accountType: "admin" });
  expect(withType.status).toBe(400);
  const rows = await server.database.db.select().from(user).where(eq(user.email, email));
  expect(rows).toHaveLength(0);
});

test("POST /api/auth/update-user cannot raise one's own role to admin", async () => {
  const { client, email } = await signedUpClient(server, "player");
  const res = await client.post("/api/auth/update-user", { role: "admin" });
  expect(res.status).toBe(400);
  // A body with a field the user may not set is refused whole (400 naming it): nothing of it is stored.
  const typed = await client.post("/api/auth/update-user", { accountType: "coach", name: "Renamed" });
  expect(typed.status).toBe(400);
  expect(typed.body.error.fields).toHaveProperty("accountType");
  const [row] = await server.database.db.select().from(user).where(eq(user.email, email));
  expect(row?.role).toBe("player");
  expect(row?.accountType).toBe("player");
  expect(row?.name).toBe("Test Golfer");
  expect((await client.get("/api/me")).body.user.role).toBe("player");
});

test("POST /api/auth/sign-up/email with a taken e-mail is refused", async () => {
  const { email } = await signedUpClient(server);
  const res = await new HttpClient(server.url).post("/api/auth/sign-up/email", {
    name: "Again",
    email,
    password: TEST_PASSWORD,
    accountType: "player",
  });
  expect(res.status).toBe(422);
});

test("POST /api/auth/sign-in/email signs in; a wrong password is 401", async () => {
  const { email } = await signedUpClient(server);
  const wrong = new HttpClient(server.url);
  const bad = await wrong.post("/api/auth/sign-in/email", { email, password: "not-the-password" });
  expect(bad.status).toBe(401);
  expect((await wrong.get("/api/me")).body).toEqual({ user: null, preferences: null });

  const right = new HttpClient(server.url);
  const ok = await right.post("/api/auth/sign-in/email", { email, password: TEST_PASSWORD });
  expect(ok.status).toBe(200);
  expect((await right.get("/api/me")).body.user.email).toBe(email);
});

test("POST /api/auth/sign-out ends the session", async () => {
  const { client } = await signedUpClient(server);
  expect((await client.get("/api/me")).status).toBe(200);
  const out = await client.post("/api/auth/sign-out");
  expect(out.status).toBe(200);
  expect((await client.get("/api/me")).body).toEqual({ user: null, preferences: null });
});

test("GET /api/auth/get-session reads the session", async () => {
  const { client, email } = await signedUpClient(server);
  const res = await client.get("/api/auth/get-session");
  expect(res.status).toBe(200);
  expect(res.body.user.email).toBe(email);
});

test("the session cookie is HttpOnly and SameSite=Lax", async () => {
  const res = await fetch(`${server.url}/api/auth/sign-up/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: server.url },
    body: JSON.stringify({ name: "Cookie", email: uniqueEmail(), password: TEST_PASSWORD, accountType: "player" }),
  });
  const cookie = res.headers.getSetCookie().find((c) => c.includes("session_token"));
  expect(cookie).toMatch(/HttpOnly/i);
  expect(cookie).toMatch(/SameSite=Lax/i);
});

test("a verification e-mail reaches the SMTP fake with a link that verifies", async () => {
  const { client, email } = await signedUpClient(server);
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(email));
  expect(mail.subject).toMatch(/confirm/i);
  const link = mail.text.match(/https?:\/\/\S+/)?.[0];
  expect(link).toContain("/api/auth/verify-email?token=");
  const res = await client.get(link!.replace(/^https?:\/\/[^/]+/, ""));
  expect([200, 302]).toContain(res.status);
  expect((await client.get("/api/me")).body.user.emailVerified).toBe(true);
});

test("password reset sends an e-mail whose token sets a new password", async () => {
  const { email } = await signedUpClient(server);
  const anon = new HttpClient(server.url);
  const asked = await anon.post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" });
  expect(asked.status).toBe(200);
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(email) && /reset/i.test(m.subject));
  const link = mail.text.match(/https?:\/\/\S+/)![0];
  const token = new URL(link).pathname.split("/").pop()!;
  const reset = await anon.post("/api/auth/reset-password", { token, newPassword: "a-brand-new-pass" });
  expect(reset.status).toBe(200);
  const signIn = await new HttpClient(server.url).post("/api/auth/sign-in/email", { email, password: "a-brand-new-pass" });
  expect(signIn.status).toBe(200);
});

test("PATCH /api/me/preferences remembers units and rejects unknown ones with the field named", async () => {
  const { client } = await signedUpClient(server);
  const ok = await client.patch("/api/me/preferences", { units: "metric" });
  expect(ok.status).toBe(200);
  expect((await client.get("/api/me")).body.preferences.units).toBe("metric");
  const bad = await client.patch("/api/me/preferences", { units: "yards" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("units");
  expect((await client.get("/api/me")).body.preferences.units).toBe("metric");
});

test("signed-out requests to a signed-in route are 401 with the error shape", async () => {
  const res = await new HttpClient(server.url).get("/api/sessions");
  expect(res.status).toBe(401);
  expect(res.body).toEqual({ error: { code: "unauthenticated", message: expect.any(String) } });
});

test("GET /api/me signed out is a 200 saying nobody is signed in (no error in a signed-out page's console), and reveals nothing", async () => {
  const res = await new HttpClient(server.url).get("/api/me");
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ user: null, preferences: null });
});

test("unknown /api paths are a JSON 404; malformed JSON is a 400; a non-JSON body is 415", async () => {
  const client = (await signedUpClient(server)).client;
  const missing = await client.get("/api/no-such-thing");
  expect(missing.status).toBe(404);
  expect(missing.body.error.code).toBe("not_found");
  const malformed = await client.request("PATCH", "/api/me/preferences", "{not json", { "content-type": "application/json" });
  expect(malformed.status).toBe(400);
  expect(malformed.body.error.fields).toHaveProperty("body");
  const wrongType = await client.request("PATCH", "/api/me/preferences", "units=metric", { "content-type": "text/plain" });
  expect(wrongType.status).toBe(415);
});

test("an admin made in the database is seen as admin", async () => {
  const { client } = await adminClient(server);
  expect((await client.get("/api/me")).body.user.role).toBe("admin");
});
