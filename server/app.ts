export { DEFAULT_RATE_LIMITS, type AppConfig, type AppDeps, type RateLimits } from "./deps";
// createApp(deps) builds the Express app without listening, so tests can mount it.
import express, { type Express, type RequestHandler } from "express";
import compression from "compression";
import helmet from "helmet";
import { pinoHttp } from "pino-http";
import { toNodeHandler } from "better-auth/node";
import type { AppDeps } from "./deps";
import { apiNotFound, errorHandler } from "./middleware/errors";
import { authBodyGuard, reshapeAuthError, requireJsonBody, sameOriginWrites, type UploadRoute } from "./middleware/guards";
import { limiter, mailLimiters, withStore } from "./middleware/rate-limit";
import { forbidden } from "./lib/http-error";
import { loadSession } from "./middleware/session";
import { apiRouter, apiRoutes } from "./routes";

const JSON_LIMIT = "100kb";

/** The only routes that take multipart/form-data: the CSV uploads (paths below /api). */
const UPLOAD_ROUTES: UploadRoute[] = [
  { method: "POST", path: /^\/csv\/putts\/(preview|import)$/ },
  { method: "PUT", path: /^\/greens\/[^/]+\/height-map$/ },
];

export function createApp(appDeps: AppDeps): Express {
  // Every limiter made from config.rateLimits gets the shared store (PostgreSQL) when there is one.
  const deps: AppDeps = {
    ...appDeps,
    config: { ...appDeps.config, rateLimits: withStore(appDeps.config.rateLimits, appDeps.rateLimitStore) },
  };
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
  // gzip/brotli for what is made per request (JSON, index.html); built assets come pre-compressed (frontend.ts).
  app.use(compression());
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => !(req.url ?? "").startsWith("/api") },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? "error" : res.statusCode >= 400 ? "info" : "debug"),
    }),
  );

  // Every /api write that carries cookies comes from our own pages (403 otherwise), auth routes included.
  app.use("/api", sameOriginWrites(config.trustedOrigins ?? [new URL(config.baseUrl).origin]));
  const { mailPerRecipient, mailPerAccount, mailPerClientAddress } = config.rateLimits;
  const mail = mailLimiters({ perRecipient: mailPerRecipient, perAccount: mailPerAccount, perClientAddress: mailPerClientAddress });

  // better-auth: its body is parsed here first (JSON only, 100 kB, hostile text refused, user fields checked),
  // better-auth reads the parsed body, and its errors are rewritten to our shape.
  app.use("/api/auth", requireJsonBody(), express.json({ limit: JSON_LIMIT, strict: true }), authBodyGuard);
  const authLimiter = limiter(config.rateLimits.auth, "sign-in");
  const limitedAuthPaths = [
    "/api/auth/sign-in/email",
    "/api/auth/sign-up/email",
    "/api/auth/request-password-reset",
    "/api/auth/reset-password",
  ];
  app.use(limitedAuthPaths, authLimiter);
  const mailingAuthPaths = ["/api/auth/sign-up/email", "/api/auth/send-verification-email", "/api/auth/request-password-reset"];
  app.post(mailingAuthPaths, mail.byClientAddress, mail.byRecipient);
  // Admin changes go through /api/admin (audited, with the self-protection rules), never straight to the plugin.
  app.post("/api/auth/admin/{*any}", (_req, _res, next) =>
    next(forbidden("Use the admin screens (/api/admin) for this; every admin action is recorded there.")),
  );
  const authHandler = toNodeHandler(async (request: Request) => reshapeAuthError(await auth.handler(request)));
  app.all("/api/auth/{*any}", authHandler as RequestHandler);
  app.use("/api/auth", errorHandler(logger));

  const api = express.Router();
  api.use(requireJsonBody(UPLOAD_ROUTES));
  api.use(express.json({ limit: JSON_LIMIT, strict: true }));
  api.use(loadSession(auth));
  const routes = apiRoutes({ ...deps, mail });
  // The route table with its schemas, for tests that walk every route (tests/api/contract.test.ts).
  app.locals.apiRoutes = routes;
  api.use(apiRouter(routes, config.checkResponses ?? true));
  api.use(apiNotFound);
  api.use(errorHandler(logger));
  app.use("/api", api);

  config.frontend?.(app);
  app.use(errorHandler(logger));
  return app;
}
