// The server process for the load benchmark: the real app on a temp DATA_DIR (PGlite on disk, as in
// production), rate limits raised so the benchmark measures the app, not the limiter.
import { readEnv } from "../server/env";
import { start } from "../server/start";

const running = await start({
  env: readEnv({ ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", SEED: "0", LOG_LEVEL: "warn" }),
  rateLimits: { auth: { windowMs: 60_000, limit: 100_000 }, reads: { windowMs: 60_000, limit: 10_000_000 }, imports: { windowMs: 60_000, limit: 100_000 }, mailPerClientAddress: { windowMs: 60_000, limit: 100_000 }, mailPerAccount: { windowMs: 60_000, limit: 100_000 } },
});
process.stdout.write(JSON.stringify({ url: running.url }) + "\n");
process.once("SIGTERM", () => void running.close().then(() => process.exit(0)));
