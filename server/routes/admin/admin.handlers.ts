import type { z } from "zod";
// Admin screens' API. Every change goes through better-auth's admin plugin (auth.api.*, called with the
// admin's own request headers, so the plugin checks the role too) and is written to admin_audit once it
// has succeeded. An admin never changes an admin's role here (their own included) and never bans themselves.
import { APIError } from "better-auth/api";
import { fromNodeHeaders } from "better-auth/node";
import { ERROR_CODES } from "../../../shared/errors";
import { count, desc, eq } from "drizzle-orm";
import {
  ADMIN_PAGE_SIZE,
  adminAuditQuerySchema,
  adminBanInputSchema,
  adminRoleInputSchema,
  adminUsersQuerySchema,
  type AdminAction,
  type AdminCoaching,
  type AdminUser,
  type AdminUsers,
  type AuditEntry,
} from "../../../shared/schemas/admin";
import { userIdSchema } from "../../../shared/schemas/squads";
import type { AppDeps } from "../../deps";
import type { Db } from "../../db/client";
import { adminAudit, ladders, squadMembers, squads, user } from "../../db/schema";
import { forbidden, HttpError, notFound } from "../../lib/http-error";
import { currentUser, type SessionUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import type { Ctx } from "../../lib/route";

type UserRow = typeof user.$inferSelect;

/** Runs a better-auth call; its refusals (APIError) become our error shape instead of a 500. */
async function plugin<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (err instanceof APIError) {
      const status = typeof err.statusCode === "number" && err.statusCode >= 400 && err.statusCode < 500 ? err.statusCode : 502;
      throw new HttpError(
        status,
        status === 403 ? ERROR_CODES.forbidden : status === 404 ? ERROR_CODES.notFound : ERROR_CODES.badRequest,
        err.message || "The account service refused this.",
      );
    }
    throw err;
  }
}

function adminUserView(
  u: Pick<UserRow, "id" | "name" | "email" | "role" | "emailVerified" | "banned" | "banReason" | "createdAt">,
): AdminUser {
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role ?? "player",
    emailVerified: u.emailVerified,
    banned: u.banned ?? false,
    banReason: u.banReason ?? null,
    createdAt: new Date(u.createdAt).toISOString(),
  };
}

async function targetUser(db: Db, raw: unknown): Promise<UserRow> {
  const id = parseOrThrow(userIdSchema, raw, "id");
  const [found] = await db.select().from(user).where(eq(user.id, id));
  if (!found) throw notFound("User");
  return found;
}

async function record(db: Db, actor: SessionUser, action: AdminAction, target: UserRow, detail: Record<string, unknown> | null = null) {
  await db
    .insert(adminAudit)
    .values({ actorId: actor.id, actorEmail: actor.email, action, targetId: target.id, targetEmail: target.email, detail });
}

export function listUsers({ auth }: AppDeps) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof adminUsersQuerySchema>>) => {
    const q = query;
    const found = await plugin(() =>
      auth.api.listUsers({
        headers: fromNodeHeaders(req.headers),
        query: {
          ...(q.search ? { searchValue: q.search, searchField: q.field, searchOperator: "contains" as const } : {}),
          ...(q.role ? { filterField: "role", filterValue: q.role, filterOperator: "eq" as const } : {}),
          limit: ADMIN_PAGE_SIZE,
          offset: (q.page - 1) * ADMIN_PAGE_SIZE,
          sortBy: "createdAt",
          sortDirection: "desc",
        },
      }),
    );
    const out: AdminUsers = {
      users: (found.users as unknown as UserRow[]).map(adminUserView),
      total: found.total,
      page: q.page,
      pageSize: ADMIN_PAGE_SIZE,
    };
    return out;
  };
}

export function setRole({ auth, database }: AppDeps) {
  const db = database.db;
  return async ({ req, body }: Ctx<z.infer<typeof adminRoleInputSchema>>) => {
    const me = currentUser(req);
    const target = await targetUser(db, req.params.id);
    const { role } = body;
    if (target.id === me.id) throw forbidden("You cannot change your own role: another admin, or the create-admin command, can.");
    if (target.role === "admin") throw forbidden("An admin's role is not changed here.");
    const from = target.role ?? "player";
    // Our roles are not declared to the plugin's access control, so its types know only "user" | "admin".
    const done = await plugin(() =>
      auth.api.setRole({ headers: fromNodeHeaders(req.headers), body: { userId: target.id, role: role as "user" } }),
    );
    await record(db, me, "role.set", target, { from, to: role });
    return adminUserView(done.user as unknown as UserRow);
  };
}

