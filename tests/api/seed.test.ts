import { afterAll, beforeAll, expect, test } from "vitest";
import { count } from "drizzle-orm";
import { seedDemo } from "../../server/db/seed";
import { DEMO_COACH, DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import { putts, user } from "../../server/db/schema";
import { createLogger } from "../../server/lib/logger";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ env: { SEED: "1" } });
});
afterAll(async () => {
  await server?.stop();
});

test("the demo coach and players can sign in with the README's password", async () => {
  for (const who of [DEMO_COACH, DEMO_PLAYERS[0]]) {
    const client = new HttpClient(server.url);
    const res = await client.post("/api/auth/sign-in/email", { email: who.email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const me = await client.get("/api/me");
    expect(me.body.user).toMatchObject({ email: who.email, name: who.name, emailVerified: true });
  }
  const coach = new HttpClient(server.url);
  await coach.post("/api/auth/sign-in/email", { email: DEMO_COACH.email, password: DEMO_PASSWORD });
  expect((await coach.get("/api/me")).body.user.role).toBe("coach");
});

test("seeding again changes nothing (idempotent)", async () => {
  const db = server.database.db;
  const before = { users: (await db.select({ n: count() }).from(user))[0]!.n, putts: (await db.select({ n: count() }).from(putts))[0]!.n };
  expect(before.putts).toBeGreaterThan(500);
  await seedDemo(db, createLogger("silent"));
  const after = { users: (await db.select({ n: count() }).from(user))[0]!.n, putts: (await db.select({ n: count() }).from(putts))[0]!.n };
  expect(after).toEqual(before);
});
