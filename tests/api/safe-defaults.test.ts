// Safe by default (issue 11): the mailbox is the admin's, writes come from our own pages, bodies are bounded,
// e-mail is rate-limited, user fields a person may not set stay unset, better-auth errors have our shape, and a
// coach's access ends when the player leaves.
import http from "node:http";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, expect, test } from "vitest";
import { user } from "../../server/db/schema";
import { THREE_RUNGS, coachWithSquad, confirmEmail, createLadder, createSquad } from "../factories/coaching";
import { adminClient, signedUpClient, TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
}, 60_000);
afterAll(async () => {
  await server?.stop();
});

const errorShape = { error: { code: expect.any(String), message: expect.any(String) } };
const storedUser = async (email: string) => (await server.database.db.select().from(user).where(eq(user.email, email)))[0];
const sessionCount = async (client: HttpClient) => (await client.get("/api/sessions")).body.total as number;

// ---- 1. the mailbox ------------------------------------------------------------------------------------

test("GET /api/dev/mail: only a signed-in admin reads sent mail, in production and development mode alike; start-up says mail is held", async () => {
  for (const mode of ["production", "development"]) {
    const lines: string[] = [];
    const s = await startTestServer({ env: { NODE_ENV: mode, LOG_LEVEL: "info" }, logDestination: { write: (l) => void lines.push(l) } });
    try {
      const held = lines.filter((l) => /not delivered/i.test(l) && /local inbox/i.test(l));
      expect(held, `${mode}: one start-up line says mail is held locally`).toHaveLength(1);
      const player = await signedUpClient(s, "player");
      const coach = await signedUpClient(s, "coach");
      const reset = uniqueEmail("victim");
      await new HttpClient(s.url).post("/api/auth/sign-up/email", {
        name: "Victim",
        email: reset,
        password: TEST_PASSWORD,
        accountType: "player",
      });
      await new HttpClient(s.url).post("/api/auth/request-password-reset", { email: reset, redirectTo: "/reset-password" });
      await s.smtpFake!.waitFor((m) => m.to.includes(reset) && /reset/i.test(m.subject));
      for (const [who, client, status] of [
        ["signed out", new HttpClient(s.url), 401],
        ["player", player.client, 403],
        ["coach", coach.client, 403],
      ] as const) {
        const res = await client.get("/api/dev/mail");
        expect(res.status, `${mode}: ${who}`).toBe(status);
        expect(res.body).toMatchObject(errorShape);
        expect(JSON.stringify(res.body)).not.toContain(reset);
      }
      const admin = await adminClient(s);
      const read = await admin.client.get("/api/dev/mail");
      expect(read.status).toBe(200);
      expect(JSON.stringify(read.body)).toContain(reset);
    } finally {
      await s.stop();
    }
  }
}, 120_000);

test("POST /api/squads/:id/invitations answers the inviting coach with the link, which opens the invitation", async () => {
  const coach = await signedUpClient(server, "coach");
  const squadId = await createSquad(coach.client, "Link squad");
  const email = uniqueEmail("linked");
  const res = await coach.client.post(`/api/squads/${squadId}/invitations`, { email });
  expect(res.status).toBe(201);
  const link = res.body.link as string;
  expect(link).toMatch(/\/join\/[A-Za-z0-9_-]{43}$/);
  const token = link.split("/join/")[1]!;
  const preview = await new HttpClient(server.url).get(`/api/invitations/${token}`);
  expect(preview.status).toBe(200);
  expect(preview.body.email).toBe(email);
  expect(preview.body.provesAddress).toBe(false);
  // The e-mailed link opens the same invitation with a token of its own, which the coach never sees, so only
  // the reader of that inbox can use its proof of the address.
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(email));
  expect(mail.text).not.toContain(link);
  const mailed = mail.text.match(/\/join\/([A-Za-z0-9_-]{43})/)![1]!;
  const mailedPreview = await new HttpClient(server.url).get(`/api/invitations/${mailed}`);
  expect(mailedPreview.body).toMatchObject({ email, provesAddress: true });
});

// ---- 2. writes from our own origin ---------------------------------------------------------------------

