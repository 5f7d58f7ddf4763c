import { execFile, execFileSync } from "node:child_process";
import { promisify } from "node:util";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { readEnv } from "../../server/env";
import { start } from "../../server/start";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";

const execFileAsync = promisify(execFile);
const root = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-backup-"));
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));
// A clean environment: vitest itself sets variables (BASE_URL="/", MODE…) that are not the server's.
const envFor = (dataDir: string) => ({ PATH: process.env.PATH, HOME: process.env.HOME, DATA_DIR: dataDir, LOG_LEVEL: "silent" });
const serverEnv = (dataDir: string) =>
  readEnv({ NODE_ENV: "test", PORT: "0", HOST: "127.0.0.1", DATA_DIR: dataDir, SEED: "0", LOG_LEVEL: "silent" });

async function signUp(dataDir: string, email: string) {
  const s = await start({ env: serverEnv(dataDir) });
  try {
    const res = await new HttpClient(s.url).post("/api/auth/sign-up/email", {
      name: "Backed Up",
      email,
      password: TEST_PASSWORD,
      accountType: "player",
    });
    expect(res.status).toBe(200);
  } finally {
    await s.close();
  }
}

async function canSignIn(dataDir: string, email: string): Promise<boolean> {
  const s = await start({ env: serverEnv(dataDir) });
  try {
    return (await new HttpClient(s.url).post("/api/auth/sign-in/email", { email, password: TEST_PASSWORD })).status === 200;
  } finally {
    await s.close();
  }
}

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "npm run backup writes a dump and npm run restore brings it back, keeping the replaced database aside",
  async () => {
    const dataDir = path.join(root, "data");
    const file = path.join(root, "borrowline.tar.gz");
    const before = uniqueEmail("before");
    const after = uniqueEmail("after");
    await signUp(dataDir, before);

    execFileSync("npm", ["run", "--silent", "backup", "--", file], { env: envFor(dataDir), stdio: "pipe" });
    expect(fs.statSync(file).size).toBeGreaterThan(100_000);

    // A change after the backup, then the restore: the account made before is there, the later one is gone.
    await signUp(dataDir, after);
    execFileSync("npm", ["run", "--silent", "restore", "--", file], { env: envFor(dataDir), stdio: "pipe" });
    expect(await canSignIn(dataDir, before)).toBe(true);
    expect(await canSignIn(dataDir, after)).toBe(false);
    expect(fs.readdirSync(dataDir).some((n) => n.startsWith("pglite.before-restore-"))).toBe(true);
  },
  120_000,
);

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "backup refuses while a server holds the data directory",
  async () => {
    const dataDir = path.join(root, "busy");
    const s = await start({ env: serverEnv(dataDir) });
    try {
      let message = "";
      try {
        // Asynchronously: a synchronous child would block this process's event loop, so the server here could not
        // keep its lock fresh and a slow start of the CLI (> 10 s on a busy machine) would find the lock stale.
        await execFileAsync("npm", ["run", "--silent", "backup", "--", path.join(root, "x.tar.gz")], { env: envFor(dataDir) });
      } catch (err) {
        message = String((err as { stderr?: string }).stderr);
      }
      expect(message).toMatch(/already using the data directory/);
    } finally {
      await s.close();
    }
  },
  60_000,
);
