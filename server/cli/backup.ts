// npm run backup -- [file]: a dump of the embedded database (stop the server first), or pg_dump with DATABASE_URL.
import { spawnSync } from "node:child_process";
import { readEnv } from "../env";
import { backupPglite } from "../db/backup";
import { usePrivateUmask } from "../lib/private-files";

usePrivateUmask();

const env = readEnv();
const stamp = new Date().toISOString().replace(/[:.]/g, "-");
const file = process.argv[2] ?? `backups/borrowline-${stamp}.${env.DATABASE_URL ? "pgdump" : "tar.gz"}`;

try {
  if (env.DATABASE_URL) {
    // A PostgreSQL server is backed up with its own tool, in its custom format (restore with pg_restore).
    const run = spawnSync("pg_dump", ["--format=custom", `--file=${file}`, env.DATABASE_URL], { stdio: "inherit" });
    if (run.status !== 0) throw new Error("pg_dump failed");
    console.log(`Backed up the PostgreSQL database to ${file}`);
  } else {
    const { bytes } = await backupPglite(env.DATA_DIR, file);
    console.log(`Backed up ${env.DATA_DIR} to ${file} (${(bytes / 1024 / 1024).toFixed(1)} MB)`);
  }
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
}
