// Backups of the embedded database: PGlite's own data-directory dump (a gzipped tarball), and back.
import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { makePrivate } from "../lib/private-files";
import { lockDataDir } from "./lock";

export function pgliteDir(dataDir: string): string {
  return path.join(dataDir, "pglite");
}

/** Writes a dump of DATA_DIR's database to `file`. Takes the data-directory lock: the server must be stopped. */
export async function backupPglite(dataDir: string, file: string): Promise<{ file: string; bytes: number }> {
  if (!fs.existsSync(pgliteDir(dataDir))) throw new Error(`There is no database in ${dataDir} to back up.`);
  const release = await lockDataDir(dataDir);
  try {
    const db = await PGlite.create(pgliteDir(dataDir));
    try {
      const dump = await db.dumpDataDir("gzip");
      const bytes = Buffer.from(await dump.arrayBuffer());
      fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true, mode: 0o700 });
      // Write to a temporary name first so a crash never leaves a half-written backup under the real name.
      // The dump holds every account: its owner's alone, whatever the umask.
      fs.writeFileSync(`${file}.partial`, bytes, { mode: 0o600 });
      fs.chmodSync(`${file}.partial`, 0o600);
      fs.renameSync(`${file}.partial`, file);
      return { file, bytes: bytes.length };
    } finally {
      await db.close();
      // PGlite sets some of its files' modes itself (0644), past the umask.
      makePrivate(dataDir);
    }
  } finally {
    await release();
  }
}

/**
 * Restores a dump into DATA_DIR. An existing database is kept aside (pglite.before-restore-<time>), never deleted.
 * Takes the data-directory lock: the server must be stopped.
 */
export async function restorePglite(dataDir: string, file: string, now = new Date()): Promise<{ keptAside?: string }> {
  if (!fs.existsSync(file)) throw new Error(`No backup file at ${file}.`);
  const release = await lockDataDir(dataDir);
  try {
    const target = pgliteDir(dataDir);
    let keptAside: string | undefined;
    if (fs.existsSync(target) && fs.readdirSync(target).length > 0) {
      keptAside = `${target}.before-restore-${now.toISOString().replace(/[:.]/g, "-")}`;
      fs.renameSync(target, keptAside);
    }
    const blob = new Blob([fs.readFileSync(file)]);
    const db = await PGlite.create(target, { loadDataDir: blob });
    try {
      await db.query("select 1");
    } finally {
      await db.close();
      makePrivate(dataDir);
    }
    return { keptAside };
  } finally {
    await release();
  }
}
