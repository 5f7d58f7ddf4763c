// A first-ever start builds the new PGlite database in a short-lived child process (server/db/pglite-create.ts,
// bundled as dist-server/pglite-create.js), then opens it like a restart. Behaviour only: memory is a bench figure
// (bench/memory.ts).
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { readEnv } from "../../server/env";
import { start } from "../../server/start";
import { openPglite } from "../../server/db/client";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { HttpClient } from "../setup/http";

const dirs: string[] = [];
const newDir = () => {
  const d = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-first-"));
  dirs.push(d);
  return d;
};
afterAll(() => dirs.forEach((d) => fs.rmSync(d, { recursive: true, force: true })));
const env = (dataDir: string) =>
  readEnv({ NODE_ENV: "test", PORT: "0", HOST: "127.0.0.1", DATA_DIR: dataDir, SEED: "0", LOG_LEVEL: "silent" });

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "a first start builds the database beside the server, and a restart opens it with the data",
  async () => {
    const dataDir = newDir();
    // What a first start killed half-way through its build leaves: a half-built folder and an empty database folder.
    fs.mkdirSync(path.join(dataDir, "pglite.new"), { recursive: true });
    fs.writeFileSync(path.join(dataDir, "pglite.new", "PG_VERSION"), "half-built");
    fs.mkdirSync(path.join(dataDir, "pglite"));

    const email = uniqueEmail("first");
    const first = await start({ env: env(dataDir) });
    const client = new HttpClient(first.url);
    try {
      expect(fs.existsSync(path.join(dataDir, "pglite", "PG_VERSION"))).toBe(true);
      expect(fs.existsSync(path.join(dataDir, "pglite.new"))).toBe(false);
      const signUp = await client.post("/api/auth/sign-up/email", { name: "First", email, password: TEST_PASSWORD, accountType: "player" });
      expect(signUp.status).toBe(200);
    } finally {
      await first.close();
    }
    const second = await start({ env: env(dataDir) });
    try {
      const again = Object.assign(Object.create(Object.getPrototypeOf(client)), client, { baseUrl: second.url }) as HttpClient;
      expect((await again.get("/api/me")).body.user.email).toBe(email);
    } finally {
      await second.close();
    }
  },
  120_000,
); // two server starts, the first building a database in a child Node process

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "a first start whose database build fails leaves no database folder behind",
  async () => {
    const dataDir = newDir();
    const bad = readEnv({
      NODE_ENV: "test",
      PORT: "0",
      HOST: "127.0.0.1",
      DATA_DIR: dataDir,
      SEED: "0",
      LOG_LEVEL: "silent",
      PGLITE_SHARED_BUFFERS: "1kB",
    });
    await expect(start({ env: bad })).rejects.toThrow(/building the new database/);
    expect(fs.existsSync(path.join(dataDir, "pglite", "PG_VERSION"))).toBe(false);
    const ok = await start({ env: env(dataDir) });
    await ok.close();
  },
  120_000,
); // two database builds in child Node processes

test.skipIf(Boolean(process.env.DATABASE_URL))(
  "the production bundle ships the database-building entry, and it builds a migrated database",
  async () => {
    execFileSync("npm", ["run", "--silent", "build:server"], { stdio: "ignore" });
    const dir = path.join(newDir(), "pglite");
    execFileSync(process.execPath, ["dist-server/pglite-create.js", dir, "32MB"], { stdio: "ignore" });
    const database = await openPglite(dir);
    try {
      const tables = await database.pglite!.query<{ n: number }>(
        "select count(*)::int as n from information_schema.tables where table_name in ('user', 'putts')",
      );
      expect(tables.rows[0]?.n).toBe(2);
    } finally {
      await database.close();
    }
  },
  120_000,
);
