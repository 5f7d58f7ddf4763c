// better-auth: e-mail + password, cookie sessions stored in our database, roles via the admin plugin.
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { admin } from "better-auth/plugins";
import { z } from "zod";
import { SIGN_UP_ROLES } from "../shared/roles";
import type { Db } from "./db/client";
import * as schema from "./db/schema";
import { linkBaseForWebRequest, onOrigin, type LinkOrigins } from "./lib/link-origin";
import { linkMail, type Mailer } from "./lib/mailer";
import type { Logger } from "./lib/logger";

/** How long the signed session copy in a cookie is trusted before the database is asked again. */
export const SESSION_CACHE_SECONDS = 5;

export type AuthConfig = {
  db: Db;
  secret: string;
  baseUrl: string;
  trustedOrigins: string[];
  /** Where e-mailed links point (lib/link-origin.ts); better-auth builds them on baseUrl, moved here per request. */
  links?: LinkOrigins;
  mailer: Mailer;
  logger: Logger;
};

export function createAuth({ db, secret, baseUrl, trustedOrigins, links, mailer, logger }: AuthConfig) {
  const linkFor = (url: string, request: Request | undefined) => (links ? onOrigin(url, linkBaseForWebRequest(links, request)) : url);
  const send = async (mail: Parameters<Mailer["send"]>[0]) => {
    try {
      await mailer.send(mail);
    } catch (err) {
      // A mail outage must not lose the account; the user can ask for the e-mail again.
      logger.error({ err, to: mail.to, subject: mail.subject }, "mail could not be sent");
    }
  };

  return betterAuth({
    appName: "Borrowline",
    logger: {
      log: (level, message, ...args) => logger[level]({ args }, `better-auth: ${message}`),
    },
    baseURL: baseUrl,
    basePath: "/api/auth",
    secret,
    trustedOrigins,
    database: drizzleAdapter(db, { provider: "pg", schema }),
    // Rate limits are applied in Express (express-rate-limit) so every 429 has our error shape.
    rateLimit: { enabled: false },
    advanced: {
      // better-auth skips its origin/CSRF checks when NODE_ENV is "test"; ours run with them on, always.
      disableOriginCheck: false,
      disableCSRFCheck: false,
      useSecureCookies: baseUrl.startsWith("https://"),
      defaultCookieAttributes: { httpOnly: true, sameSite: "lax" },
    },
    session: {
      // A signed copy of the session in a cookie spares the database a session lookup on most requests (putt
      // logging on a phone is the hot path). It is trusted for 5 s only: a revoked session, a ban or a changed
      // role reaches every route within 5 s.
      cookieCache: { enabled: true, maxAge: SESSION_CACHE_SECONDS },
    },
    emailAndPassword: {
      enabled: true,
      minPasswordLength: 8,
      maxPasswordLength: 128,
      requireEmailVerification: false,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, url }, request) => {
        await send(
          linkMail(
            user.email,
            "Reset your Borrowline password",
            `Someone asked to reset the password for ${user.email}.`,
            "Choose a new password",
            linkFor(url, request),
          ),
        );
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      autoSignInAfterVerification: true,
      sendVerificationEmail: async ({ user, url }, request) => {
        await send(
          linkMail(
            user.email,
            "Confirm your e-mail for Borrowline",
            `Welcome to Borrowline, ${user.name}. Please confirm this is your e-mail address.`,
            "Confirm my e-mail",
            linkFor(url, request),
          ),
        );
      },
    },
    user: {
      additionalFields: {
        // What the person chose at sign-up; it decides the role once, at creation. Never "admin".
        accountType: {
          type: "string",
          required: true,
          input: true,
          validator: { input: z.enum(SIGN_UP_ROLES, { message: "accountType must be player or coach" }) },
        },
      },
    },
    databaseHooks: {
      user: {
        create: {
          before: async (user) => {
            const chosen = z.enum(SIGN_UP_ROLES).safeParse(user.accountType);
            // Admin-created users (CLI, seed) arrive with a role of their own and keep it.
            const role = typeof user.role === "string" && user.role !== "player" ? user.role : chosen.success ? chosen.data : "player";
            return { data: { ...user, role } };
          },
        },
        update: {
          before: async (data, ctx) => {
            // A user editing their own record never changes their role or account type; through update-user
            // not their verification or ban either (the auth body guard refuses those fields first).
            if (ctx?.path?.startsWith("/admin/")) return;
            const { role: _role, accountType: _type, ...kept } = data;
            let rest: Record<string, unknown> = kept;
            if (ctx?.path === "/update-user") {
              const { emailVerified: _v, banned: _b, banReason: _r, banExpires: _e, ...safe } = kept as Record<string, unknown>;
              rest = safe;
            }
            return { data: rest };
          },
        },
      },
    },
    plugins: [admin({ defaultRole: "player", adminRoles: ["admin"] })],
  });
}

export type Auth = ReturnType<typeof createAuth>;
