import type { Request, RequestHandler } from "express";
import { ipKeyGenerator, rateLimit, type Options, type Store } from "express-rate-limit";
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
 * What a limit counts by: the client address (default), or a key taken from the request (an account id, a
 * recipient address). A request the key function returns undefined for is not counted by that limiter.
 */
export type LimitKey = (req: Request) => string | undefined;

/** The client address, with IPv6 addresses grouped by /56 as express-rate-limit advises. */
export const clientAddress: LimitKey = (req) => `ip:${ipKeyGenerator(req.ip ?? "unknown")}`;

/** express-rate-limit with our error body; draft-8 RateLimit headers plus Retry-After. Every limiter is made here. */
export function limiter({ windowMs, limit, store }: RateLimitConfig, what: string, key?: LimitKey) {
  const options: Partial<Options> = {
    windowMs,
    limit,
    ...(key ? { keyGenerator: (req) => key(req) ?? "", skip: (req) => key(req) === undefined } : {}),
    standardHeaders: "draft-8",
    legacyHeaders: false,
    // The store's name keeps each limit's counts and window apart in the shared database.
    ...(store ? { store: store(`${what}-${windowMs}-${limit}`) } : {}),
    handler: (_req, res, _next, opts) => {
      const body: ApiErrorBody = {
        error: { code: ERROR_CODES.tooManyRequests, message: `Too many ${what} requests. Try again in a moment.` },
      };
      res.status(opts.statusCode).json(body);
    },
  };
  return rateLimit(options);
}

/** The e-mail address a request sends to: the validated body's `email`, else the raw body's (better-auth routes). */
const recipient: LimitKey = (req) => {
  const email = (req.valid as { email?: unknown } | undefined)?.email ?? (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === "string" && email.trim() ? `to:${email.trim().toLowerCase()}` : undefined;
};

/** The signed-in account asking for the e-mail (signed-out requests are not counted by it). */
const account: LimitKey = (req) => (req.user ? `user:${req.user.id}` : undefined);

export type MailLimiters = { byRecipient: RequestHandler; byAccount: RequestHandler; byClientAddress: RequestHandler };

/**
 * One set of limiters for every route that sends e-mail, so a recipient's count is shared by verification,
 * password-reset and invitation mail alike.
 */
export function mailLimiters(limits: {
  perRecipient: RateLimitConfig;
  perAccount: RateLimitConfig;
  perClientAddress: RateLimitConfig;
}): MailLimiters {
  return {
    byRecipient: limiter(limits.perRecipient, "e-mail", recipient),
    byAccount: limiter(limits.perAccount, "e-mail", account),
    byClientAddress: limiter(limits.perClientAddress, "e-mail", clientAddress),
  };
}

/** The same limits with `store` set on each (createApp uses it, so every route's limiter shares the store). */
export function withStore<T extends { [name: string]: RateLimitConfig | undefined }>(
  limits: T,
  store: RateLimitStoreFactory | undefined,
): T {
  if (!store) return limits;
  return Object.fromEntries(Object.entries(limits).map(([k, v]) => [k, v && { ...v, store }])) as T;
}
