// Starts a real Borrowline server for an HTTP test file: fresh in-memory PGlite (or DATABASE_URL) with
// the real migrations, the SMTP fake, an ephemeral port on 127.0.0.1.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { readEnv } from "../../server/env";
import { start, type Running, type StartOptions } from "../../server/start";

export type TestServer = Running & { dataDir: string; stop: () => Promise<void> };

export async function startTestServer(options: Partial<Omit<StartOptions, "env">> & { env?: Record<string, string> } = {}): Promise<TestServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-test-"));
  const env = readEnv({
    NODE_ENV: "test",
    PORT: "0",
    HOST: "127.0.0.1",
    DATA_DIR: dataDir,
    SEED: "0",
    LOG_LEVEL: "silent",
    BETTER_AUTH_SECRET: "test-secret-test-secret-test-secret-0123",
    ...(process.env.DATABASE_URL ? { DATABASE_URL: process.env.DATABASE_URL } : {}),
    ...options.env,
  });
  const running = await start({
    env,
    pgliteDir: options.pgliteDir ?? "memory://",
    rateLimits: options.rateLimits ?? { auth: { windowMs: 60_000, limit: 10_000 }, reads: { windowMs: 60_000, limit: 100_000 } },
    frontend: options.frontend,
  });
  return {
    ...running,
    dataDir,
    stop: async () => {
      await running.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
