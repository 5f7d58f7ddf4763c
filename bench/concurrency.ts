// No request waits long behind another: while one player imports 50 000 CSV rows and another keeps asking for their
// make rates over 500 000 stored putts (50 000 of them theirs), a probe sends GET /api/health and a putt post every
// 200 ms. Printed: the probes' p50/p99/max beside the goal (p99 ≤ 250 ms), and the same probes on the idle server in
// the same run as the reference. The server is the real app (start()) on an in-memory PGlite, in this process.
// Run: npx tsx bench/concurrency.ts
import os from "node:os";
import { pathToFileURL } from "node:url";
import { sql } from "drizzle-orm";
import * as hdr from "hdr-histogram-js";
import { analyzeStale } from "../server/db/maintenance";
import { readEnv } from "../server/env";
import { start } from "../server/start";
import { seedClub } from "./stats";
import { puttsCsvForm } from "../tests/factories/csv";

type Probe = { p50: number; p99: number; max: number; n: number; failed: number };
export type ConcurrencyBenchResult = { idle: Probe; busy: Probe; importMs: number; statsQueries: number; putts: number };

async function signUp(url: string, name: string): Promise<{ cookie: string; id: string }> {
  const res = await fetch(`${url}/api/auth/sign-up/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: url },
    body: JSON.stringify({
      name,
      email: `${name.toLowerCase().replace(/\W/g, "")}-${Date.now()}@example.test`,
      password: "bench-password-123",
      accountType: "player",
    }),
  });
  if (!res.ok) throw new Error(`sign-up ${res.status}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  return { cookie, id: ((await res.json()) as { user: { id: string } }).user.id };
}

/** Health + putt post every 200 ms (open loop) until `until` resolves; latency from when each was due. */
async function probe(url: string, logger: { cookie: string }, sessionId: string, until: Promise<unknown>): Promise<Probe> {
  const h = hdr.build({ lowestDiscernibleValue: 1, highestTrackableValue: 120_000, numberOfSignificantValueDigits: 3 });
  let done = false;
  let failed = 0;
  void until.finally(() => (done = true));
  const inFlight: Promise<void>[] = [];
  let due = performance.now();
  while (!done) {
    await new Promise((r) => setTimeout(r, Math.max(0, due - performance.now())));
    const sentAt = due;
    due += 200;
    const timed = (p: Promise<Response>) =>
      p.then(async (res) => {
        await res.arrayBuffer();
        if (!res.ok) failed++;
        h.recordValue(Math.max(1, Math.round(performance.now() - sentAt)));
      });
    inFlight.push(timed(fetch(`${url}/api/health`)));
    inFlight.push(
      timed(
        fetch(`${url}/api/sessions/${sessionId}/putts`, {
          method: "POST",
          headers: { "content-type": "application/json", origin: url, cookie: logger.cookie },
          body: JSON.stringify({ distanceM: 2, holed: true }),
        }),
      ),
    );
  }
  await Promise.all(inFlight);
  return { p50: h.getValueAtPercentile(50), p99: h.getValueAtPercentile(99), max: h.maxValue, n: h.totalCount, failed };
}

export async function runConcurrencyBench({ putts = Number(process.env.STATS_PUTTS ?? 500_000) } = {}): Promise<ConcurrencyBenchResult> {
  const running = await start({
    env: readEnv({ NODE_ENV: "production", HOST: "127.0.0.1", PORT: "0", SEED: "0", LOG_LEVEL: "silent", DATA_DIR: os.tmpdir() }),
    pgliteDir: "memory://",
    rateLimits: {
      auth: { windowMs: 60_000, limit: 1000 },
      reads: { windowMs: 60_000, limit: 1_000_000 },
      imports: { windowMs: 60_000, limit: 100 },
    },
  });
  try {
    const { url, database } = running;
    // The seeding below holds the event loop for many seconds: a kept-alive connection must outlive it, or the
    // client's next request races the server closing it (ECONNRESET). Browsers keep connections alive too.
    running.server.keepAliveTimeout = 120_000;
    await seedClub(database, putts);
    const keen = await signUp(url, "Keen Player");
    const importer = await signUp(url, "Importer");
    const logger = await signUp(url, "Logger");
    // The seeded keen player's putts become the signed-up account's.
    await database.db.execute(sql`update practice_sessions set player_id = ${keen.id} where player_id = 'bench-player'`);
    await database.db.execute(sql`update putts set player_id = ${keen.id} where player_id = 'bench-player'`);
    await analyzeStale(database.db); // the server's own maintenance step (it runs every minute)
    const s = await fetch(`${url}/api/sessions`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: url, cookie: logger.cookie },
      body: JSON.stringify({ date: "2026-12-01" }),
    });
    const sessionId = ((await s.json()) as { id: string }).id;

    const idle = await probe(url, logger, sessionId, new Promise((r) => setTimeout(r, 5000)));

    const t0 = performance.now();
    let importMs = 0;
    const importing = fetch(`${url}/api/csv/putts/import`, {
      method: "POST",
      headers: { origin: url, cookie: importer.cookie },
      body: puttsCsvForm(50_000),
    }).then(async (res) => {
      await res.arrayBuffer();
      importMs = performance.now() - t0;
      if (!res.ok) throw new Error(`import ${res.status}`);
    });
    let statsQueries = 0;
    const stats = (async () => {
      let done = false;
      void importing.finally(() => (done = true));
      while (!done) {
        const res = await fetch(`${url}/api/stats/make-rates?source=practice`, { headers: { origin: url, cookie: keen.cookie } });
        await res.arrayBuffer();
        statsQueries++;
      }
    })();
    const busy = await probe(url, logger, sessionId, importing);
    await stats;
    return { idle, busy, importMs, statsQueries, putts };
  } finally {
    await running.close();
  }
}

export function printConcurrencyBench(r: ConcurrencyBenchResult): void {
  const f = (p: Probe) =>
    `p50 ${String(p.p50).padStart(5)} ms  p99 ${String(p.p99).padStart(6)} ms  max ${String(p.max).padStart(6)} ms  (${p.n} probes, ${p.failed} failed)`;
  console.log(`  reference, idle server:                       ${f(r.idle)}`);
  console.log(
    `  during a 50 000-row import + make-rate reads: ${f(r.busy)}   goal p99 ≤ 250 ms: ${r.busy.p99 <= 250 && r.busy.failed === 0 ? "met" : "NOT met"}`,
  );
  console.log(
    `  (the import took ${(r.importMs / 1000).toFixed(1)} s; ${r.statsQueries} make-rate queries over ${r.putts} stored putts ran meanwhile; load average ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")})`,
  );
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printConcurrencyBench(await runConcurrencyBench());
}
