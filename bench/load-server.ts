// The server process for the load benchmark: the real app on a temp DATA_DIR (PGlite on disk, as in
// production), rate limits raised so the benchmark measures the app, not the limiter.
import { readEnv } from "../server/env";
import { start } from "../server/start";

const running = await start({
  env: readEnv({ ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", SEED: "0", LOG_LEVEL: "warn" }),
  rateLimits: {
    auth: { windowMs: 60_000, limit: 100_000 },
    reads: { windowMs: 60_000, limit: 10_000_000 },
    imports: { windowMs: 60_000, limit: 100_000 },
    mailPerClientAddress: { windowMs: 60_000, limit: 100_000 },
    mailPerAccount: { windowMs: 60_000, limit: 100_000 },
  },
});
process.stdout.write(JSON.stringify({ url: running.url }) + "\n");
process.once("SIGTERM", () => void running.close().then(() => process.exit(0)));
// LOAD_STALLS=1 (diagnosis): the server's event-loop stalls over 40 ms and requests slower than 50 ms, on stderr,
// stamped with the wall clock so they line up with the client's trace (LOAD_TRACE).
if (process.env.LOAD_STALLS) {
  const http = await import("node:http");
  let last = performance.now();
  setInterval(() => {
    const now = performance.now();
    if (now - last > 40) process.stderr.write(`server stall ${Math.round(now - last)} ms at ${Date.now()}\n`);
    last = now;
  }, 5).unref();
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function (this: import("node:http").Server, ev: string | symbol, ...args: unknown[]) {
    if (ev === "request") {
      const started = performance.now();
      const res = args[1] as import("node:http").ServerResponse;
      res.once("finish", () => {
        const ms = performance.now() - started;
        if (ms > 50) process.stderr.write(`server slow ${Math.round(ms)} ms at ${Date.now()}\n`);
      });
    }
    return Reflect.apply(emit, this, [ev, ...args]) as boolean;
  } as typeof emit;
}
