import { afterAll, beforeAll, expect, test } from "vitest";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

const logLines: string[] = [];
let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ env: { LOG_LEVEL: "trace" }, logDestination: { write: (line) => void logLines.push(line) } });
});
afterAll(async () => {
  await server?.stop();
});

test("passwords never reach the logs, even at trace level", async () => {
  const email = uniqueEmail("logged");
  const secret = "p4ssword-that-must-not-leak";
  const client = new HttpClient(server.url);
  expect((await client.post("/api/auth/sign-up/email", { name: "Logger", email, password: secret, accountType: "player" })).status).toBe(
    200,
  );
  await new HttpClient(server.url).post("/api/auth/sign-in/email", { email, password: `${secret}-wrong` });
  await new HttpClient(server.url).post("/api/auth/sign-in/email", { email, password: secret });
  await client.patch("/api/me/preferences", { units: "metric", password: secret });
  expect(logLines.length).toBeGreaterThan(3);
  expect(logLines.join("\n")).not.toContain(secret);
  // Session cookies are redacted from request logs too.
  expect(logLines.join("\n")).not.toMatch(/session_token=[A-Za-z0-9]/);
});

test("responses carry helmet's headers and a Content-Security-Policy", async () => {
  const res = await fetch(`${server.url}/api/health`);
  const csp = res.headers.get("content-security-policy") ?? "";
  expect(csp).toContain("default-src 'self'");
  expect(csp).toContain("script-src 'self'");
  expect(csp).toContain("frame-ancestors 'none'");
  expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  expect(res.headers.get("x-powered-by")).toBeNull();
});

test("a cookie-authenticated POST from a foreign origin is refused by better-auth's origin check", async () => {
  const client = new HttpClient(server.url);
  await client.post("/api/auth/sign-up/email", {
    name: "Original",
    email: uniqueEmail("origin"),
    password: TEST_PASSWORD,
    accountType: "player",
  });
  const forged = await client.request("POST", "/api/auth/update-user", { name: "Forged" }, { origin: "https://evil.example" });
  expect(forged.status).toBe(403);
  expect((await client.get("/api/me")).body.user.name).toBe("Original");
});

test("behind TLS (an https BASE_URL) the session cookie is Secure", async () => {
  const tls = await startTestServer({ env: { BASE_URL: "https://putting.example-club.test", TRUST_PROXY: "1" } });
  try {
    const res = await fetch(`${tls.url}/api/auth/sign-up/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "https://putting.example-club.test", "x-forwarded-proto": "https" },
      body: JSON.stringify({ name: "Secure", email: uniqueEmail("tls"), password: TEST_PASSWORD, accountType: "player" }),
    });
    expect(res.status).toBe(200);
    const cookie = res.headers.getSetCookie().find((c) => c.includes("session_token")) ?? "";
    expect(cookie).toMatch(/; Secure/i);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  } finally {
    await tls.stop();
  }
});
