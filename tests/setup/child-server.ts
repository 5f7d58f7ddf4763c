// The real server in a process of its own, for tests that kill it (SIGKILL) or stop it (SIGTERM).
// Prints {"url", "pid", "hostPid"} on its first line once it listens (pid is 1 when run as a PID namespace's init;
// hostPid is the pid as the test sees it, read from the host's /proc). SIGUSR2 holds its event loop for
// BLOCK_MS (default 15 s), as one long synchronous stretch of work would, and prints "blocking" first.
import fs from "node:fs";
import { readEnv } from "../../server/env";
import { start } from "../../server/start";

const running = await start({
  env: readEnv({ ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", PORT: process.env.PORT ?? "0", SEED: "0", LOG_LEVEL: "error" }),
  rateLimits: {
    // AUTH_LIMIT: a low sign-in limit for the test that shows it holds across servers.
    auth: { windowMs: 60_000, limit: Number(process.env.AUTH_LIMIT ?? 100_000) },
    reads: { windowMs: 60_000, limit: 100_000 },
    mailPerRecipient: { windowMs: 60_000, limit: 100_000 },
    mailPerAccount: { windowMs: 60_000, limit: 100_000 },
    mailPerClientAddress: { windowMs: 60_000, limit: 100_000 },
    imports: { windowMs: 60_000, limit: 100_000 },
  },
});
// The handlers go in before the first line: a test sends its signal the moment it reads that line, and a signal
// with no handler yet does what SIGUSR2's default does — ends the process (1 start in 5 did, and the test then
// waited 90 s for a "blocking" that never came).
process.once("SIGTERM", () => {
  void running.close().then(() => process.exit(0));
});
process.on("SIGUSR2", () => {
  fs.writeSync(1, "blocking\n");
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, Number(process.env.BLOCK_MS ?? 15_000));
});
const hostPid = Number(fs.readlinkSync("/proc/self"));
process.stdout.write(JSON.stringify({ url: running.url, pid: process.pid, hostPid }) + "\n");
