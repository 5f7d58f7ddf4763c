import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { readEnv } from "../../server/env";
import { start } from "../../server/start";
import { DataDirLockedError } from "../../server/db/lock";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { seedDataDir } from "../setup/children";
import { HttpClient } from "../setup/http";

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-persist-"));
afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));
// Begins from the run's migrated database, as a server that started here before would have left it: these tests are
// about what a restart keeps and who may open the directory, not about building a database (tests/api/first-start
// does that). Building it took the first test past its 30 s on CI's loaded machine, and the server it left open then
// held the lock against the next test.
if (!process.env.DATABASE_URL) seedDataDir(dataDir);

const env = () => readEnv({ NODE_ENV: "test", PORT: "0", HOST: "127.0.0.1", DATA_DIR: dataDir, SEED: "0", LOG_LEVEL: "silent" });

test.skipIf(Boolean(process.env.DATABASE_URL))("data and the session survive a restart on the same DATA_DIR", async () => {
  const email = uniqueEmail("persist");
  const first = await start({ env: env() });
  const client = new HttpClient(first.url);
  try {
    const signUp = await client.post("/api/auth/sign-up/email", {
      name: "Persistent",
      email,
      password: TEST_PASSWORD,
      accountType: "player",
    });
    expect(signUp.status).toBe(200);
    expect((await client.patch("/api/me/preferences", { units: "metric" })).status).toBe(200);
  } finally {
    await first.close();
  }

  const second = await start({ env: env() });
  try {
    // Same cookie jar, new process-level server and port: the session lives in the database.
    const again = Object.assign(Object.create(Object.getPrototypeOf(client)), client, { baseUrl: second.url }) as HttpClient;
    const me = await again.get("/api/me");
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
    expect(me.body.preferences.units).toBe("metric");
  } finally {
    await second.close();
  }
});

test.skipIf(Boolean(process.env.DATABASE_URL))("a second server on the same DATA_DIR refuses to start", async () => {
  const first = await start({ env: env() });
  try {
    await expect(start({ env: env() })).rejects.toThrow(DataDirLockedError);
    await expect(start({ env: env() })).rejects.toThrow(/already using the data directory/);
  } finally {
    await first.close();
  }
  // Once the first has stopped, the directory is free again.
  const third = await start({ env: env() });
  await third.close();
});
