// Wires the pieces together: database, migrations, e-mail, auth, seed, HTTP. Used by index.ts and tests.
import crypto from "node:crypto";
import fs from "node:fs";
import http from "node:http";
import path from "node:path";
import type { Express } from "express";
import { createAuth } from "./auth";
import { createApp, DEFAULT_RATE_LIMITS, type AppConfig } from "./app";
import { openPglite, openPostgres, type Database } from "./db/client";
import { lockDataDir } from "./db/lock";
import { migrate } from "./db/migrate";
import { seedDemo } from "./db/seed";
import type { Env } from "./env";
import { createLogger } from "./lib/logger";
import { createMailer } from "./lib/mailer";
import { makePrivate, usePrivateUmask } from "./lib/private-files";
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
};

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
  const releases: Array<() => Promise<void>> = [];
  try {
    let database: Database;
    if (env.DATABASE_URL) {
      database = await openPostgres(env.DATABASE_URL);
    } else {
      const dir = options.pgliteDir ?? path.join(env.DATA_DIR, "pglite");
      if (!dir.startsWith("memory://")) releases.push(await lockDataDir(env.DATA_DIR));
      database = await openPglite(dir, options.pgliteLoad);
    }
    releases.unshift(() => database.close());
    await migrate(database);
    // Files written before this version (or by a CLI under a looser umask) are made private too.
    if (dataDirOnDisk) makePrivate(env.DATA_DIR);

    let smtpFake: SmtpFake | undefined;
    if (!env.SMTP_URL) {
      smtpFake = await startSmtpFake();
      releases.unshift(() => smtpFake!.close());
      logger.warn(
        { smtp: smtpFake.url },
        "No SMTP_URL set: e-mail is NOT delivered; it is held in the local inbox, which only a signed-in admin can read at /dev/mailbox",
      );
    }
    const mailer = createMailer(env.SMTP_URL ?? smtpFake!.url, env.MAIL_FROM, logger);

    // Bind first so the public origin is known when only an ephemeral port was asked for.
    const server = http.createServer();
    await new Promise<void>((resolve, reject) => {
      server.once("error", reject);
      server.listen(env.PORT, env.HOST, () => resolve());
    });
    const port = (server.address() as { port: number }).port;
    const baseUrl = env.BASE_URL ?? `http://localhost:${port}`;
    const trustedOrigins = env.BASE_URL
      ? [new URL(env.BASE_URL).origin]
      : [`http://localhost:${port}`, `http://127.0.0.1:${port}`];

    const auth = createAuth({ db: database.db, secret: authSecret(env), baseUrl, trustedOrigins, mailer, logger });
    if (env.SEED === "1") await seedDemo(database.db, logger);

    const app = createApp({
      database,
      auth,
      logger,
      mailer,
      smtpFake,
      config: {
        baseUrl,
        devCsp: env.NODE_ENV === "development",
        trustProxy: env.TRUST_PROXY === "1",
        trustedOrigins,
        rateLimits: { ...DEFAULT_RATE_LIMITS, ...options.rateLimits },
        frontend: options.frontend,
      },
    });
    server.on("request", app);

    let closing: Promise<void> | undefined;
    const close = () =>
      (closing ??= (async () => {
        // Stop accepting, let in-flight requests finish, then close the database.
        await new Promise<void>((resolve) => {
          server.close(() => resolve());
          server.closeIdleConnections();
        });
        for (const release of releases) await release();
        // PGlite sets some of its files' modes itself (0644), past the umask: tighten once more on the way out.
        if (dataDirOnDisk) makePrivate(env.DATA_DIR);
      })());

    logger.info({ url: baseUrl, db: database.kind }, "Borrowline is listening");
    return { app, server, url: `http://127.0.0.1:${port}`, database, smtpFake, auth, close };
  } catch (err) {
    for (const release of releases) await release().catch(() => {});
    throw err;
  }
}
