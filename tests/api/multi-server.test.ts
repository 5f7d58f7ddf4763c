// More than one server on one PostgreSQL database (DATABASE_URL), as behind a load balancer: a putt burst split
// across two servers loses no acknowledged putt when one is SIGKILLed mid-burst, a session made on one server
// is good on the other, and the sign-in rate limit counts across both. Runs in the PostgreSQL pass of .ci/run.
import type { ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import pg from "pg";
import { afterAll, expect, test } from "vitest";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { spawnChildServer, type ChildServer } from "../setup/children";
import { HttpClient } from "../setup/http";
import { freshPostgresDatabase } from "../setup/server";

const adminUrl = process.env.DATABASE_URL;
const children: ChildProcess[] = [];
const drops: Array<() => Promise<void>> = [];
afterAll(async () => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill("SIGKILL");
  await Promise.all(
    children.map((c) => (c.exitCode === null && c.signalCode === null ? new Promise((r) => c.once("exit", r)) : undefined)),
  );
  for (const drop of drops) await drop();
});

function spawnServer(databaseUrl: string, env: Record<string, string> = {}): Promise<ChildServer> {
  // The same secret on every server, as the README asks; no DATA_DIR is shared (each gets its own).
  return spawnChildServer(
    {
      DATABASE_URL: databaseUrl,
      BETTER_AUTH_SECRET: "multi-server-secret-multi-server-secret-1",
      DATA_DIR: `/tmp/borrowline-multi-${crypto.randomUUID()}`,
      ...env,
    },
    children,
  );
}

/** The same signed-in client (cookie jar) pointed at another server. */
function on(client: HttpClient, url: string): HttpClient {
  return Object.assign(Object.create(Object.getPrototypeOf(client)), client, { baseUrl: url }) as HttpClient;
}

test.skipIf(!adminUrl)(
  "two servers on one database: a putt burst split across both keeps every acknowledged putt when one is SIGKILLed",
  async () => {
    const db = await freshPostgresDatabase(adminUrl!);
    drops.push(db.drop);
    const [a, b] = await Promise.all([spawnServer(db.url), spawnServer(db.url)]);
    const onA = new HttpClient(a.url);
    expect(
      (
        await onA.post("/api/auth/sign-up/email", {
          name: "Two Servers",
          email: uniqueEmail("multi"),
          password: TEST_PASSWORD,
          accountType: "player",
        })
      ).status,
    ).toBe(200);
    // The session cookie from A is good on B (sessions live in the database; one secret).
    const onB = on(onA, b.url);
    const session = await onB.post("/api/sessions", { date: "2026-12-01" });
    expect(session.status).toBe(201);
    const sessionId = session.body.id as string;

    const acknowledged = new Set<string>();
    let sent = 0;
    let killed = false;
    const worker = async (k: number) => {
      while (sent < 600) {
        const i = sent++;
        const client = (i + k) % 2 === 0 ? onA : onB;
        try {
          const res = await client.post(`/api/sessions/${sessionId}/putts`, {
            distanceM: 1 + (i % 9),
            holed: i % 3 === 0,
            clientId: crypto.randomUUID(),
          });
          if (res.status === 201 || res.status === 200) acknowledged.add(res.body.id as string);
          else if (!(client === onA && killed)) throw new Error(`unexpected ${res.status}`);
        } catch (err) {
          // Only requests to the killed server may fail (the connection died with it).
          if (client !== onA || !killed) throw err;
        }
        if (i === 200 && !killed) {
          killed = true;
          a.child.kill("SIGKILL");
        }
      }
    };
    await Promise.all([0, 1, 2, 3].map(worker));
    await a.exited;
    expect(killed).toBe(true);
    expect(acknowledged.size).toBeGreaterThan(150);

    const client = new pg.Client({ connectionString: db.url });
    await client.connect();
    try {
      const stored = await client.query<{ id: string }>("select id from putts where session_id = $1", [sessionId]);
      const ids = new Set(stored.rows.map((r) => r.id));
      const lost = [...acknowledged].filter((id) => !ids.has(id));
      expect(lost).toEqual([]);
    } finally {
      await client.end();
    }
    b.child.kill("SIGTERM");
    await b.exited;
  },
  120_000,
);

