import type { Request } from "express";
import { rateLimit, type Options, type Store } from "express-rate-limit";
import { ERROR_CODES, type ApiErrorBody } from "../../shared/errors";

/** Makes the store of one limiter (its name keeps its counts apart); none = express-rate-limit's memory store. */
export type RateLimitStoreFactory = (name: string) => Store;
export type RateLimitConfig = {
  windowMs: number;
  limit: number;
  /**
   * Where the counts live. createApp sets it on every configured limit: PostgreSQL (shared by every server on
   * the database) when DATABASE_URL is set, otherwise the in-memory store of this one process.
   */
  store?: RateLimitStoreFactory;
};

/**
 * express-rate-limit with our error body; draft-8 RateLimit headers plus Retry-After. Every limiter is made here.
 * `key` counts per something other than the client address (e.g. per signed-in user).
 */
export function limiter({ windowMs, limit, store }: RateLimitConfig, what: string, key?: (req: Request) => string) {
  const options: Partial<Options> = {
    windowMs,
    limit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    ...(store ? { store: store(what) } : {}),
    ...(key ? { keyGenerator: key } : {}),
    handler: (_req, res, _next, opts) => {
      const body: ApiErrorBody = {
        error: { code: ERROR_CODES.tooManyRequests, message: `Too many ${what} requests. Try again in a moment.` },
      };
      res.status(opts.statusCode).json(body);
    },
  };
  return rateLimit(options);
}

/** The same limits with `store` set on each (createApp uses it, so every route's limiter shares the store). */
export function withStore<T extends { [name: string]: RateLimitConfig | undefined }>(limits: T, store: RateLimitStoreFactory | undefined): T {
  if (!store) return limits;
  return Object.fromEntries(Object.entries(limits).map(([k, v]) => [k, v && { ...v, store }])) as T;
}
