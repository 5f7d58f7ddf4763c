import type { RequestHandler } from "express";
import { fromNodeHeaders } from "better-auth/node";
import { isRole, type Role } from "../../shared/roles";
import type { Auth } from "../auth";
import { forbidden, unauthenticated } from "../lib/http-error";

export type SessionUser = { id: string; name: string; email: string; role: Role; emailVerified: boolean };

declare module "express-serve-static-core" {
  interface Request {
    user?: SessionUser | null;
  }
}

/** Reads the better-auth session (if any) for every /api request. */
export function loadSession(auth: Auth): RequestHandler {
  return async (req, _res, next) => {
    const found = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    const u = found?.user;
    req.user =
      u && !u.banned
        ? { id: u.id, name: u.name, email: u.email, role: isRole(u.role) ? u.role : "player", emailVerified: u.emailVerified }
        : null;
    next();
  };
}

/** 401 when signed out, 403 when the role is not among `roles`. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw unauthenticated();
    if (roles.length > 0 && !roles.includes(req.user.role)) throw forbidden();
    next();
  };
}

export const requireUser = requireRole();

/** The signed-in user; only call after requireRole. */
export function currentUser(req: { user?: SessionUser | null }): SessionUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}
