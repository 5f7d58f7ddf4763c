// Issue 14, item 8: without BASE_URL, e-mailed links use the address the app was reached at — only when that
// address is one the server trusts. An untrusted Host header (link poisoning) falls back to the default address.
import http from "node:http";
import { afterAll, beforeAll, expect, test } from "vitest";
import { localOrigins } from "../../server/lib/link-origin";
import { coachWithSquad, createLadder, createSquad } from "../factories/coaching";
import { TEST_PASSWORD, signedUpClient, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let port: string;
beforeAll(async () => {
  server = await startTestServer();
  port = new URL(server.url).port;
}, 60_000);
afterAll(async () => {
  await server?.stop();
});

/** A client that sends a Host header of its choosing (fetch always sends the URL's), with a cookie jar. */
class HostClient {
  private cookies = new Map<string, string>();
  constructor(
    readonly url: string,
    readonly host: string,
  ) {}
  post(path: string, body: unknown): Promise<{ status: number; body: any }> {
    const payload = JSON.stringify(body);
    const target = new URL(path, this.url);
    return new Promise((resolve, reject) => {
      const req = http.request(
        target,
        {
          method: "POST",
          headers: {
            host: this.host,
            // The write itself comes from our own page; only the Host is forged.
            origin: this.url,
            "content-type": "application/json",
            "content-length": Buffer.byteLength(payload),
            ...(this.cookies.size ? { cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ") } : {}),
          },
        },
        (res) => {
          for (const line of res.headers["set-cookie"] ?? []) {
            const [pair] = line.split(";");
            const i = pair!.indexOf("=");
            this.cookies.set(pair!.slice(0, i).trim(), pair!.slice(i + 1).trim());
          }
          let text = "";
          res.on("data", (c) => (text += c));
          res.on("end", () => resolve({ status: res.statusCode ?? 0, body: text ? JSON.parse(text) : null }));
        },
      );
      req.on("error", reject);
      req.end(payload);
    });
  }
}

const linksIn = (text: string) => [...text.matchAll(/https?:\/\/[^\s<>"')\]]+/g)].map((m) => new URL(m[0]).origin);

test("sign-up and reset mail: links use the trusted address the request came to (127.0.0.1, not localhost)", async () => {
  const email = uniqueEmail("reached");
  const client = new HttpClient(server.url); // http://127.0.0.1:<port>
  expect(
    (await client.post("/api/auth/sign-up/email", { name: "Reached", email, password: TEST_PASSWORD, accountType: "player" })).status,
  ).toBe(200);
  const confirm = await server.smtpFake!.waitFor((m) => m.to.includes(email) && m.subject.startsWith("Confirm"));
  expect(linksIn(confirm.text)).toEqual([`http://127.0.0.1:${port}`]);
  await new HttpClient(server.url).post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" });
  const reset = await server.smtpFake!.waitFor((m) => m.to.includes(email) && /reset/i.test(m.subject));
  expect(linksIn(reset.text)).toEqual([`http://127.0.0.1:${port}`]);
});

test("POST /api/auth/request-password-reset with an untrusted Host: the link falls back to the default address", async () => {
  const email = uniqueEmail("poison");
  await new HttpClient(server.url).post("/api/auth/sign-up/email", {
    name: "Target",
    email,
    password: TEST_PASSWORD,
    accountType: "player",
  });
  const forged = new HostClient(server.url, "evil.example");
  const res = await forged.post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" });
  expect(res.status).toBe(200);
  const reset = await server.smtpFake!.waitFor((m) => m.to.includes(email) && /reset/i.test(m.subject));
  expect(reset.text).not.toContain("evil.example");
  expect(linksIn(reset.text)).toEqual([`http://localhost:${port}`]);
});

test("POST /api/auth/sign-up/email with an untrusted Host (same port): the confirmation link falls back", async () => {
  const email = uniqueEmail("poison-signup");
  const forged = new HostClient(server.url, `attacker.example:${port}`);
  expect(
    (await forged.post("/api/auth/sign-up/email", { name: "Target", email, password: TEST_PASSWORD, accountType: "player" })).status,
  ).toBe(200);
  const confirm = await server.smtpFake!.waitFor((m) => m.to.includes(email) && m.subject.startsWith("Confirm"));
  expect(confirm.text).not.toContain("attacker.example");
  expect(linksIn(confirm.text)).toEqual([`http://localhost:${port}`]);
});

test("POST /api/squads/:id/invitations: links on the trusted address reached; an untrusted Host falls back", async () => {
  const coach = await signedUpClient(server, "coach");
  const squadId = await createSquad(coach.client, "Origin squad");
  const email = uniqueEmail("invited");
  const res = await coach.client.post(`/api/squads/${squadId}/invitations`, { email });
  expect(res.status).toBe(201);
  expect(new URL(res.body.link as string).origin).toBe(`http://127.0.0.1:${port}`);
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(email) && m.subject.startsWith("Join "));
  expect(linksIn(mail.text)).toEqual([`http://127.0.0.1:${port}`]);

  // The same kind of request, a coach signed in through a forged Host.
  const forged = new HostClient(server.url, "evil.example");
  const coachEmail = uniqueEmail("forged-coach");
  expect(
    (await forged.post("/api/auth/sign-up/email", { name: "Coach", email: coachEmail, password: TEST_PASSWORD, accountType: "coach" }))
      .status,
  ).toBe(200);
  const squad = await forged.post("/api/squads", { name: "Forged squad" });
  expect(squad.status).toBe(201);
  const other = uniqueEmail("invited-forged");
  const invited = await forged.post(`/api/squads/${squad.body.id}/invitations`, { email: other });
  expect(invited.status).toBe(201);
  expect(new URL(invited.body.link as string).origin).toBe(`http://localhost:${port}`);
  const forgedMail = await server.smtpFake!.waitFor((m) => m.to.includes(other) && m.subject.startsWith("Join "));
  expect(forgedMail.text).not.toContain("evil.example");
  expect(linksIn(forgedMail.text)).toEqual([`http://localhost:${port}`]);
});

test("POST /api/ladders/:id/assignments: the notice links to the trusted address the coach reached", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const ladderId = await createLadder(coach.client);
  expect((await coach.client.post(`/api/ladders/${ladderId}/assignments`, { squadId })).status).toBe(201);
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(members[0]!.email) && m.subject.startsWith("You have a new ladder"));
  expect(linksIn(mail.text)).toEqual([`http://127.0.0.1:${port}`]);
});

test("with BASE_URL every link uses it, whatever the Host; start-up says which address links use", async () => {
  const lines: string[] = [];
  const s = await startTestServer({
    env: { BASE_URL: "https://putting.example-club.test", LOG_LEVEL: "info" },
    logDestination: { write: (l) => void lines.push(l) },
  });
  try {
    expect(lines.some((l) => l.includes("Links in e-mail point at https://putting.example-club.test"))).toBe(true);
    const email = uniqueEmail("fixed");
    // BASE_URL is the only trusted origin now: the test's write comes from it.
    const client = new HttpClient(s.url);
    const res = await client.post(
      "/api/auth/sign-up/email",
      { name: "Fixed", email, password: TEST_PASSWORD, accountType: "player" },
      { origin: "https://putting.example-club.test" },
    );
    expect(res.status).toBe(200);
    const mail = await s.smtpFake!.waitFor((m) => m.to.includes(email));
    expect(linksIn(mail.text)).toEqual(["https://putting.example-club.test"]);
  } finally {
    await s.stop();
  }
}, 60_000);

test("without BASE_URL start-up lists the addresses links may use", async () => {
  const lines: string[] = [];
  const s = await startTestServer({ env: { LOG_LEVEL: "info" }, logDestination: { write: (l) => void lines.push(l) } });
  try {
    const p = new URL(s.url).port;
    const said = lines.find((l) => l.includes("No BASE_URL: links in e-mail use the address the app was reached at"));
    expect(said).toBeDefined();
    expect(said).toContain(`http://127.0.0.1:${p}`);
    expect(said).toContain(`http://localhost:${p}`);
  } finally {
    await s.stop();
  }
}, 60_000);

test("localOrigins: on every interface, this machine's own addresses and name; link-local IPv6 and internal ones left out", () => {
  const interfaces = {
    lo: [{ address: "127.0.0.1", family: "IPv4", internal: true }],
    eth0: [
      { address: "192.168.1.20", family: "IPv4", internal: false },
      { address: "fe80::1", family: "IPv6", internal: false },
      { address: "2001:db8::5", family: "IPv6", internal: false },
    ],
  } as unknown as Parameters<typeof localOrigins>[2];
  expect(localOrigins("0.0.0.0", 5175, interfaces, "clubhouse").sort()).toEqual(
    ["http://localhost:5175", "http://127.0.0.1:5175", "http://192.168.1.20:5175", "http://clubhouse:5175"].sort(),
  );
  expect(localOrigins("::", 5175, interfaces, "clubhouse")).toContain("http://[2001:db8::5]:5175");
  expect(localOrigins("127.0.0.1", 5175, interfaces, "clubhouse").sort()).toEqual(["http://127.0.0.1:5175", "http://localhost:5175"]);
  expect(localOrigins("192.168.1.20", 80, interfaces, "clubhouse")).toContain("http://192.168.1.20");
});