test.skipIf(!adminUrl)(
  "the sign-in rate limit holds across two servers on one database",
  async () => {
    const db = await freshPostgresDatabase(adminUrl!);
    drops.push(db.drop);
    const [a, b] = await Promise.all([spawnServer(db.url, { AUTH_LIMIT: "4" }), spawnServer(db.url, { AUTH_LIMIT: "4" })]);
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      // Alternate servers, as a load balancer would: 3 attempts each, 6 in all against a limit of 4.
      const res = await new HttpClient(i % 2 === 0 ? a.url : b.url).post("/api/auth/sign-in/email", {
        email: "nobody@example.test",
        password: "wrong-password-123",
      });
      statuses.push(res.status);
      if (res.status === 429) expect(res.body.error.code).toBe("too_many_requests");
    }
    // Neither server alone saw more than 3, so only a shared count refuses the 5th and 6th.
    expect(statuses.slice(0, 4).every((s) => s !== 429)).toBe(true);
    expect(statuses.slice(4)).toEqual([429, 429]);
    a.child.kill("SIGTERM");
    b.child.kill("SIGTERM");
    await Promise.all([a.exited, b.exited]);
  },
  120_000,
);

test.skipIf(!adminUrl)(
  "the local mail fake's inbox is one across servers: mail sent by one is read by an admin on the other",
  async () => {
    const db = await freshPostgresDatabase(adminUrl!);
    drops.push(db.drop);
    const [a, b] = await Promise.all([spawnServer(db.url), spawnServer(db.url)]);
    const golfer = uniqueEmail("inbox-a");
    // The verification e-mail is sent by server A, through A's own local fake.
    expect(
      (
        await new HttpClient(a.url).post("/api/auth/sign-up/email", {
          name: "Mail On A",
          email: golfer,
          password: TEST_PASSWORD,
          accountType: "player",
        })
      ).status,
    ).toBe(200);
    const adminEmail = uniqueEmail("inbox-admin");
    expect(
      (
        await new HttpClient(b.url).post("/api/auth/sign-up/email", {
          name: "Admin On B",
          email: adminEmail,
          password: TEST_PASSWORD,
          accountType: "player",
        })
      ).status,
    ).toBe(200);
    const client = new pg.Client({ connectionString: db.url });
    await client.connect();
    try {
      await client.query(`update "user" set role = 'admin' where email = $1`, [adminEmail]);
    } finally {
      await client.end();
    }
    const admin = new HttpClient(b.url);
    expect((await admin.post("/api/auth/sign-in/email", { email: adminEmail, password: TEST_PASSWORD })).status).toBe(200);
    // Sending is asynchronous to the sign-up answer: poll B's mailbox briefly for A's message.
    let seen = false;
    for (let i = 0; i < 50 && !seen; i++) {
      const read = await admin.get("/api/dev/mail");
      expect(read.status).toBe(200);
      seen = (read.body.messages as { to: string[] }[]).some((m) => m.to.includes(golfer));
      if (!seen) await new Promise((r) => setTimeout(r, 200));
    }
    expect(seen).toBe(true);
    a.child.kill("SIGTERM");
    b.child.kill("SIGTERM");
    await Promise.all([a.exited, b.exited]);
  },
  120_000,
);

test.skipIf(!adminUrl)(
  "connections the database ends (a restart, a failover, an administrator) are replaced: the server stays up and answers",
  async () => {
    const db = await freshPostgresDatabase(adminUrl!);
    drops.push(db.drop);
    const server = await spawnServer(db.url, { LOG_LEVEL: "warn" });
    const signUp = (name: string) =>
      new HttpClient(server.url).post("/api/auth/sign-up/email", {
        name,
        email: uniqueEmail(name.toLowerCase()),
        password: TEST_PASSWORD,
        accountType: "player",
      });
    // Every pool has idle connections now: the app's queries, the rate-limit counts and the mail fake's inbox.
    expect((await signUp("Before")).status).toBe(200);
    const admin = new pg.Client({ connectionString: db.url });
    await admin.connect();
    try {
      const ended = await admin.query(
        `select pg_terminate_backend(pid) as ok from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid()`,
      );
      expect(ended.rows.length).toBeGreaterThan(0);
    } finally {
      await admin.end();
    }
    await new Promise((r) => setTimeout(r, 500));
    expect(server.child.exitCode).toBeNull();
    expect((await signUp("After")).status).toBe(200);
    expect((await new HttpClient(server.url).get("/api/health")).status).toBe(200);
    expect(server.child.exitCode).toBeNull();
    server.child.kill("SIGTERM");
    await server.exited;
  },
  120_000,
);
