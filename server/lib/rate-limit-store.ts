// Rate-limit counts shared by every server on one PostgreSQL database: @acpr/rate-limit-postgresql, the maintained
// express-rate-limit store for PostgreSQL (its own schema `rate_limit`, created by its own migrations under an
// advisory lock, so servers starting together do not race). Without DATABASE_URL the limiters keep
// express-rate-limit's in-memory store: PGlite means one process.
import { PostgresStore } from "@acpr/rate-limit-postgresql";
import pg from "pg";
import type { Store } from "express-rate-limit";
import type { RateLimitStoreFactory } from "../middleware/rate-limit";

type PgPool = { end: () => Promise<void>; on: (event: "error", listener: (err: Error) => void) => unknown };
type PgStore = Store & { pool?: PgPool };

/** onIdleError: an idle connection the database ended (see openPostgres); the pool replaces it. */
export function postgresRateLimits(
  databaseUrl: string,
  onIdleError: (err: Error) => void,
): {
  store: RateLimitStoreFactory;
  ready: () => Promise<void>;
  close: () => Promise<void>;
} {
  const stores: PgStore[] = [];
  // A small pool per limiter: each makes one short query per request it counts.
  const config = { connectionString: databaseUrl, max: 2 };
  // The package's constructor starts its schema migrations and returns no promise. One constructed store runs them;
  // the limiters' stores are made without the constructor (same class, same fields), so ready() can wait for the
  // one run to finish instead of racing several.
  const migrating = new PostgresStore(config, "borrowline-migrations");
  void migrating;
  return {
    store: (name) => {
      const store = Object.assign(Object.create(PostgresStore.prototype) as PgStore, { config, prefix: name });
      // express-rate-limit calls init(), where the package makes the store's pool: listen on it as soon as it exists.
      store.init = (options) => {
        PostgresStore.prototype.init.call(store, options);
        store.pool?.on("error", onIdleError);
      };
      stores.push(store);
      return store;
    },
    /** Waits until the store's function exists and no migration run (advisory lock) is still going. */
    ready: async () => {
      const client = new pg.Client({ connectionString: databaseUrl });
      await client.connect();
      try {
        for (let i = 0; i < 600; i++) {
          const res = await client.query<{ ok: boolean }>(
            `select to_regprocedure('rate_limit.agg_increment(text, text, double precision, timestamptz)') is not null
               and not exists (select 1 from pg_locks where locktype = 'advisory' and database = (select oid from pg_database where datname = current_database())) as ok`,
          );
          if (res.rows[0]?.ok) return;
          await new Promise((r) => setTimeout(r, 50));
        }
        throw new Error("The rate-limit tables in PostgreSQL were not created within 30 s.");
      } finally {
        await client.end();
      }
    },
    close: async () => {
      for (const s of stores) await s.pool?.end();
    },
  };
}
