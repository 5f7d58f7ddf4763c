// PGlite does not lock its data directory: two servers on one DATA_DIR would silently diverge.
// We take a lock of our own: an OS-level lock (fs-native-extensions: an open-file-description lock on Linux,
// flock on macOS) on DATA_DIR/.borrowline.lock, held through an open file for as long as the process lives.
// The kernel judges the owner: the lock lasts while the process is alive — even with its event loop blocked for
// minutes — and is gone the instant it dies (SIGKILL, power loss), so a restart with the same PID (PID 1 in a
// container) starts at once. No timer, no pid guessing. The owner's pid is written into the file only for the
// message a refused process prints.
import fs from "node:fs";
import path from "node:path";
import { tryLock, unlock } from "fs-native-extensions";

export class DataDirLockedError extends Error {
  constructor(dataDir: string, pid?: number) {
    super(
      `Another Borrowline server${pid ? ` (pid ${pid})` : ""} is already using the data directory ${dataDir}. ` +
        `Stop it first, or start this one with a different DATA_DIR.`,
    );
    this.name = "DataDirLockedError";
  }
}

export function lockFile(dataDir: string): string {
  return path.join(dataDir, ".borrowline.lock");
}

export async function lockDataDir(dataDir: string): Promise<() => Promise<void>> {
  fs.mkdirSync(dataDir, { recursive: true });
  const file = lockFile(dataDir);
  // "a+" creates the file without truncating it: a refused process must not wipe the owner's pid.
  const fd = fs.openSync(file, "a+", 0o600);
  let locked: boolean;
  try {
    locked = tryLock(fd);
  } catch (err) {
    fs.closeSync(fd);
    throw err;
  }
  if (!locked) {
    const owner = Number.parseInt(fs.readFileSync(file, "utf8"), 10);
    fs.closeSync(fd);
    throw new DataDirLockedError(dataDir, Number.isInteger(owner) ? owner : undefined);
  }
  fs.ftruncateSync(fd, 0);
  fs.writeSync(fd, String(process.pid), 0);
  let released = false;
  return async () => {
    if (released) return;
    released = true;
    fs.ftruncateSync(fd, 0);
    unlock(fd);
    fs.closeSync(fd);
  };
}
