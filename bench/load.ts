// npm run bench:load — drives the real server (a child process on 127.0.0.1 only) with autocannon.
// Each scenario is bounded in time and stops by itself; figures are printed, never asserted.
import { spawn } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import readline from "node:readline";
import autocannon from "autocannon";
import * as hdr from "hdr-histogram-js";

const SECONDS = Number(process.env.LOAD_SECONDS ?? 10);
/** The steady club-peak scenario runs 30 s (the goal's length); the others LOAD_SECONDS. */
const STEADY_SECONDS = Number(process.env.STEADY_SECONDS ?? 30);
const PLAYERS = 50;
/** LOAD_ONLY=steady runs the club-peak scenario alone (for profiling). */
const ONLY = process.env.LOAD_ONLY;
if (SECONDS > 30 || STEADY_SECONDS > 30) throw new Error("LOAD_SECONDS and STEADY_SECONDS are at most 30 per scenario");

type Figures = {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  errors: number;
  non2xx: number;
  total: number;
  goal: string;
  met: boolean;
};

/** CPU seconds a process has used so far (user + system), from /proc: to tell the server's cost from the client's. */
function cpuSeconds(pid: number | "self"): number {
  const fields = fs.readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]!.split(" ");
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

async function startServer(): Promise<{ url: string; pid: number; stop: () => Promise<void> }> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-load-"));
  const child = spawn(
    process.execPath,
    [
      ...(process.env.LOAD_PROFILE ? ["--cpu-prof", "--cpu-prof-dir=" + process.env.LOAD_PROFILE] : []),
      "--import",
      "tsx",
      "bench/load-server.ts",
    ],
    {
      env: {
        PATH: process.env.PATH,
        HOME: process.env.HOME,
        LOAD_STALLS: process.env.LOAD_STALLS ?? "",
        NODE_OPTIONS: process.env.LOAD_NODE_OPTIONS ?? "",
        DATA_DIR: dataDir,
        PORT: "0",
      },
      stdio: ["ignore", "pipe", "inherit"],
    },
  );
  const line = await new Promise<string>((resolve, reject) => {
    const rl = readline.createInterface({ input: child.stdout! });
    // The server's own log lines (the no-SMTP warning) come first: wait for the line that carries its url.
    rl.on("line", (l) => {
      try {
        if (typeof (JSON.parse(l) as { url?: unknown }).url === "string") resolve(l);
      } catch {
        /* not JSON: a log line */
      }
    });
    child.once("exit", (code) => reject(new Error(`server exited with ${code}`)));
  });
  const { url } = JSON.parse(line) as { url: string };
  return {
    url,
    pid: child.pid!,
    stop: async () => {
      const exited = new Promise((r) => child.once("exit", r));
      child.kill("SIGTERM");
      await exited;
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

async function signIn(url: string, i: number): Promise<{ cookie: string; sessionId: string }> {
  const res = await fetch(`${url}/api/auth/sign-up/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: url },
    body: JSON.stringify({
      name: `Load Player ${i}`,
      email: `load-${i}@example.test`,
      password: "load-test-password",
      accountType: "player",
    }),
  });
  if (!res.ok) throw new Error(`sign-up ${i}: ${res.status}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  const s = await fetch(`${url}/api/sessions`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: url, cookie },
    body: JSON.stringify({ date: new Date().toISOString().slice(0, 10) }),
  });
  if (!s.ok) throw new Error(`session ${i}: ${s.status} ${await s.text()}`);
  return { cookie, sessionId: ((await s.json()) as { id: string }).id };
}

function run(opts: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    const instance = autocannon({ ...opts, duration: SECONDS }, (err, result) => (err ? reject(err) : resolve(result)));
    autocannon.track(instance, { renderProgressBar: false, renderResultsTable: false, renderLatencyTable: false });
  });
}

function figures(name: string, r: autocannon.Result, goal: { rps: number; p99?: number }): Figures {
  const met = r.requests.average >= goal.rps && (goal.p99 === undefined || r.latency.p99 <= goal.p99) && r.errors === 0 && r.non2xx === 0;
  return {
    name,
    rps: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    errors: r.errors + r.timeouts,
    non2xx: r.non2xx,
    total: r.requests.total,
    goal: `≥ ${goal.rps} req/s${goal.p99 ? `, p99 ≤ ${goal.p99} ms` : ""}, 0 errors`,
    met,
  };
}

