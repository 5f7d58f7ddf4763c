import {
  adminAuditQuerySchema,
  adminBanInputSchema,
  adminCoachingSchema,
  adminRoleInputSchema,
  adminUserSchema,
  adminUsersQuerySchema,
  adminUsersSchema,
  auditPageSchema,
} from "../../../shared/schemas/admin";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireRole } from "../../middleware/session";
import { banUser, coachingOverview, listAudit, listUsers, revokeSessions, sendPasswordReset, setRole, unbanUser } from "./admin.handlers";

const admin = [requireRole("admin")];

export function adminRoutes(deps: AppDeps) {
  const db = deps.database.db;
  return [
    defineRoute(
      { method: "get", path: "/admin/users", use: admin, query: adminUsersQuerySchema, response: adminUsersSchema },
      listUsers(deps),
    ),
    defineRoute(
      { method: "post", path: "/admin/users/:id/role", use: admin, body: adminRoleInputSchema, response: adminUserSchema },
      setRole(deps),
    ),
    defineRoute(
      { method: "post", path: "/admin/users/:id/ban", use: admin, body: adminBanInputSchema, response: adminUserSchema },
      banUser(deps),
    ),
    defineRoute({ method: "post", path: "/admin/users/:id/unban", use: admin, response: adminUserSchema }, unbanUser(deps)),
    defineRoute({ method: "post", path: "/admin/users/:id/revoke-sessions", use: admin, response: noContent }, revokeSessions(deps)),
    defineRoute({ method: "post", path: "/admin/users/:id/password-reset", use: admin, response: noContent }, sendPasswordReset(deps)),
    defineRoute(
      { method: "get", path: "/admin/audit", use: admin, query: adminAuditQuerySchema, response: auditPageSchema },
      listAudit(db),
    ),
    defineRoute({ method: "get", path: "/admin/coaching", use: admin, response: adminCoachingSchema }, coachingOverview(db)),
  ];
}
