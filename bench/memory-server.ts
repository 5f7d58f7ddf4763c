// One server start for bench/memory.ts: starts on DATA_DIR, waits a second, prints its memory as JSON, stops.
import { readEnv } from "../server/env";
import { start } from "../server/start";

const running = await start({
  env: readEnv({ ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", PORT: "0", SEED: "0", LOG_LEVEL: "warn" }),
});
await new Promise((r) => setTimeout(r, 1000));
const m = process.memoryUsage();
process.stdout.write(JSON.stringify({ rssMB: m.rss / 1048576, externalMB: m.external / 1048576 }) + "\n");
await running.close();
process.exit(0);
