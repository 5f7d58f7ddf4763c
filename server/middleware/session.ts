import type { RequestHandler } from "express";
import { fromNodeHeaders } from "better-auth/node";
import { LRUCache } from "lru-cache";
import { isRole, type Role } from "../../shared/roles";
import { SESSION_CACHE_SECONDS, type Auth } from "../auth";
import { forbidden, unauthenticated } from "../lib/http-error";

export type SessionUser = { id: string; name: string; email: string; role: Role; emailVerified: boolean };

declare module "express-serve-static-core" {
  interface Request {
    user?: SessionUser | null;
  }
}

/**
 * What a Cookie header was found to mean, remembered for SESSION_CACHE_SECONDS (the same trust window as
 * better-auth's signed cookie cache). Without it every request asked better-auth, which verified two signatures,
 * looked the session up in the database once the cookie's own copy was over 5 s old (a phone logging putts every
 * few seconds, always) and signed a fresh copy that never reached the browser: 43 % of the server's CPU for a
 * putt (5.1 → 2.9 ms, `npm run bench:load`, steady scenario). Keyed by the whole header, so only the exact
 * cookies that were checked are trusted; a ban, a sign-out or a role change still reaches every route within 5 s,
 * on every server.
 */
export function sessionMemo(options: { maxBytes?: number; ttlMs?: number } = {}) {
  return new LRUCache<string, { user: SessionUser | null }>({
    // Bounded by the bytes of the headers kept (a header may be up to 16 kB): 8 MB at most, whatever is sent.
    maxSize: options.maxBytes ?? 8 * 1024 * 1024,
    sizeCalculation: (_entry, cookie) => cookie.length + 200,
    ttl: options.ttlMs ?? SESSION_CACHE_SECONDS * 1000,
    ttlAutopurge: false,
  });
}

/** Reads the better-auth session (if any) for every /api request. */
export function loadSession(auth: Auth, memo = sessionMemo()): RequestHandler {
  return async (req, _res, next) => {
    const cookie = req.headers.cookie;
    // better-auth reads sessions from cookies only (no bearer plugin): no cookie, nobody signed in.
    if (!cookie) {
      req.user = null;
      return next();
    }
    const known = memo.get(cookie);
    if (known) {
      req.user = known.user;
      return next();
    }
    const found = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    const u = found?.user;
    req.user =
      u && !u.banned
        ? { id: u.id, name: u.name, email: u.email, role: isRole(u.role) ? u.role : "player", emailVerified: u.emailVerified }
        : null;
    // Each entry lives 60–100 % of the window, so sessions looked up together (a squad signing in at once) are not
    // all looked up again in the same instant.
    memo.set(cookie, { user: req.user ? Object.freeze(req.user) : null }, { ttl: memo.ttl * (0.6 + 0.4 * Math.random()) });
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
