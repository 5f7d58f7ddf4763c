// Wires the pieces together: database, migrations, e-mail, auth, seed, HTTP. Used by index.ts and tests.
import crypto from "node:crypto";
import fs from "node:fs";
import http from "node:http";
import path from "node:path";
import type { Express } from "express";
import { createAuth } from "./auth";
import { createApp, DEFAULT_RATE_LIMITS, type AppConfig } from "./app";
import { createPgliteDir, openPglite, openPostgres, pgliteDirIsNew, type Database } from "./db/client";
import { lockDataDir } from "./db/lock";
import { analyzeStale, scheduleMaintenance } from "./db/maintenance";
import { migrate } from "./db/migrate";
import { seedDemo } from "./db/seed";
import { discardUnfinishedImports } from "./routes/csv/csv-import.handlers";
import type { Env } from "./env";
import { ERROR_CODES, type ApiErrorBody } from "../shared/errors";
import { createLogger } from "./lib/logger";
import { postgresRateLimits } from "./lib/rate-limit-store";
import { localOrigins, type LinkOrigins } from "./lib/link-origin";
import { createMailer } from "./lib/mailer";
import { makePrivate, usePrivateUmask } from "./lib/private-files";
import { keepInInbox } from "./lib/dev-inbox";
import { startSmtpFake, type SmtpFake } from "./lib/smtp-fake";

export type StartOptions = {
  env: Env;
  /** "memory://" for an in-memory PGlite (tests); default DATA_DIR/pglite. */
  pgliteDir?: string;
  /** A PGlite data-directory dump to start from (tests: a migrated template). */
  pgliteLoad?: Blob;
  /** Overrides of DEFAULT_RATE_LIMITS (tests, benchmarks). */
  rateLimits?: Partial<AppConfig["rateLimits"]>;
  frontend?: AppConfig["frontend"];
  /** Where log lines go (default stdout); tests read them to check nothing secret is logged. */
  logDestination?: { write: (line: string) => void };
  /** Called once the port is open and before the app is ready (tests send requests to a starting server). */
  onListening?: (url: string) => Promise<void>;
};

/** The answer to any request before the app is attached: try again in a second. */
function notReady(res: http.ServerResponse): void {
  const body: ApiErrorBody = { error: { code: ERROR_CODES.unavailable, message: "Borrowline is starting. Try again in a moment." } };
  res.writeHead(503, {
    "content-type": "application/json; charset=utf-8",
    "retry-after": "1",
    "cache-control": "no-store",
    connection: "close",
  });
  res.end(JSON.stringify(body));
}

export type Running = {
  app: Express;
  server: http.Server;
  url: string;
  database: Database;
  smtpFake?: SmtpFake;
  auth: ReturnType<typeof createAuth>;
  close: () => Promise<void>;
};

function authSecret(env: Env): string {
  if (env.BETTER_AUTH_SECRET) return env.BETTER_AUTH_SECRET;
  // Keep one secret per data directory so sessions survive restarts without configuration.
  const file = path.join(env.DATA_DIR, ".auth-secret");
  fs.mkdirSync(env.DATA_DIR, { recursive: true, mode: 0o700 });
  if (!fs.existsSync(file)) fs.writeFileSync(file, crypto.randomBytes(32).toString("hex"), { mode: 0o600 });
  return fs.readFileSync(file, "utf8").trim();
}

