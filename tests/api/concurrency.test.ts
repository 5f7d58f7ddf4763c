// No request waits long behind another: a 50 000-row CSV import is written in short chunks that let other
// requests through, imports are rate-limited per user, and a statement past the timeout answers 503.
import express from "express";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, expect, test } from "vitest";
import { isStatementTimeout, errorHandler } from "../../server/middleware/errors";
import { createLogger } from "../../server/lib/logger";
import { signedUpClient } from "../factories/users";
import { startTestServer, type TestServer } from "../setup/server";
import { puttsCsvForm } from "../factories/csv";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({
    rateLimits: {
      auth: { windowMs: 60_000, limit: 10_000 },
      reads: { windowMs: 60_000, limit: 100_000 },
      imports: { windowMs: 60_000, limit: 2 },
    },
    env: { DB_STATEMENT_TIMEOUT_MS: "300" },
  });
});
afterAll(async () => {
  await server?.stop();
});

test("GET /api/health and POST /api/sessions/:id/putts are answered while a 50 000-row import is being written", async () => {
  const { client: importer } = await signedUpClient(server, "player");
  const { client: logger } = await signedUpClient(server, "player");
  const session = await logger.post("/api/sessions", { date: "2026-12-01" });
  expect(session.status).toBe(201);

  let importDone = false;
  const importing = importer.post("/api/csv/putts/import", puttsCsvForm(50_000)).then((res) => {
    importDone = true;
    return res;
  });
  // Wait until the import is part-way through its writes: its sessions are visible, still marked pending.
  let pendingSeen = false;
  while (!importDone && !pendingSeen) {
    const list = await importer.get("/api/sessions?pageSize=5");
    pendingSeen = (list.body.items as { tags: string[] }[]).some((s) => s.tags.includes("csv-import-pending"));
  }
  expect(pendingSeen).toBe(true);
  const health = await fetch(server.url + "/api/health");
  const healthDuringImport = !importDone;
  const putt = await logger.post(`/api/sessions/${session.body.id}/putts`, { distanceM: 2, holed: true });
  const puttDuringImport = !importDone;
  expect(health.status).toBe(200);
  expect(putt.status).toBe(201);
  expect(healthDuringImport).toBe(true);
  expect(puttDuringImport).toBe(true);

  const res = await importing;
  expect(res.status).toBe(200);
  expect(res.body.imported).toBe(50_000);
  // Whole once answered: no session of the import is left pending, and every putt is there.
  const sessions = await importer.get("/api/sessions?pageSize=100");
  expect(sessions.status).toBe(200);
  expect(sessions.body.total).toBe(84);
  expect((sessions.body.items as { tags: string[] }[]).every((s) => !s.tags.includes("csv-import-pending"))).toBe(true);
  const stored = await importer.get("/api/putts?pageSize=1");
  expect(stored.body.total).toBe(50_000);
  // And the planner statistics were refreshed by the import itself.
  const stats = (await server.database.db.execute(sql`select reltuples::float8 as n from pg_class where relname = 'putts'`)) as unknown as {
    rows: { n: number }[];
  };
  expect(Number(stats.rows[0]!.n)).toBeGreaterThan(25_000);
}, 180_000);

test("POST /api/csv/putts/import is rate-limited per user: 429 with the error body, another user still imports", async () => {
  const { client: a } = await signedUpClient(server, "player");
  const { client: b } = await signedUpClient(server, "player");
  expect((await a.post("/api/csv/putts/import", puttsCsvForm(3))).status).toBe(200);
  expect((await a.post("/api/csv/putts/import", puttsCsvForm(3))).status).toBe(200);
  const third = await a.post("/api/csv/putts/import", puttsCsvForm(3));
  expect(third.status).toBe(429);
  expect(third.body.error.code).toBe("too_many_requests");
  expect((await b.post("/api/csv/putts/import", puttsCsvForm(3))).status).toBe(200);
});

test("a statement timeout (SQLSTATE 57014) answers 503 with Retry-After and the error body", async () => {
  const app = express();
  app.get("/slow", () => {
    throw Object.assign(new Error("Failed query"), {
      cause: Object.assign(new Error("canceling statement due to statement timeout"), { code: "57014" }),
    });
  });
  app.use(errorHandler(createLogger("silent")));
  const listening = app.listen(0, "127.0.0.1");
  await new Promise((r) => listening.once("listening", r));
  try {
    const res = await fetch(`http://127.0.0.1:${(listening.address() as { port: number }).port}/slow`);
    expect(res.status).toBe(503);
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(await res.json()).toMatchObject({ error: { code: "timeout" } });
  } finally {
    listening.close();
  }
});

test.skipIf(!process.env.DATABASE_URL)("on PostgreSQL a statement past DB_STATEMENT_TIMEOUT_MS is cancelled", async () => {
  const err = await server.database.db.execute(sql`select pg_sleep(3)`).then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(isStatementTimeout(err)).toBe(true);
  expect((await server.database.db.execute(sql`select 1 as one`)) as unknown).toBeTruthy();
});
