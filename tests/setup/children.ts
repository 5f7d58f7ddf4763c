// The real server (tests/setup/child-server.ts) and the backup CLI in processes of their own, for tests that kill,
// stop or block them. They start from one bundle that tests/setup/global-unit.ts builds once per run (dist-test/),
// as production starts from dist-server/: with tsx each child compiled the whole server again on start, which on
// CI's two busy cores took most of a test's time.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import readline from "node:readline";
import { inject } from "vitest";

export type ChildServer = {
  child: ChildProcess;
  url: string;
  /** The server's own pid (1 inside a PID namespace). */
  pid: number;
  /** Its pid as this process sees it. */
  hostPid: number;
  /** Resolves when the child prints `text` on a line of its own; rejects, saying how it ended, if it exits first. */
  line: (text: string) => Promise<void>;
  /** Its exit code (null when a signal ended it). */
  exited: Promise<number | null>;
  /** The signal that ended it, if one did. */
  signal: Promise<NodeJS.Signals | null>;
};

/** node + the bundled child server: the command line a test runs (or wraps, as under `sh -c "umask 000; …"`). */
export function childServerArgv(): string[] {
  return [process.execPath, path.join(inject("childBundleDir"), "child-server.js")];
}

/** node + the bundled `npm run backup` (server/cli/backup.ts). */
export function backupArgv(file: string): string[] {
  return [process.execPath, path.join(inject("childBundleDir"), "backup.js"), file];
}

/**
 * Fills DATA_DIR with the migrated database the run made once (global-unit.ts), as a server that had started there
 * before would have left it: a test about what happens after a start does not pay for building a database (≈5 s on
 * a quiet machine, several times that on CI's busy one).
 */
export function seedDataDir(dataDir: string): void {
  const target = path.join(dataDir, "pglite");
  fs.mkdirSync(target, { recursive: true, mode: 0o700 });
  const untar = spawnSync("tar", ["-xf", inject("pgliteTemplate"), "-C", target], { encoding: "utf8" });
  if (untar.status !== 0) throw new Error(`tar -xf of the template failed: ${untar.stderr}`);
}

/**
 * Starts the child server with exactly `env` (a clean environment: vitest's own variables such as BASE_URL="/" are
 * not the server's) and resolves once it listens. `prefix` runs it under another command (unshare …); `argv` replaces
 * the whole command line. The child is added to `children` at once, for the file's afterAll to kill.
 */
export async function spawnChildServer(
  env: Record<string, string | undefined>,
  children: ChildProcess[],
  options: { prefix?: string[]; argv?: string[] } = {},
): Promise<ChildServer> {
  const command = options.argv ?? [...(options.prefix ?? []), ...childServerArgv()];
  const child = spawn(command[0]!, command.slice(1), {
    env: { PATH: process.env.PATH, HOME: process.env.HOME, ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  children.push(child);
  let stderr = "";
  child.stderr!.on("data", (d: Buffer) => {
    stderr += d.toString();
    process.stderr.write(d);
  });
  const ended = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.once("exit", (code, signal) => resolve({ code, signal })),
  );
  const exited = ended.then((e) => e.code);
  const signal = ended.then((e) => e.signal);
  const diedBefore = (what: string) =>
    ended.then(({ code, signal }) => {
      throw new Error(`the child server ended (${signal ?? `exit ${code}`}) before ${what}: ${stderr}`);
    });
  const lines = readline.createInterface({ input: child.stdout! });
  const first = await Promise.race([new Promise<string>((resolve) => lines.once("line", resolve)), diedBefore("listening")]);
  const info = JSON.parse(first) as { url: string; pid: number; hostPid: number };
  const line = (text: string) =>
    Promise.race([new Promise<void>((resolve) => lines.on("line", (l) => l === text && resolve())), diedBefore(`printing "${text}"`)]);
  return { child, line, exited, signal, ...info };
}