test("state-changing /api requests with a cookie need our Origin (or Sec-Fetch-Site: same-origin): otherwise 403 and nothing stored", async () => {
  const { client } = await signedUpClient(server, "player");
  const before = await sessionCount(client);
  const refused: Record<string, string>[] = [
    { origin: "https://evil.example" },
    { origin: "null" },
    { origin: server.url.replace("127.0.0.1", "127.0.0.2") },
    { origin: "" },
    { origin: "", "sec-fetch-site": "cross-site" },
    { origin: "", "sec-fetch-site": "same-site" },
  ];
  for (const headers of refused) {
    const res = await client.request("POST", "/api/sessions", { date: "2026-05-01" }, headers);
    expect(res.status, JSON.stringify(headers)).toBe(403);
    expect(res.body).toMatchObject(errorShape);
    const del = await client.request("PATCH", "/api/me/preferences", { units: "metric" }, headers);
    expect(del.status, `PATCH ${JSON.stringify(headers)}`).toBe(403);
    const auth = await client.request("POST", "/api/auth/update-user", { name: "Forged" }, headers);
    expect(auth.status, `update-user ${JSON.stringify(headers)}`).toBe(403);
    expect(auth.body).toMatchObject(errorShape);
  }
  expect(await sessionCount(client)).toBe(before);
  expect((await client.get("/api/me")).body.user.name).toBe("Test Golfer");
  expect((await client.get("/api/me")).body.preferences.units).not.toBe("metric");
  // Our own pages: the Origin of the app, or a browser's same-origin fetch metadata without an Origin.
  expect(
    (await client.request("POST", "/api/sessions", { date: "2026-05-01" }, { origin: "", "sec-fetch-site": "same-origin" })).status,
  ).toBe(201);
  expect((await client.post("/api/sessions", { date: "2026-05-02" })).status).toBe(201);
  expect(await sessionCount(client)).toBe(before + 2);
  // Reads need no Origin.
  expect((await client.request("GET", "/api/sessions", undefined, { origin: "" })).status).toBe(200);
});

test("multipart bodies only on the upload routes: a JSON route answers 415 to multipart, form and text bodies", async () => {
  const { client } = await signedUpClient(server, "player");
  const form = new FormData();
  form.append("date", "2026-05-01");
  const multipart = await client.post("/api/sessions", form);
  expect(multipart.status).toBe(415);
  expect(multipart.body).toMatchObject(errorShape);
  expect((await client.post("/api/sessions", "date=2026-05-01", { "content-type": "application/x-www-form-urlencoded" })).status).toBe(415);
  expect((await client.post("/api/sessions", '{"date":"2026-05-01"}', { "content-type": "text/plain" })).status).toBe(415);
  const authForm = new FormData();
  authForm.append("name", "Form");
  expect((await client.post("/api/auth/update-user", authForm)).status).toBe(415);
  expect(await sessionCount(client)).toBe(0);
  // The CSV upload still takes its multipart file.
  const upload = new FormData();
  upload.append("file", new Blob(["Date,Distance (m),Made\n2026-03-01,2,yes\n"], { type: "text/csv" }), "putts.csv");
  upload.append("mapping", JSON.stringify({ date: "Date", distance: "Distance (m)", distanceUnit: "m", holed: "Made" }));
  expect((await client.post("/api/csv/putts/import", upload)).status).toBe(200);
});

// ---- 3. bounded bodies -----------------------------------------------------------------------------------

/** Sends `bytes` of JSON-ish body to `path` (with a Content-Length, or chunked) and resolves with the status and body. */
function bigPost(path: string, bytes: number, chunked = false): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const url = new URL(path, server.url);
    const req = http.request(url, {
      method: "POST",
      headers: { "content-type": "application/json", origin: server.url, ...(chunked ? {} : { "content-length": String(bytes) }) },
    });
    req.on("response", (res) => {
      let body = "";
      res.setEncoding("utf8");
      res.on("data", (c: string) => (body += c));
      res.on("end", () => resolve({ status: res.statusCode!, body }));
      res.on("error", reject);
    });
    // The server may close the connection once it has refused: a write error then is expected.
    req.on("error", () => {});
    const chunk = Buffer.alloc(64 * 1024, 0x61);
    const prefix = '{"email":"';
    let sent = prefix.length;
    const pump = () => {
      while (sent < bytes) {
        const n = Math.min(chunk.length, bytes - sent);
        sent += n;
        if (!req.write(n === chunk.length ? chunk : chunk.subarray(0, n))) return void req.once("drain", pump);
      }
      req.end();
    };
    req.write(prefix);
    pump();
  });
}

