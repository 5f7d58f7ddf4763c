// Starts a real Borrowline server for an HTTP test file: fresh in-memory PGlite (or DATABASE_URL) with
// the real migrations, the SMTP fake, an ephemeral port on 127.0.0.1.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { inject } from "vitest";
import { readEnv } from "../../server/env";
import { start, type Running, type StartOptions } from "../../server/start";

/** Limits no ordinary test reaches; a test of a limit passes its own. */
export const GENEROUS_RATE_LIMITS = {
  auth: { windowMs: 60_000, limit: 10_000 },
  reads: { windowMs: 60_000, limit: 100_000 },
  mailPerRecipient: { windowMs: 60_000, limit: 10_000 },
  mailPerAccount: { windowMs: 60_000, limit: 10_000 },
  mailPerClientAddress: { windowMs: 60_000, limit: 10_000 },
  imports: { windowMs: 60_000, limit: 10_000 },
};

export type TestServer = Running & { dataDir: string; stop: () => Promise<void> };

/** The migrated database made once per run by tests/setup/global-unit.ts (absent outside vitest's unit project). */
function templateBlob(): Blob | undefined {
  let file: string | undefined;
  try {
    file = inject("pgliteTemplate");
  } catch {
    return undefined;
  }
  return file && fs.existsSync(file) ? new Blob([fs.readFileSync(file)]) : undefined;
}

/** On a PostgreSQL server each test server gets a database of its own, so files can run in parallel. */
export async function freshPostgresDatabase(adminUrl: string): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `borrowline_test_${process.pid}_${Math.random().toString(36).slice(2, 10)}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      const c = new pg.Client({ connectionString: adminUrl });
      await c.connect();
      await c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await c.end();
    },
  };
}

export async function startTestServer(
  options: Partial<Omit<StartOptions, "env">> & { env?: Record<string, string> } = {},
): Promise<TestServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-test-"));
  const pgDb = process.env.DATABASE_URL ? await freshPostgresDatabase(process.env.DATABASE_URL) : undefined;
  const env = readEnv({
    NODE_ENV: "test",
    PORT: "0",
    HOST: "127.0.0.1",
    DATA_DIR: dataDir,
    SEED: "0",
    LOG_LEVEL: "silent",
    BETTER_AUTH_SECRET: "test-secret-test-secret-test-secret-0123",
    ...(pgDb ? { DATABASE_URL: pgDb.url } : {}),
    ...options.env,
  });
  const running = await start({
    env,
    pgliteDir: options.pgliteDir ?? "memory://",
    pgliteLoad: options.pgliteDir === undefined && !pgDb ? templateBlob() : undefined,
    rateLimits: { ...GENEROUS_RATE_LIMITS, ...options.rateLimits },
    frontend: options.frontend,
    onListening: options.onListening,
    logDestination: options.logDestination,
  });
  return {
    ...running,
    dataDir,
    stop: async () => {
      await running.close();
      await pgDb?.drop();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
