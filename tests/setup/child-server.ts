// The real server in a process of its own, for tests that kill it (SIGKILL) or stop it (SIGTERM).
// Prints {"url": …} on its first line once it listens.
import { readEnv } from "../../server/env";
import { start } from "../../server/start";

const running = await start({
  env: readEnv({ ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", PORT: "0", SEED: "0", LOG_LEVEL: "error" }),
  rateLimits: {
    auth: { windowMs: 60_000, limit: 100_000 },
    reads: { windowMs: 60_000, limit: 100_000 },
    mailPerRecipient: { windowMs: 60_000, limit: 100_000 },
    mailPerAccount: { windowMs: 60_000, limit: 100_000 },
    mailPerClientAddress: { windowMs: 60_000, limit: 100_000 },
  },
});
process.stdout.write(JSON.stringify({ url: running.url }) + "\n");
process.once("SIGTERM", () => {
  void running.close().then(() => process.exit(0));
});
