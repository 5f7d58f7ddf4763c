// Start-up and ownership of the data directory: a starting server answers (503 + Retry-After) instead of letting a
// request hang; the data-directory lock follows the owner's life, not a timer.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { DataDirLockedError } from "../../server/db/lock";
import { readEnv } from "../../server/env";
import { start } from "../../server/start";
import { backupArgv, seedDataDir, spawnChildServer, type ChildServer } from "../setup/children";
import { startTestServer } from "../setup/server";

const root = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-lifecycle-"));
const children: ChildProcess[] = [];
afterAll(() => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill("SIGKILL");
  fs.rmSync(root, { recursive: true, force: true });
});
const onPglite = !process.env.DATABASE_URL;
// A PID namespace needs root (or user namespaces); CI runs as root.
const canUnshare = onPglite && spawnSync("unshare", ["--pid", "--fork", "true"]).status === 0;

function spawnServer(dataDir: string, prefix: string[] = []): Promise<ChildServer> {
  const env = { DATA_DIR: dataDir, BETTER_AUTH_SECRET: "lifecycle-secret-lifecycle-secret-0001" };
  return spawnChildServer(env, children, { prefix });
}

test("GET /api/health and GET / while the server is starting answer 503 with Retry-After and the error body", async () => {
  const early: { status: number; retryAfter: string | null; body: unknown }[] = [];
  const server = await startTestServer({
    onListening: async (url) => {
      for (const p of ["/api/health", "/"]) {
        const res = await fetch(url + p);
        early.push({ status: res.status, retryAfter: res.headers.get("retry-after"), body: await res.json() });
      }
    },
  });
  try {
    expect(early).toHaveLength(2);
    for (const r of early) {
      expect(r.status).toBe(503);
      expect(Number(r.retryAfter)).toBeGreaterThan(0);
      expect(r.body).toMatchObject({ error: { code: "unavailable" } });
    }
    expect((await fetch(server.url + "/api/health")).status).toBe(200);
  } finally {
    await server.stop();
  }
});

test.skipIf(!canUnshare)(
  "a server restarted after SIGKILL with the same PID (1, as in a container) starts at once",
  async () => {
    const dataDir = path.join(root, "pid1");
    seedDataDir(dataDir);
    const first = await spawnServer(dataDir, ["unshare", "--pid", "--fork"]);
    expect(first.pid).toBe(1);
    expect((await fetch(first.url + "/api/health")).status).toBe(200);
    process.kill(first.hostPid, "SIGKILL");
    await first.exited;

    // The same PID again, right away: the dead owner's lock is gone with it.
    const second = await spawnServer(dataDir, ["unshare", "--pid", "--fork"]);
    expect(second.pid).toBe(1);
    expect((await fetch(second.url + "/api/health")).status).toBe(200);
    process.kill(second.hostPid, "SIGKILL");
    await second.exited;
  },
  90_000,
);

test.skipIf(!onPglite)(
  "a second server and a backup are refused while the owner's event loop is blocked for 15 s",
  async () => {
    // Each step's time is logged, so a slow run says which step was slow.
    const began = Date.now();
    const step = (what: string) => console.log(`lifecycle, blocked owner: ${what} at ${Date.now() - began} ms`);
    const dataDir = path.join(root, "blocked");
    seedDataDir(dataDir);
    const owner = await spawnServer(dataDir);
    step("owner listening");
    const blocking = owner.line("blocking");
    owner.child.kill("SIGUSR2");
    await blocking;
    step("owner blocking");
    // Past the 10 s after which the old mkdir lock counted as stale (its refresh timer cannot run meanwhile).
    await new Promise((r) => setTimeout(r, 11_000));

    const second = start({
      env: readEnv({ NODE_ENV: "test", PORT: "0", HOST: "127.0.0.1", DATA_DIR: dataDir, SEED: "0", LOG_LEVEL: "silent" }),
    });
    const backup = new Promise<{ status: number | null; stderr: string }>((resolve) => {
      const [command, ...args] = backupArgv(path.join(root, "b.tar.gz"));
      const b = spawn(command!, args, {
        env: { PATH: process.env.PATH, HOME: process.env.HOME, DATA_DIR: dataDir },
        stdio: ["ignore", "ignore", "pipe"],
      });
      let stderr = "";
      b.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
      b.once("exit", (status) => resolve({ status, stderr }));
    });
    await expect(second).rejects.toBeInstanceOf(DataDirLockedError);
    step("second server refused");
    const b = await backup;
    step("backup exited");
    expect(b.status).not.toBe(0);
    expect(b.stderr).toMatch(new RegExp(`already using the data directory`));
    expect(b.stderr).toContain(`pid ${owner.hostPid}`);
    expect(fs.existsSync(path.join(root, "b.tar.gz"))).toBe(false);

    // The owner comes back from its stall still the owner, and serves.
    expect((await fetch(owner.url + "/api/health")).status).toBe(200);
    step("owner answered");
    owner.child.kill("SIGTERM");
    expect(await owner.exited).toBe(0);
    step("owner stopped");
  },
  90_000,
);
