// createApp(deps) builds the Express app without listening, so tests can mount it.
import express, { type Express, type RequestHandler } from "express";
import helmet from "helmet";
import { pinoHttp } from "pino-http";
import { toNodeHandler } from "better-auth/node";
import type { Auth } from "./auth";
import type { Database } from "./db/client";
import type { Logger } from "./lib/logger";
import type { Mailer } from "./lib/mailer";
import type { SmtpFake } from "./lib/smtp-fake";
import { apiNotFound, errorHandler, requireJsonBody } from "./middleware/errors";
import { limiter, type RateLimitConfig } from "./middleware/rate-limit";
import { loadSession } from "./middleware/session";
import { devRoutes } from "./routes/dev/dev.routes";
import { healthRoutes } from "./routes/health/health.routes";
import { meRoutes } from "./routes/me/me.routes";

export type AppConfig = {
  baseUrl: string;
  /** The local mailbox route exists (no real SMTP server configured). */
  dev: boolean;
  /** Vite's dev server injects inline scripts: CSP is off in development only. */
  devCsp: boolean;
  trustProxy: boolean;
  rateLimits: { auth: RateLimitConfig; reads: RateLimitConfig };
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
};

export const DEFAULT_RATE_LIMITS: AppConfig["rateLimits"] = {
  auth: { windowMs: 60_000, limit: 30 },
  reads: { windowMs: 60_000, limit: 600 },
};

const JSON_LIMIT = "100kb";

export function createApp(deps: AppDeps): Express {
  const { auth, logger, config } = deps;
  const app = express();
  app.disable("x-powered-by");
  if (config.trustProxy) app.set("trust proxy", 1);

  app.use(
    helmet({
      contentSecurityPolicy: config.devCsp
        ? false
        : {
            directives: {
              "default-src": ["'self'"],
              "script-src": ["'self'"],
              "style-src": ["'self'", "'unsafe-inline'"],
              "img-src": ["'self'", "data:", "blob:"],
              "font-src": ["'self'", "data:"],
              "connect-src": ["'self'"],
              "worker-src": ["'self'", "blob:"],
              "object-src": ["'none'"],
              "frame-ancestors": ["'none'"],
              "upgrade-insecure-requests": config.baseUrl.startsWith("https://") ? [] : null,
            },
          },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => !(req.url ?? "").startsWith("/api") },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? "error" : res.statusCode >= 400 ? "info" : "debug"),
    }),
  );

  // Auth routes first: better-auth reads the raw body itself, so it sits before express.json().
  const authLimiter = limiter(config.rateLimits.auth, "sign-in");
  const limitedAuthPaths = ["/api/auth/sign-in/email", "/api/auth/sign-up/email", "/api/auth/request-password-reset", "/api/auth/reset-password"];
  app.use(limitedAuthPaths, authLimiter);
  const authHandler = toNodeHandler(auth);
  app.all("/api/auth/{*any}", authHandler as RequestHandler);

  const api = express.Router();
  api.use(requireJsonBody);
  api.use(express.json({ limit: JSON_LIMIT, strict: true }));
  api.use(loadSession(auth));
  api.use(healthRoutes(deps));
  api.use(meRoutes(deps));
  if (config.dev) api.use(devRoutes(deps));
  api.use(apiNotFound);
  api.use(errorHandler(logger));
  app.use("/api", api);

  config.frontend?.(app);
  app.use(errorHandler(logger));
  return app;
}
