// npm run restore -- <file>: brings a backup back into DATA_DIR (stop the server first). The current database is kept aside.
import { readEnv } from "../env";
import { restorePglite } from "../db/backup";
import { usePrivateUmask } from "../lib/private-files";

usePrivateUmask();

const env = readEnv();
const file = process.argv[2];
if (!file) {
  console.error("Usage: npm run restore -- <backup file>");
  process.exit(2);
}
if (env.DATABASE_URL) {
  console.error(`With DATABASE_URL, restore with PostgreSQL's own tool: pg_restore --clean --dbname="$DATABASE_URL" ${file}`);
  process.exit(2);
}
try {
  const { keptAside } = await restorePglite(env.DATA_DIR, file);
  console.log(`Restored ${file} into ${env.DATA_DIR}.${keptAside ? ` The previous database is kept at ${keptAside}.` : ""}`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
}
