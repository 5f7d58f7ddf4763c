// What every /api request passes before a handler: same-origin writes, JSON-only bodies (multipart only on
// the upload routes), and for better-auth's routes a bounded, validated body and our error shape.
import type { RequestHandler } from "express";
import { z } from "zod";
import { ERROR_CODES, type ApiErrorBody } from "../../shared/errors";
import { SIGN_UP_ROLES } from "../../shared/roles";
import { personNameSchema, textProblem } from "../../shared/schemas/text";
import { badRequest, HttpError } from "../lib/http-error";
import { zodFields } from "./validate";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A state-changing request that carries cookies must come from the app's own origin: its Origin header is one
 * of `trustedOrigins`, or, when a browser sent no Origin, `Sec-Fetch-Site: same-origin`. Anything else
 * (a foreign or "null" origin, no header at all) is a 403. SameSite=Lax does not cover this: another port of
 * the same host is the same site, and better-auth's own check covers only /api/auth.
 */
export function sameOriginWrites(trustedOrigins: string[]): RequestHandler {
  const allowed = new Set(trustedOrigins.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method) || !req.headers.cookie) return next();
    const origin = req.headers.origin;
    if (origin !== undefined ? allowed.has(origin) : req.headers["sec-fetch-site"] === "same-origin") return next();
    throw new HttpError(
      403,
      ERROR_CODES.forbidden,
      origin === undefined
        ? "A signed-in change must say where it comes from (Origin header)."
        : "Changes are accepted only from Borrowline's own pages.",
    );
  };
}

export type UploadRoute = { method: string; path: RegExp };

/**
 * API bodies are JSON: anything else with a body is refused with 415 before it reaches a handler.
 * multipart/form-data (which a cross-site form can send without a preflight) only on `uploads`.
 */
export function requireJsonBody(uploads: UploadRoute[] = []): RequestHandler {
  return (req, _res, next) => {
    const hasBody = Number(req.headers["content-length"] ?? 0) > 0 || req.headers["transfer-encoding"] !== undefined;
    if (!hasBody || SAFE_METHODS.has(req.method)) return next();
    if (req.is("application/json")) return next();
    if (req.is("multipart/form-data") && uploads.some((u) => u.method === req.method && u.path.test(req.path))) return next();
    throw new HttpError(415, ERROR_CODES.unsupportedMedia, "Send the request body as application/json.");
  };
}

// ---- better-auth bodies ------------------------------------------------------------------------------

const email = z.email("Enter a valid e-mail address.").max(254, "At most 254 characters");
/** A URL better-auth redirects to: our own paths (better-auth also checks them against the trusted origins). */
const callbackUrl = z.string().max(2000).optional();
const imageUrl = z.url().max(2000).nullable().optional();

/**
 * The routes that store user fields, in full: anything not listed here (role, accountType on update,
 * emailVerified, banned, banReason, banExpires, …) is a 400 naming the field, so it stays unset.
 */
const AUTH_BODY_SCHEMAS: Record<string, z.ZodType> = {
  "/sign-up/email": z
    .object({
      name: personNameSchema,
      email,
      password: z.string().min(1).max(128),
      accountType: z.enum(SIGN_UP_ROLES, { error: "accountType must be player or coach" }),
      image: imageUrl,
      callbackURL: callbackUrl,
      rememberMe: z.boolean().optional(),
    })
    .strict(),
  "/update-user": z.object({ name: personNameSchema.optional(), image: imageUrl }).strict(),
};

/** Every string anywhere in the body (keys included) must be acceptable text; the first bad one is named. */
function hostileStrings(value: unknown, path: string, fields: Record<string, string>, depth = 0): void {
  if (depth > 8) {
    fields[path || "body"] ??= "Nested too deeply";
    return;
  }
  if (typeof value === "string") {
    const problem = textProblem(value);
    if (problem) fields[path || "body"] ??= problem;
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => hostileStrings(v, path ? `${path}.${i}` : String(i), fields, depth + 1));
  } else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      const at = path ? `${path}.${k}` : k;
      const keyProblem = textProblem(k);
      if (keyProblem) fields[at] ??= keyProblem;
      hostileStrings(v, at, fields, depth + 1);
    }
  }
}

/**
 * Runs after express.json (100 kB) on /api/auth/*: refuses hostile text in any field, checks the routes that
 * store user fields against their full schema, and makes a password change revoke the other sessions.
 */
export const authBodyGuard: RequestHandler = (req, _res, next) => {
  if (req.body === undefined || SAFE_METHODS.has(req.method)) return next();
  if (typeof req.body !== "object" || req.body === null || Array.isArray(req.body)) {
    throw badRequest("The request body must be a JSON object.", { body: "must be a JSON object" });
  }
  const fields: Record<string, string> = {};
  hostileStrings(req.body, "", fields);
  if (Object.keys(fields).length > 0) throw badRequest("The request body is not valid.", fields);
  const schema = AUTH_BODY_SCHEMAS[req.path];
  if (schema) {
    const parsed = schema.safeParse(req.body);
    if (!parsed.success) throw badRequest("The request body is not valid.", zodFields(parsed.error));
    req.body = parsed.data;
  }
  if (req.path === "/change-password") req.body = { ...req.body, revokeOtherSessions: true };
  next();
};

/** better-auth answers errors as {code?, message}; the client gets ours: {"error": {"code", "message"}}. */
export async function reshapeAuthError(response: Response): Promise<Response> {
  if (response.status < 400) return response;
  let raw: { code?: unknown; message?: unknown } = {};
  try {
    raw = (await response.clone().json()) as typeof raw;
  } catch {
    // An empty or non-JSON body: the status says enough.
  }
  const fallback: Record<number, [string, string]> = {
    400: [ERROR_CODES.badRequest, "The request is not valid."],
    401: [ERROR_CODES.unauthenticated, "Sign in to do this."],
    403: [ERROR_CODES.forbidden, "This is not allowed."],
    404: [ERROR_CODES.notFound, "Not found."],
    429: [ERROR_CODES.tooManyRequests, "Too many requests. Try again in a moment."],
  };
  const [code, message] =
    fallback[response.status] ??
    (response.status >= 500
      ? [ERROR_CODES.internal, "Something went wrong on our side."]
      : [ERROR_CODES.badRequest, "The request could not be handled."]);
  const body: ApiErrorBody = {
    error: {
      code: typeof raw.code === "string" && raw.code ? raw.code.toLowerCase() : code,
      message: typeof raw.message === "string" && raw.message ? raw.message : message,
    },
  };
  const headers = new Headers(response.headers);
  headers.set("content-type", "application/json");
  headers.delete("content-length");
  return new Response(JSON.stringify(body), { status: response.status, statusText: response.statusText, headers });
}