/**
 * 50 players logging at a steady total rate, each request sent on its own schedule (open loop). autocannon's
 * rate option sends each second's quota in one burst, which measures the burst, not the steady rate.
 */
async function steadyPutts(
  url: string,
  serverPid: number,
  players: { cookie: string; sessionId: string }[],
  perSecond: number,
): Promise<Figures> {
  const histogram = hdr.build({ lowestDiscernibleValue: 1, highestTrackableValue: 60_000, numberOfSignificantValueDigits: 3 });
  const intervalMs = (1000 * players.length) / perSecond;
  const endAt = performance.now() + STEADY_SECONDS * 1000;
  let acknowledged = 0;
  let total = 0;
  let errors = 0;
  let non2xx = 0;
  const cpuBefore = { server: cpuSeconds(serverPid), client: cpuSeconds("self") };
  const started = performance.now();
  // LOAD_TRACE=file writes [sent at (wall clock ms), latency ms] of every putt, to tell stalls (slow putts bunched in time) from queueing.
  const trace: [number, number][] | undefined = process.env.LOAD_TRACE ? [] : undefined;
  let lastTick = performance.now();
  const stallTimer = process.env.LOAD_STALLS
    ? setInterval(() => {
        const now = performance.now();
        if (now - lastTick > 40) console.error(`client stall ${Math.round(now - lastTick)} ms at ${Date.now()}`);
        lastTick = now;
      }, 5)
    : undefined;
  const player = async (p: { cookie: string; sessionId: string }, offsetMs: number) => {
    let due = performance.now() + offsetMs;
    const inFlight: Promise<void>[] = [];
    while (due < endAt) {
      await new Promise((r) => setTimeout(r, Math.max(0, due - performance.now())));
      const sentAt = due; // latency counted from when it was due, so a late send is not hidden
      due += intervalMs;
      total++;
      inFlight.push(
        fetch(`${url}/api/sessions/${p.sessionId}/putts`, {
          method: "POST",
          headers: { "content-type": "application/json", origin: url, cookie: p.cookie },
          body: JSON.stringify({ distanceM: 1 + (total % 8), holed: total % 2 === 0 }),
        })
          .then(async (res) => {
            await res.arrayBuffer();
            if (res.status < 200 || res.status > 299) non2xx++;
            else acknowledged++;
            histogram.recordValue(Math.max(1, Math.round(performance.now() - sentAt)));
            trace?.push([Math.round(performance.timeOrigin + sentAt), Math.round(performance.now() - sentAt)]);
          })
          .catch(() => void errors++),
      );
    }
    await Promise.all(inFlight);
  };
  await Promise.all(players.map((p, i) => player(p, (i * intervalMs) / players.length)));
  const rps = total / ((performance.now() - started) / 1000);
  clearInterval(stallTimer);
  const cpu = { server: cpuSeconds(serverPid) - cpuBefore.server, client: cpuSeconds("self") - cpuBefore.client };
  console.log(
    `steady scenario CPU: server ${cpu.server.toFixed(1)} s (${((1000 * cpu.server) / total).toFixed(2)} ms a putt), ` +
      `this client ${cpu.client.toFixed(1)} s, load average ${os.loadavg()[0]!.toFixed(2)}`,
  );
  const p99 = histogram.getValueAtPercentile(99);
  if (trace) fs.writeFileSync(process.env.LOAD_TRACE!, JSON.stringify(trace));
  // Every acknowledged putt must be stored: count them back through the API.
  let stored = 0;
  for (const p of players) {
    const res = await fetch(`${url}/api/putts?pageSize=1&sessionId=${p.sessionId}`, { headers: { origin: url, cookie: p.cookie } });
    stored += ((await res.json()) as { total: number }).total;
  }
  console.log(
    `steady scenario: ${acknowledged} putts acknowledged, ${stored} stored (${stored >= acknowledged ? "none lost" : "LOST SOME"})`,
  );
  return {
    name: `putt logging, steady ${perSecond}/s (${players.length} players)`,
    rps,
    p50: histogram.getValueAtPercentile(50),
    p99,
    errors,
    non2xx,
    total,
    goal: `≥ ${perSecond * 0.95} req/s, p99 ≤ 100 ms, 0 errors`,
    met: rps >= perSecond * 0.95 && p99 <= 100 && errors === 0 && non2xx === 0 && stored >= acknowledged,
  };
}

