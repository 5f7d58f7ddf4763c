// The child server the lifecycle, durability and data-dir tests drive with signals (tests/setup/child-server.ts)
// must take a signal from the moment it says it listens. It once printed that line before installing its handlers:
// a SIGUSR2 sent on the line then ended it (SIGUSR2's default) about 1 start in 5, and the blocked-owner test waited
// 90 s for a "blocking" that never came. Several children start at once here, as under CI's load, so that the old
// order fails this test more often than not.
import type { ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { seedDataDir, spawnChildServer } from "../setup/children";

const root = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-child-server-"));
const children: ChildProcess[] = [];
afterAll(() => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill("SIGKILL");
  fs.rmSync(root, { recursive: true, force: true });
});

test.skipIf(!!process.env.DATABASE_URL)(
  "a SIGUSR2 or SIGTERM sent the moment the child server prints its address is handled, not fatal",
  async () => {
    const signals: NodeJS.Signals[] = ["SIGUSR2", "SIGTERM", "SIGUSR2", "SIGTERM"];
    const outcomes = await Promise.all(
      signals.map(async (first, i) => {
        const dataDir = path.join(root, `d${i}`);
        seedDataDir(dataDir);
        const server = await spawnChildServer(
          { DATA_DIR: dataDir, BETTER_AUTH_SECRET: "child-server-secret-child-server-0001", BLOCK_MS: "50" },
          children,
        );
        server.child.kill(first);
        if (first === "SIGUSR2") {
          await server.line("blocking");
          server.child.kill("SIGTERM");
        }
        return { first, code: await server.exited, signal: await server.signal };
      }),
    );
    // A clean stop each time: exit code 0, not ended by the signal.
    expect(outcomes).toEqual(signals.map((first) => ({ first, code: 0, signal: null })));
  },
  90_000,
);
