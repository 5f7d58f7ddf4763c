import path from "node:path";
import { fileURLToPath } from "node:url";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { migrate as migratePg } from "drizzle-orm/node-postgres/migrator";
import type { PgliteDatabase } from "drizzle-orm/pglite";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import pg from "pg";
import type { Database } from "./client";

/** Any constant shared by every Borrowline server: the advisory lock taken while migrating PostgreSQL. */
const MIGRATION_LOCK = 0x42_6f_72_72; // "Borr"

/** drizzle/ at the repository root, found from this file in source (server/db) or bundle (dist-server). */
export function migrationsFolder(): string {
  const here = path.dirname(fileURLToPath(import.meta.url));
  const up = here.endsWith(path.join("server", "db")) ? "../.." : "..";
  return path.resolve(here, up, "drizzle");
}

export async function migrate(database: Database): Promise<void> {
  const config = { migrationsFolder: migrationsFolder() };
  if (database.kind === "pglite") {
    await migratePglite(database.db as unknown as PgliteDatabase, config);
  } else {
    // Several servers may start together on one database: one migrates, the others wait for it (a session-level
    // advisory lock on a connection of its own), then find nothing left to do.
    const client = new pg.Client({ connectionString: database.url });
    await client.connect();
    try {
      await client.query("select pg_advisory_lock($1)", [MIGRATION_LOCK]);
      await migratePg(database.db as unknown as NodePgDatabase, config);
    } finally {
      await client.end(); // ends the session, which releases the lock
    }
  }
}
