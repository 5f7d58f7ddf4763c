// What createApp needs, passed in so tests can build the app around their own pieces.
import type { Express } from "express";
import type { Auth } from "./auth";
import type { Database } from "./db/client";
import type { Logger } from "./lib/logger";
import type { Mailer } from "./lib/mailer";
import type { SmtpFake } from "./lib/smtp-fake";
import type { LinkOrigins } from "./lib/link-origin";
import type { MailLimiters, RateLimitConfig, RateLimitStoreFactory } from "./middleware/rate-limit";

export type AppConfig = {
  baseUrl: string;
  /** Where e-mailed links point: BASE_URL, else the trusted address a request reached us at (lib/link-origin.ts). */
  links: LinkOrigins;
  /** Vite's dev server injects inline scripts: CSP is off in development only. */
  devCsp: boolean;
  trustProxy: boolean;
  /** Origins whose pages may make signed-in changes (BASE_URL's, or localhost and 127.0.0.1 on the port). */
  trustedOrigins?: string[];
  rateLimits: RateLimits;
  /** Parse every API answer against its route's response schema (server/lib/route.ts); off in production (cost). */
  checkResponses?: boolean;
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

export type RateLimits = {
  /** Sign-in, sign-up and password-reset attempts per client address. */
  auth: RateLimitConfig;
  /** Physics-heavy reads per client address. */
  reads: RateLimitConfig;
  /** E-mail (verification, password reset, invitation, assignment notice) to one recipient address. */
  mailPerRecipient: RateLimitConfig;
  /** E-mail sent at the request of one signed-in account (invitations, assignment notices). */
  mailPerAccount: RateLimitConfig;
  /** E-mail asked for by one client address while signed out (sign-up verification, resend, password reset). */
  mailPerClientAddress: RateLimitConfig;
  /** CSV imports per signed-in user (absent: DEFAULT_RATE_LIMITS.imports). */
  imports?: RateLimitConfig;
};

/** Every rate limit in one place (README, "Security"). */
export const DEFAULT_RATE_LIMITS: RateLimits = {
  auth: { windowMs: 60_000, limit: 30 },
  reads: { windowMs: 60_000, limit: 600 },
  mailPerRecipient: { windowMs: 60 * 60_000, limit: 5 },
  mailPerAccount: { windowMs: 60 * 60_000, limit: 50 },
  mailPerClientAddress: { windowMs: 60 * 60_000, limit: 30 },
  imports: { windowMs: 60_000, limit: 6 },
};

/** What routers get: the app's deps plus the e-mail limiters every mailing route shares. */
export type RouterDeps = AppDeps & { mail: MailLimiters };