export async function start(options: StartOptions): Promise<Running> {
  const { env } = options;
  usePrivateUmask();
  const dataDirOnDisk = !env.DATABASE_URL && !(options.pgliteDir ?? "").startsWith("memory://");
  const logger = createLogger(env.LOG_LEVEL, options.logDestination);
  // PostgreSQL ended an idle connection (a restart, a failover, an administrator): its pool drops it and opens another.
  const connectionLost = (err: Error) => logger.warn({ err }, "PostgreSQL ended an idle connection; a new one is opened when needed");
  const releases: Array<() => Promise<void>> = [];
  try {
    const pgliteDir = options.pgliteDir ?? path.join(env.DATA_DIR, "pglite");
    if (!env.DATABASE_URL && !pgliteDir.startsWith("memory://")) releases.push(await lockDataDir(env.DATA_DIR));

    // Bind early (the public origin must be known when only an ephemeral port was asked for), but answer every
    // request with 503 + Retry-After until the app is attached: a request during start-up never hangs.
    const attached: { app?: Express } = {};
    const server = http.createServer((req, res) => {
      if (attached.app) return attached.app(req, res);
      notReady(res);
    });
    await new Promise<void>((resolve, reject) => {
      server.once("error", reject);
      server.listen(env.PORT, env.HOST, () => resolve());
    });
    releases.unshift(() => new Promise<void>((resolve) => server.close(() => resolve())));
    const port = (server.address() as { port: number }).port;
    await options.onListening?.(`http://127.0.0.1:${port}`);

    // A first-ever start builds the new database in a short-lived child process (its memory is returned when it ends).
    if (dataDirOnDisk && !options.pgliteLoad && pgliteDirIsNew(pgliteDir)) await createPgliteDir(pgliteDir, env.PGLITE_SHARED_BUFFERS);
    const database: Database = env.DATABASE_URL
      ? await openPostgres(env.DATABASE_URL, env.DB_STATEMENT_TIMEOUT_MS, connectionLost)
      : await openPglite(pgliteDir, options.pgliteLoad, env.PGLITE_SHARED_BUFFERS);
    releases.unshift(() => database.close());
    await migrate(database);
    // Files written before this version (or by a CLI under a looser umask) are made private too.
    if (dataDirOnDisk) makePrivate(env.DATA_DIR);
    const discarded = await discardUnfinishedImports(database.db);
    if (discarded > 0) logger.warn({ sessions: discarded }, "removed the sessions of a CSV import that never finished");
    // Planner statistics: PGlite has no autovacuum, so the server keeps them fresh itself (db/maintenance.ts).
    await analyzeStale(database.db, logger);
    if (database.kind === "pglite") releases.unshift(scheduleMaintenance(database.db, logger));

    let smtpFake: SmtpFake | undefined;
    if (!env.SMTP_URL) {
      smtpFake = await startSmtpFake({
        keep: keepInInbox(database.db),
        onConnectionError: (err) => logger.warn({ err }, "the local mail fake lost a connection mid-message"),
      });
      releases.unshift(() => smtpFake!.close());
      logger.warn(
        { smtp: smtpFake.url },
        "No SMTP_URL set: e-mail is NOT delivered; it is held in the local inbox, which only a signed-in admin can read at /dev/mailbox",
      );
    }
    const mailer = createMailer(env.SMTP_URL ?? smtpFake!.url, env.MAIL_FROM, logger);

    const baseUrl = env.BASE_URL ?? `http://localhost:${port}`;
    const trustedOrigins = env.BASE_URL ? [new URL(env.BASE_URL).origin] : localOrigins(env.HOST, port);
    const links: LinkOrigins = {
      fixed: env.BASE_URL ? new URL(env.BASE_URL).origin : undefined,
      fallback: new URL(baseUrl).origin,
      trusted: trustedOrigins,
    };
    if (env.BASE_URL) logger.info({ links: links.fixed }, `Links in e-mail point at ${links.fixed} (BASE_URL)`);
    else
      logger.info(
        { links: trustedOrigins, fallback: links.fallback },
        `No BASE_URL: links in e-mail use the address the app was reached at, one of ${trustedOrigins.join(", ")} (any other address: ${links.fallback}). Set BASE_URL to fix one.`,
      );

    const auth = createAuth({ db: database.db, secret: authSecret(env), baseUrl, trustedOrigins, links, mailer, logger });
    if (env.SEED === "1") await seedDemo(database.db, logger);

    // With DATABASE_URL every server on the database shares the rate-limit counts (PostgreSQL store).
    const sharedLimits = env.DATABASE_URL ? postgresRateLimits(env.DATABASE_URL, connectionLost) : undefined;
    if (sharedLimits) releases.unshift(sharedLimits.close);

    const ready = createApp({
      database,
      auth,
      logger,
      mailer,
      smtpFake,
      rateLimitStore: sharedLimits?.store,
      config: {
        baseUrl,
        links,
        devCsp: env.NODE_ENV === "development",
        checkResponses: env.NODE_ENV !== "production",
        trustProxy: env.TRUST_PROXY === "1",
        trustedOrigins,
        rateLimits: { ...DEFAULT_RATE_LIMITS, ...options.rateLimits },
        frontend: options.frontend,
      },
    });
    await sharedLimits?.ready();
    attached.app = ready;

    let closing: Promise<void> | undefined;
    const close = () =>
      (closing ??= (async () => {
        // Stop accepting, let in-flight requests finish, then close the database.
        const closed = new Promise<void>((resolve) => server.close(() => resolve()));
        server.closeIdleConnections();
        await closed;
        for (const release of releases) await release();
        // PGlite sets some of its files' modes itself (0644), past the umask: tighten once more on the way out.
        if (dataDirOnDisk) makePrivate(env.DATA_DIR);
      })());

    logger.info({ url: baseUrl, db: database.kind }, "Borrowline is listening");
    return { app: ready, server, url: `http://127.0.0.1:${port}`, database, smtpFake, auth, close };
  } catch (err) {
    for (const release of releases) await release().catch(() => {});
    throw err;
  }
}
