// Durability: what the server acknowledged survives a SIGKILL; SIGTERM lets in-flight requests finish.
import type { ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { spawnChildServer, type ChildServer } from "../setup/children";
import { HttpClient } from "../setup/http";

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-durable-"));
const children: ChildProcess[] = [];
afterAll(() => {
  for (const c of children) if (c.exitCode === null) c.kill("SIGKILL");
  fs.rmSync(dataDir, { recursive: true, force: true });
});

function spawnServer(): Promise<ChildServer> {
  return spawnChildServer({ DATA_DIR: dataDir, BETTER_AUTH_SECRET: "durability-secret-durability-secret-01" }, children);
}

function withBase(client: HttpClient, url: string): HttpClient {
  return Object.assign(Object.create(Object.getPrototypeOf(client)), client, { baseUrl: url }) as HttpClient;
}

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "every putt answered 2xx before a SIGKILL is stored after the restart, and the database opens cleanly",
  async () => {
    const first = await spawnServer();
    const client = new HttpClient(first.url);
    expect(
      (
        await client.post("/api/auth/sign-up/email", {
          name: "Durable",
          email: uniqueEmail("durable"),
          password: TEST_PASSWORD,
          accountType: "player",
        })
      ).status,
    ).toBe(200);
    const session = await client.post("/api/sessions", { date: "2026-11-30" });
    expect(session.status).toBe(201);
    const sessionId = session.body.id as string;

    const acknowledged = new Set<string>();
    let sent = 0;
    let killed = false;
    const worker = async () => {
      while (!killed && sent < 2000) {
        sent++;
        const clientId = crypto.randomUUID();
        try {
          const res = await client.post(`/api/sessions/${sessionId}/putts`, { distanceM: 1 + (sent % 9), holed: sent % 3 === 0, clientId });
          if (res.status === 201 || res.status === 200) acknowledged.add(res.body.id as string);
        } catch {
          // The connection died with the server: this putt was never acknowledged.
        }
        if (acknowledged.size >= 150 && !killed) {
          killed = true;
          first.child.kill("SIGKILL");
        }
      }
    };
    await Promise.all(Array.from({ length: 12 }, worker));
    await first.exited;
    expect(acknowledged.size).toBeGreaterThanOrEqual(150);

    const second = await spawnServer();
    try {
      const again = withBase(client, second.url);
      expect((await again.get("/api/health")).body).toEqual({ ok: true, db: "pglite" });
      const stored = await again.get(`/api/sessions/${sessionId}/putts`);
      expect(stored.status).toBe(200);
      const items = (Array.isArray(stored.body) ? stored.body : stored.body.items) as { id: string }[];
      const storedIds = new Set(items.map((p) => p.id));
      const lost = [...acknowledged].filter((id) => !storedIds.has(id));
      expect(lost).toEqual([]);
    } finally {
      second.child.kill("SIGTERM");
      await second.exited;
    }
  },
  120_000,
);

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "SIGTERM lets in-flight requests finish, closes the database and exits 0",
  async () => {
    const server = await spawnServer();
    const client = new HttpClient(server.url);
    expect(
      (
        await client.post("/api/auth/sign-up/email", {
          name: "Graceful",
          email: uniqueEmail("graceful"),
          password: TEST_PASSWORD,
          accountType: "player",
        })
      ).status,
    ).toBe(200);
    const sessionId = (await client.post("/api/sessions", { date: "2026-11-30" })).body.id as string;

    const inFlight = Array.from({ length: 40 }, (_, i) =>
      client.post(`/api/sessions/${sessionId}/putts`, { distanceM: 2, holed: i % 2 === 0, clientId: crypto.randomUUID() }),
    );
    await new Promise((r) => setTimeout(r, 5));
    server.child.kill("SIGTERM");
    const answers = await Promise.allSettled(inFlight);
    expect(await server.exited).toBe(0);
    const ok = answers.filter((a) => a.status === "fulfilled" && [200, 201].includes(a.value.status));
    // Every request that reached the server before SIGTERM got its answer; none was cut off mid-way.
    const failed = answers.filter((a) => a.status === "fulfilled" && ![200, 201].includes(a.value.status));
    expect(failed).toEqual([]);

    const after = await spawnServer();
    try {
      const stored = await withBase(client, after.url).get(`/api/sessions/${sessionId}/putts`);
      const items = (Array.isArray(stored.body) ? stored.body : stored.body.items) as unknown[];
      expect(items.length).toBe(ok.length);
      expect(ok.length).toBeGreaterThan(0);
    } finally {
      after.child.kill("SIGTERM");
      await after.exited;
    }
  },
  120_000,
);