test("/api/auth/* bodies over 100 kB answer 413 at once; /api/health answers meanwhile", async () => {
  const email = uniqueEmail("huge");
  const big = await new HttpClient(server.url).post("/api/auth/sign-up/email", {
    name: "x".repeat(150_000),
    email,
    password: TEST_PASSWORD,
    accountType: "player",
  });
  expect(big.status).toBe(413);
  expect(big.body).toMatchObject(errorShape);
  expect(await storedUser(email)).toBeUndefined();

  for (const chunked of [false, true]) {
    const started = performance.now();
    const refusal = bigPost("/api/auth/send-verification-email", 10 * 1024 * 1024, chunked);
    const health = await fetch(`${server.url}/api/health`);
    const healthMs = performance.now() - started;
    expect(health.status).toBe(200);
    const refused = await refusal;
    expect(refused.status).toBe(413);
    expect(JSON.parse(refused.body)).toMatchObject(errorShape);
    // The figure for the closing note (a benchmark figure, not an assertion).
    console.info(
      `10 MB ${chunked ? "chunked" : "Content-Length"} body refused with 413; concurrent /api/health answered in ${healthMs.toFixed(0)} ms`,
    );
  }
});

test("names are length-limited and checked on sign-up and update-user (400 naming the field, nothing stored)", async () => {
  const email = uniqueEmail("long");
  const anon = new HttpClient(server.url);
  const long = await anon.post("/api/auth/sign-up/email", { name: "n".repeat(101), email, password: TEST_PASSWORD, accountType: "player" });
  expect(long.status).toBe(400);
  expect(long.body.error.fields).toHaveProperty("name");
  expect(await storedUser(email)).toBeUndefined();
  const nul = await anon.post("/api/auth/sign-up/email", { name: "A\u0000B", email, password: TEST_PASSWORD, accountType: "player" });
  expect(nul.status).toBe(400);
  expect(nul.body.error.fields).toHaveProperty("name");

  const { client, email: own } = await signedUpClient(server, "player");
  for (const name of ["x".repeat(10_000), "Bad\u0000Name", "\ud800", "", "Two\nlines"]) {
    const res = await client.post("/api/auth/update-user", { name });
    expect(res.status, JSON.stringify(name.slice(0, 20))).toBe(400);
    expect(res.body.error.fields).toHaveProperty("name");
  }
  expect((await storedUser(own))!.name).toBe("Test Golfer");
  expect((await client.get("/api/me")).body.user.name).toBe("Test Golfer");
});

// ---- 4. e-mail limits ----------------------------------------------------------------------------------