export function banUser({ auth, database }: AppDeps) {
  const db = database.db;
  return async ({ req, body }: Ctx<z.infer<typeof adminBanInputSchema>>) => {
    const me = currentUser(req);
    const target = await targetUser(db, req.params.id);
    const { reason } = body;
    if (target.id === me.id) throw forbidden("You cannot ban yourself.");
    const done = await plugin(() =>
      auth.api.banUser({ headers: fromNodeHeaders(req.headers), body: { userId: target.id, ...(reason ? { banReason: reason } : {}) } }),
    );
    await record(db, me, "user.ban", target, reason ? { reason } : null);
    return adminUserView(done.user as unknown as UserRow);
  };
}

export function unbanUser({ auth, database }: AppDeps) {
  const db = database.db;
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const target = await targetUser(db, req.params.id);
    const done = await plugin(() => auth.api.unbanUser({ headers: fromNodeHeaders(req.headers), body: { userId: target.id } }));
    await record(db, me, "user.unban", target);
    return adminUserView(done.user as unknown as UserRow);
  };
}

export function revokeSessions({ auth, database }: AppDeps) {
  const db = database.db;
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const target = await targetUser(db, req.params.id);
    await plugin(() => auth.api.revokeUserSessions({ headers: fromNodeHeaders(req.headers), body: { userId: target.id } }));
    await record(db, me, "sessions.revoke", target);
  };
}

/** Sends the user the same password-reset e-mail "Forgot your password?" sends. */
export function sendPasswordReset({ auth, database }: AppDeps) {
  const db = database.db;
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const target = await targetUser(db, req.params.id);
    await plugin(() => auth.api.requestPasswordReset({ body: { email: target.email, redirectTo: "/reset-password" } }));
    await record(db, me, "password-reset.send", target);
  };
}

export function listAudit(db: Db) {
  return async ({ query }: Ctx<unknown, z.infer<typeof adminAuditQuerySchema>>) => {
    const { page } = query;
    const [rows, [total]] = await Promise.all([
      db
        .select()
        .from(adminAudit)
        .orderBy(desc(adminAudit.createdAt), desc(adminAudit.id))
        .limit(ADMIN_PAGE_SIZE)
        .offset((page - 1) * ADMIN_PAGE_SIZE),
      db.select({ n: count() }).from(adminAudit),
    ]);
    const entries: AuditEntry[] = rows.map((r) => ({
      id: r.id,
      actor: { id: r.actorId, email: r.actorEmail },
      action: r.action as AdminAction,
      target: { id: r.targetId, email: r.targetEmail },
      detail: (r.detail as Record<string, unknown> | null) ?? null,
      createdAt: r.createdAt.toISOString(),
    }));
    return { entries, total: Number(total?.n ?? 0), page, pageSize: ADMIN_PAGE_SIZE };
  };
}

/** Every coach's squads and ladders, each with its owner's name and e-mail. */
export function coachingOverview(db: Db) {
  return async () => {
    const [squadRows, sizes, ladderRows] = await Promise.all([
      db
        .select({
          id: squads.id,
          name: squads.name,
          createdAt: squads.createdAt,
          ownerId: user.id,
          ownerName: user.name,
          ownerEmail: user.email,
        })
        .from(squads)
        .innerJoin(user, eq(user.id, squads.coachId))
        .orderBy(user.name, squads.name, squads.id),
      db.select({ squadId: squadMembers.squadId, n: count() }).from(squadMembers).groupBy(squadMembers.squadId),
      db
        .select({
          id: ladders.id,
          name: ladders.name,
          rungs: ladders.rungs,
          createdAt: ladders.createdAt,
          ownerId: user.id,
          ownerName: user.name,
          ownerEmail: user.email,
        })
        .from(ladders)
        .innerJoin(user, eq(user.id, ladders.ownerId))
        .orderBy(user.name, ladders.name, ladders.id),
    ]);
    const size = new Map(sizes.map((s) => [s.squadId, Number(s.n)]));
    const owner = (r: { ownerId: string; ownerName: string; ownerEmail: string }) => ({
      id: r.ownerId,
      name: r.ownerName,
      email: r.ownerEmail,
    });
    const out: AdminCoaching = {
      squads: squadRows.map((r) => ({
        id: r.id,
        name: r.name,
        owner: owner(r),
        members: size.get(r.id) ?? 0,
        createdAt: r.createdAt.toISOString(),
      })),
      ladders: ladderRows.map((r) => ({
        id: r.id,
        name: r.name,
        owner: owner(r),
        rungs: Array.isArray(r.rungs) ? r.rungs.length : 0,
        createdAt: r.createdAt.toISOString(),
      })),
    };
    return out;
  };
}
