import type { RequestHandler } from "express";
import type { z } from "zod";
import { badRequest } from "../lib/http-error";

/** zod issues → { "field.path": "why" } for the error body. */
export function zodFields(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join(".") : "body";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, where: string): z.infer<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw badRequest(`The ${where} is not valid.`, zodFields(result.error));
  return result.data;
}

declare module "express-serve-static-core" {
  interface Request {
    /** The body parsed by `validateBody`; handlers read this, never req.body. */
    valid?: unknown;
    validQuery?: unknown;
  }
}

export function validateBody(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    req.valid = parseOrThrow(schema, req.body ?? {}, "request body");
    next();
  };
}

export function validateQuery(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    req.validQuery = parseOrThrow(schema, req.query, "query string");
    next();
  };
}

/** The validated body/query with its schema's type. */
export function body<S extends z.ZodType>(req: { valid?: unknown }, _schema: S): z.infer<S> {
  return req.valid as z.infer<S>;
}
export function query<S extends z.ZodType>(req: { validQuery?: unknown }, _schema: S): z.infer<S> {
  return req.validQuery as z.infer<S>;
}