test("e-mail is rate-limited per recipient address and per client address: 429 with Retry-After and the error shape", async () => {
  const limited = await startTestServer({
    rateLimits: { mailPerRecipient: { windowMs: 60_000, limit: 2 }, mailPerClientAddress: { windowMs: 60_000, limit: 4 } },
  });
  try {
    const anon = new HttpClient(limited.url);
    const email = uniqueEmail("flooded");
    expect(
      (await anon.post("/api/auth/sign-up/email", { name: "Flooded", email, password: TEST_PASSWORD, accountType: "player" })).status,
    ).toBe(200);
    expect((await anon.post("/api/auth/send-verification-email", { email })).status).toBe(200);
    const third = await anon.post("/api/auth/send-verification-email", { email });
    expect(third.status).toBe(429);
    expect(third.body).toMatchObject({ error: { code: "too_many_requests", message: expect.any(String) } });
    expect(Number(third.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(
      (await new HttpClient(limited.url).post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" })).status,
    ).toBe(429);
    await limited.smtpFake!.waitFor((m) => m.to.includes(email) && m.subject.startsWith("Confirm") && m.id !== "1");
    expect(limited.smtpFake!.messages.filter((m) => m.to.includes(email))).toHaveLength(2);

    // Per client address: the same client asking for mail to ever new addresses.
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++)
      statuses.push(
        (await anon.post("/api/auth/request-password-reset", { email: uniqueEmail("other"), redirectTo: "/reset-password" })).status,
      );
    // Four counted so far from this address (sign-up, verification, refused verification, refused reset); limit 4.
    expect(statuses).toEqual([429, 429, 429]);
  } finally {
    await limited.stop();
  }
});

test("invitations and assignment notices are rate-limited per coach account and per recipient", async () => {
  const limited = await startTestServer({
    rateLimits: { mailPerRecipient: { windowMs: 60_000, limit: 2 }, mailPerAccount: { windowMs: 60_000, limit: 3 } },
  });
  try {
    const a = await signedUpClient(limited, "coach");
    const b = await signedUpClient(limited, "coach");
    const squadA = await createSquad(a.client, "A");
    const squadB = await createSquad(b.client, "B");
    const target = uniqueEmail("target");
    expect((await a.client.post(`/api/squads/${squadA}/invitations`, { email: target })).status).toBe(201);
    expect((await a.client.post(`/api/squads/${squadA}/invitations`, { email: target })).status).toBe(201);
    const third = await b.client.post(`/api/squads/${squadB}/invitations`, { email: target });
    expect(third.status).toBe(429);
    expect(third.headers.get("retry-after")).toBeTruthy();
    expect(third.body).toMatchObject(errorShape);
    expect((await b.client.get(`/api/squads/${squadB}/invitations`)).body.invitations).toEqual([]);
    // Coach A has sent 2 of 3: one more address, then refused.
    expect((await a.client.post(`/api/squads/${squadA}/invitations`, { email: uniqueEmail("x") })).status).toBe(201);
    expect((await a.client.post(`/api/squads/${squadA}/invitations`, { email: uniqueEmail("y") })).status).toBe(429);

    // Assignment notices count for the assigning coach (B has one refused invitation counted).
    const { coach, squadId } = await coachWithSquad(limited, 1); // one invitation counted
    const ladder = await createLadder(coach.client, THREE_RUNGS);
    expect((await coach.client.post(`/api/ladders/${ladder}/assignments`, { squadId })).status).toBe(201);
    expect((await coach.client.post(`/api/ladders/${ladder}/assignments`, { squadId })).status).toBe(201);
    const over = await coach.client.post(`/api/ladders/${ladder}/assignments`, { squadId });
    expect(over.status).toBe(429);
    expect(over.body).toMatchObject(errorShape);
  } finally {
    await limited.stop();
  }
}, 60_000);

// ---- 8. fields a user may not set ----------------------------------------------------------------------

const FORBIDDEN_FIELDS = {
  role: "admin",
  accountType: "coach",
  emailVerified: true,
  banned: true,
  banReason: "set by myself",
  banExpires: "2030-01-01T00:00:00.000Z",
};

test("POST /api/auth/sign-up/email refuses role, emailVerified and ban fields (400 naming the field, no account)", async () => {
  for (const [field, value] of Object.entries(FORBIDDEN_FIELDS)) {
    if (field === "accountType") continue; // a sign-up field; "admin" is refused in auth.test.ts
    const email = uniqueEmail("field");
    const res = await new HttpClient(server.url).post("/api/auth/sign-up/email", {
      name: "Field",
      email,
      password: TEST_PASSWORD,
      accountType: "player",
      [field]: value,
    });
    expect(res.status, field).toBe(400);
    expect(res.body.error.fields, field).toHaveProperty(field);
    expect(await storedUser(email), field).toBeUndefined();
  }
});

test("no better-auth route lets a player set accountType, role, emailVerified or ban fields: the stored row is unchanged", async () => {
  const routes = Object.values(server.auth.api as Record<string, { path?: string; options?: { method?: string | string[] } }>)
    .filter((e) => typeof e?.path === "string" && [e.options?.method].flat().includes("POST"))
    .map((e) => e.path!)
    .filter((p) => !p.includes(":"));
  expect(routes).toEqual(
    expect.arrayContaining(["/update-user", "/sign-up/email", "/change-password", "/update-session", "/admin/update-user"]),
  );
  const { email } = await signedUpClient(server, "player");
  const before = await storedUser(email);
  for (const path of routes) {
    const client = new HttpClient(server.url);
    expect((await client.post("/api/auth/sign-in/email", { email, password: TEST_PASSWORD })).status).toBe(200);
    // Each alone and with a name, all together, and beside what sign-in-like routes need.
    const bodies = [
      ...Object.entries(FORBIDDEN_FIELDS).flatMap(([k, v]) => [{ [k]: v }, { [k]: v, name: "Changed" }]),
      FORBIDDEN_FIELDS,
      { ...FORBIDDEN_FIELDS, name: "Changed" },
      { ...FORBIDDEN_FIELDS, name: "Changed", userId: before!.id, data: FORBIDDEN_FIELDS, email, password: TEST_PASSWORD },
    ];
    for (const [i, body] of bodies.entries()) {
      const res = await client.post(`/api/auth${path}`, body);
      expect(res.status, `${path} #${i}`).toBeLessThan(500);
      const now = await storedUser(email);
      for (const field of Object.keys(FORBIDDEN_FIELDS) as (keyof typeof now)[]) {
        expect(now?.[field], `${path} #${i} changed ${String(field)}`).toEqual(before?.[field]);
      }
    }
  }
}, 120_000);

// ---- 8. a coach's access ends when the player leaves ----------------------------------------------------

test("after the player leaves the squad, the coach no longer reads their assignments, putts, sessions or stats", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const ladder = await createLadder(coach.client, THREE_RUNGS);
  const assignment = (await coach.client.post(`/api/ladders/${ladder}/assignments`, { playerIds: [player.id] })).body.assignments[0]
    .id as string;
  const played = await player.client.post(`/api/assignments/${assignment}/putts`, { holed: true });
  expect(played.status).toBe(201);
  const session = (await player.client.post("/api/sessions", { date: "2026-05-01", notes: "mine" })).body.id as string;
  const putt = (await player.client.post(`/api/sessions/${session}/putts`, { distanceM: 2, holed: true })).body.id as string;
  const reads = [
    `/api/assignments/${assignment}`,
    `/api/sessions/${session}`,
    `/api/putts/${putt}`,
    `/api/sessions?playerId=${player.id}`,
    `/api/putts?playerId=${player.id}`,
    `/api/stats/make-rates?playerId=${player.id}`,
    `/api/coach/players/${player.id}`,
  ];
  for (const path of reads) expect((await coach.client.get(path)).status, `before leaving: ${path}`).toBe(200);
  expect(JSON.stringify((await coach.client.get(`/api/coach/squads/${squadId}/assignments`)).body)).toContain(assignment);

  expect((await player.client.post(`/api/squads/${squadId}/leave`)).status).toBe(204);
  for (const path of reads) {
    const res = await coach.client.get(path);
    expect(res.status, `after leaving: ${path}`).toBe(404);
    expect(JSON.stringify(res.body)).not.toContain(assignment);
  }
  expect(JSON.stringify((await coach.client.get(`/api/coach/squads/${squadId}/assignments`)).body)).not.toContain(assignment);
  // The player still has it.
  expect((await player.client.get(`/api/assignments/${assignment}`)).status).toBe(200);
});

test("an invitation is accepted only with a confirmed e-mail matching it", async () => {
  const coach = await signedUpClient(server, "coach");
  const squadId = await createSquad(coach.client, "Confirmed only");
  const invited = await signedUpClient(server, "player");
  const link = (await coach.client.post(`/api/squads/${squadId}/invitations`, { email: invited.email })).body.link as string;
  const token = link.split("/join/")[1]!;
  const refused = await invited.client.post(`/api/invitations/${token}/accept`);
  expect(refused.status).toBe(403);
  expect(refused.body).toMatchObject(errorShape);
  expect((await coach.client.get(`/api/squads/${squadId}`)).body.members).toEqual([]);
  await confirmEmail(server, invited.email);
  expect((await invited.client.post(`/api/invitations/${token}/accept`)).status).toBe(200);
});

// ---- 10. one error shape ---------------------------------------------------------------------------------

test("better-auth's errors come in our shape: {error: {code, message}}", async () => {
  const anon = new HttpClient(server.url);
  const wrong = await anon.post("/api/auth/sign-in/email", { email: uniqueEmail("nobody"), password: "wrong-password" });
  expect(wrong.status).toBe(401);
  expect(wrong.body).toEqual({ error: { code: "invalid_email_or_password", message: expect.any(String) } });
  const { email } = await signedUpClient(server, "player");
  const taken = await anon.post("/api/auth/sign-up/email", { name: "Again", email, password: TEST_PASSWORD, accountType: "player" });
  expect(taken.status).toBeGreaterThanOrEqual(400);
  expect(taken.body.error.code).toMatch(/^user_already_exists/);
  const unauth = await anon.post("/api/auth/update-user", { name: "Nobody" });
  expect(unauth.status).toBe(401);
  expect(unauth.body).toMatchObject(errorShape);
  const short = await anon.post("/api/auth/sign-up/email", {
    name: "Short",
    email: uniqueEmail("short"),
    password: "short",
    accountType: "player",
  });
  expect(short.status).toBe(400);
  expect(short.body).toMatchObject({ error: { code: "password_too_short", message: expect.any(String) } });
});
