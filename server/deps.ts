// What createApp needs, passed in so tests can build the app around their own pieces.
import type { Express } from "express";
import type { Auth } from "./auth";
import type { Database } from "./db/client";
import type { Logger } from "./lib/logger";
import type { Mailer } from "./lib/mailer";
import type { SmtpFake } from "./lib/smtp-fake";
import type { RateLimitConfig, RateLimitStoreFactory } from "./middleware/rate-limit";

export type AppConfig = {
  baseUrl: string;
  /** The local mailbox route exists (no real SMTP server configured). */
  dev: boolean;
  /** Vite's dev server injects inline scripts: CSP is off in development only. */
  devCsp: boolean;
  trustProxy: boolean;
  rateLimits: { auth: RateLimitConfig; reads: RateLimitConfig; imports?: RateLimitConfig };
  /** Serves the client: built files in production, Vite middleware in development. */
  frontend?: (app: Express) => void;
};

export type AppDeps = {
  database: Database;
  auth: Auth;
  logger: Logger;
  mailer: Mailer;
  smtpFake?: SmtpFake;
  config: AppConfig;
  /** Rate-limit counts shared through PostgreSQL (DATABASE_URL); absent: in memory (one process, PGlite). */
  rateLimitStore?: RateLimitStoreFactory;
};

export const DEFAULT_RATE_LIMITS: AppConfig["rateLimits"] = {
  auth: { windowMs: 60_000, limit: 30 },
  reads: { windowMs: 60_000, limit: 600 },
  /** CSV imports per signed-in user. */
  imports: { windowMs: 60_000, limit: 6 },
};