class Done extends Error {}
const server = await startServer();
const results: Figures[] = [];
try {
  const players: { cookie: string; sessionId: string }[] = [];
  for (let i = 0; i < PLAYERS; i++) players.push(await signIn(server.url, i));
  let next = 0;
  const bodies = [1, 1.5, 2, 3, 4.5, 6].map((d) => JSON.stringify({ distanceM: d, holed: d < 2 }));

  const puttRequests = (rate?: number): autocannon.Options => ({
    url: server.url,
    connections: PLAYERS,
    ...(rate ? { overallRate: rate } : {}),
    requests: [{ method: "POST", path: "/api/sessions/placeholder/putts" }],
    setupClient: (client) => {
      // One connection per signed-in player, each logging into their own session.
      const p = players[next++ % PLAYERS]!;
      let k = 0;
      client.setRequests([
        {
          method: "POST",
          path: `/api/sessions/${p.sessionId}/putts`,
          headers: { "content-type": "application/json", origin: server.url, cookie: p.cookie },
          setupRequest: (req) => ({ ...req, body: bodies[k++ % bodies.length] }),
        },
      ]);
    },
  });
  // Latency at the goal first (each player's session still empty): 200 putts a second in all, for 30 s.
  results.push(await steadyPutts(server.url, server.pid, players, 200));
  if (ONLY === "steady") throw new Done();
  // Capacity: every player taps as fast as the server answers.
  const capacity = await run(puttRequests());
  results.push(figures(`putt logging, flat out (${PLAYERS} players)`, capacity, { rps: 200 }));

  next = 0;
  const stats = await run({
    url: server.url,
    connections: PLAYERS,
    requests: [{ method: "GET", path: "/api/stats/make-rates" }],
    setupClient: (client) => {
      const p = players[next++ % PLAYERS]!;
      client.setHeaders({ origin: server.url, cookie: p.cookie });
    },
  });
  results.push(figures("make-rate reads", stats, { rps: 200 }));

  const readBodies = [
    { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
    { distanceM: 6, slopePct: 1.5, fallLineDeg: 135, stimpFt: 9.5 },
    { distanceM: 1.5, slopePct: 2.5, fallLineDeg: 250, stimpFt: 11 },
    { distanceM: 9, slopePct: 3, fallLineDeg: 30, stimpFt: 12 },
  ].map((b) => JSON.stringify(b));
  let j = 0;
  const reads = await run({
    url: server.url,
    connections: 20,
    requests: [
      {
        method: "POST",
        path: "/api/reads/solve",
        headers: { "content-type": "application/json" },
        setupRequest: (req) => ({ ...req, body: readBodies[j++ % readBodies.length] }),
      },
    ],
  });
  results.push(figures("public read API (solve)", reads, { rps: 300 }));
} catch (err) {
  if (!(err instanceof Done)) throw err;
} finally {
  await server.stop();
}

console.log(`\n== load (${SECONDS} s per scenario, 127.0.0.1 only)`);
console.log(
  "scenario".padEnd(42) +
    "req/s".padStart(9) +
    "p50 ms".padStart(9) +
    "p99 ms".padStart(9) +
    "errors".padStart(8) +
    "non-2xx".padStart(9) +
    "  goal",
);
for (const f of results) {
  console.log(
    f.name.padEnd(42) +
      f.rps.toFixed(0).padStart(9) +
      String(f.p50).padStart(9) +
      String(f.p99).padStart(9) +
      String(f.errors).padStart(8) +
      String(f.non2xx).padStart(9) +
      `  ${f.goal}: ${f.met ? "met" : "NOT met"}`,
  );
}
