// PGlite does not lock its data directory: two servers on one DATA_DIR would silently diverge.
// We take a lock of our own: proper-lockfile (an mkdir lock kept fresh while we run), plus the owner's
// pid beside it, so a restart right after a crash (SIGKILL, power loss) need not wait for the lock to go stale.
import fs from "node:fs";
import path from "node:path";
import lockfile from "proper-lockfile";

export class DataDirLockedError extends Error {
  constructor(dataDir: string, pid?: number) {
    super(
      `Another Borrowline server${pid ? ` (pid ${pid})` : ""} is already using the data directory ${dataDir}. ` +
        `Stop it first, or start this one with a different DATA_DIR.`,
    );
    this.name = "DataDirLockedError";
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === "EPERM";
  }
}

export async function lockDataDir(dataDir: string): Promise<() => Promise<void>> {
  fs.mkdirSync(dataDir, { recursive: true });
  const lockPath = path.join(dataDir, ".borrowline.lock");
  const pidFile = path.join(dataDir, ".borrowline.pid");
  const take = () => lockfile.lock(dataDir, { lockfilePath: lockPath, stale: 10_000, update: 2_000, realpath: false });
  let release: () => Promise<void>;
  try {
    release = await take();
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== "ELOCKED") throw err;
    const owner = Number(fs.existsSync(pidFile) ? fs.readFileSync(pidFile, "utf8") : NaN);
    if (Number.isInteger(owner) && owner !== process.pid && !isAlive(owner)) {
      // The previous owner died without releasing the lock: it is ours to take over.
      fs.rmSync(lockPath, { recursive: true, force: true });
      release = await take();
    } else {
      throw new DataDirLockedError(dataDir, Number.isInteger(owner) ? owner : undefined);
    }
  }
  fs.writeFileSync(pidFile, String(process.pid));
  return async () => {
    fs.rmSync(pidFile, { force: true });
    await release();
  };
}
