// PGlite does not lock its data directory: two servers on one DATA_DIR would silently diverge.
// We take a lock of our own (proper-lockfile: an mkdir lock with a stale-lock timeout).
import fs from "node:fs";
import lockfile from "proper-lockfile";

export class DataDirLockedError extends Error {
  constructor(dataDir: string) {
    super(
      `Another Borrowline server is already using the data directory ${dataDir}. ` +
        `Stop it first, or start this one with a different DATA_DIR.`,
    );
    this.name = "DataDirLockedError";
  }
}

export async function lockDataDir(dataDir: string): Promise<() => Promise<void>> {
  fs.mkdirSync(dataDir, { recursive: true });
  try {
    return await lockfile.lock(dataDir, { lockfilePath: `${dataDir}/.borrowline.lock`, stale: 15_000, update: 5_000 });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ELOCKED") throw new DataDirLockedError(dataDir);
    throw err;
  }
}
