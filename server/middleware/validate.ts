import type { RequestHandler } from "express";
import type { z } from "zod";
import { badRequest } from "../lib/http-error";

/** zod issues → { "field.path": "why" } for the error body. */
export function zodFields(error: z.ZodError, root = "body"): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    // A field nobody may send (strict objects) is named itself, as well as its parent (the body, as before).
    if (issue.code === "unrecognized_keys") {
      for (const k of issue.keys) fields[[...issue.path, k].join(".")] ??= "Not a field that can be set here";
    }
    const key = issue.path.length > 0 ? issue.path.join(".") : root;
    fields[key] ??= issue.message;
  }
  return fields;
}

/** `where` names the thing in the message, and is the field name when the value itself (not a member) is wrong. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, where: string): z.infer<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    const root = where === "request body" ? "body" : where === "query string" ? "query" : where;
    throw badRequest(`The ${where} is not valid.`, zodFields(result.error, root));
  }
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
