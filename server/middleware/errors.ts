import type { ErrorRequestHandler, RequestHandler } from "express";
import { ERROR_CODES, type ApiErrorBody } from "../../shared/errors";
import { HttpError } from "../lib/http-error";
import type { Logger } from "../lib/logger";

export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiErrorBody = {
    error: { code: ERROR_CODES.notFound, message: `No API route ${req.method} ${req.originalUrl.split("?")[0]}.` },
  };
  res.status(404).json(body);
};

type BodyParserError = Error & { type?: string; status?: number; expose?: boolean };

/** PostgreSQL's "canceling statement due to statement timeout" (SQLSTATE 57014), bare or wrapped by Drizzle. */
export function isStatementTimeout(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (e.code === "57014") return true;
  }
  return false;
}

/** Maps every thrown error to the JSON error shape, once. No stack traces leave the server. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err: unknown, req, res, _next) => {
    let status = 500;
    let body: ApiErrorBody = { error: { code: ERROR_CODES.internal, message: "Something went wrong on our side." } };
    const e = err as BodyParserError;
    if (err instanceof HttpError) {
      status = err.status;
      body = {
        error: {
          code: err.code,
          message: err.message,
          ...(err.fields ? { fields: err.fields } : {}),
          ...(err.details ? { details: err.details } : {}),
        },
      };
    } else if (isStatementTimeout(err)) {
      // The statement ran past DB_STATEMENT_TIMEOUT_MS and was cancelled: the database is free again; try later.
      status = 503;
      res.setHeader("Retry-After", "5");
      body = { error: { code: ERROR_CODES.timeout, message: "The database took too long to answer. Try again in a moment." } };
    } else if (e?.type === "entity.parse.failed") {
      status = 400;
      body = {
        error: { code: ERROR_CODES.badRequest, message: "The request body is not valid JSON.", fields: { body: "malformed JSON" } },
      };
    } else if (e?.type === "entity.too.large") {
      status = 413;
      body = { error: { code: ERROR_CODES.tooLarge, message: "The request body is too large." } };
    } else if (typeof e?.status === "number" && e.status >= 400 && e.status < 500) {
      status = e.status;
      const code = status === 415 ? ERROR_CODES.unsupportedMedia : ERROR_CODES.badRequest;
      body = { error: { code, message: e.expose && e.message ? e.message : "The request could not be read." } };
    }
    if (status >= 500) logger.error({ err, path: req.path }, status === 503 ? "statement timeout" : "unhandled error");
    if (res.headersSent) return;
    res.status(status).json(body);
  };
}
