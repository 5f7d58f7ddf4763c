import { rateLimit, type Options } from "express-rate-limit";
import { ERROR_CODES, type ApiErrorBody } from "../../shared/errors";

export type RateLimitConfig = { windowMs: number; limit: number };

/** express-rate-limit with our error body; draft-8 RateLimit headers plus Retry-After. */
export function limiter({ windowMs, limit }: RateLimitConfig, what: string) {
  const options: Partial<Options> = {
    windowMs,
    limit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    handler: (_req, res, _next, opts) => {
      const body: ApiErrorBody = {
        error: { code: ERROR_CODES.tooManyRequests, message: `Too many ${what} requests. Try again in a moment.` },
      };
      res.status(opts.statusCode).json(body);
    },
  };
  return rateLimit(options);
}
