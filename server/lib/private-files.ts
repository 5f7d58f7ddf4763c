// The data directory holds the database, the auth secret and backups: its owner's alone, whatever the umask
// the server was started under. PGlite writes its files itself, so the process umask is what governs them.
import fs from "node:fs";
import path from "node:path";
import { isMainThread } from "node:worker_threads";

/** From now on, files and directories this process creates are readable and writable by its user only. */
export function usePrivateUmask(): void {
  // Worker threads (vitest's) may not change the umask; the server and the CLIs run on the main thread.
  if (isMainThread) process.umask(0o077);
}

/** Directories 0700 and files 0600 under `dir` (and `dir` itself): also fixes a data directory made under umask 022. */
export function makePrivate(dir: string): void {
  if (!fs.existsSync(dir)) return;
  const walk = (at: string) => {
    const stat = fs.lstatSync(at);
    if (stat.isSymbolicLink()) return;
    if (stat.isDirectory()) {
      if ((stat.mode & 0o777) !== 0o700) fs.chmodSync(at, 0o700);
      for (const name of fs.readdirSync(at)) walk(path.join(at, name));
    } else if ((stat.mode & 0o777) !== 0o600) {
      fs.chmodSync(at, 0o600);
    }
  };
  walk(dir);
}
