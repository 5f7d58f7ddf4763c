export { DEFAULT_RATE_LIMITS, type AppConfig, type AppDeps } from "./deps";
// createApp(deps) builds the Express app without listening, so tests can mount it.
import express, { type Express, type RequestHandler } from "express";
import helmet from "helmet";
import { pinoHttp } from "pino-http";
import { toNodeHandler } from "better-auth/node";
import type { AppDeps } from "./deps";
import { apiNotFound, errorHandler, requireJsonBody } from "./middleware/errors";
import { forbidden } from "./lib/http-error";
import { limiter } from "./middleware/rate-limit";
import { loadSession } from "./middleware/session";
import { apiRouters } from "./routes";

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
  // Admin changes go through /api/admin (audited, with the self-protection rules), never straight to the plugin.
  app.post("/api/auth/admin/{*any}", (_req, _res, next) => next(forbidden("Use the admin screens (/api/admin) for this; every admin action is recorded there.")));
  const authHandler = toNodeHandler(auth);
  app.all("/api/auth/{*any}", authHandler as RequestHandler);

  const api = express.Router();
  api.use(requireJsonBody);
  api.use(express.json({ limit: JSON_LIMIT, strict: true }));
  api.use(loadSession(auth));
  for (const router of apiRouters(deps)) api.use(router);
  api.use(apiNotFound);
  api.use(errorHandler(logger));
  app.use("/api", api);

  config.frontend?.(app);
  app.use(errorHandler(logger));
  return app;
}
