import path from "node:path";
import { fileURLToPath } from "node:url";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { migrate as migratePg } from "drizzle-orm/node-postgres/migrator";
import type { PgliteDatabase } from "drizzle-orm/pglite";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import type { Database } from "./client";

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
    await migratePg(database.db as unknown as NodePgDatabase, config);
  }
}
