import { Router } from "express";
import { adminAuditQuerySchema, adminBanInputSchema, adminRoleInputSchema, adminUsersQuerySchema } from "../../../shared/schemas/admin";
import type { AppDeps } from "../../deps";
import { requireRole } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { banUser, coachingOverview, listAudit, listUsers, revokeSessions, sendPasswordReset, setRole, unbanUser } from "./admin.handlers";

const admin = requireRole("admin");

export function adminRoutes(deps: AppDeps) {
  const db = deps.database.db;
  const router = Router();
  router.get("/admin/users", admin, validateQuery(adminUsersQuerySchema), listUsers(deps));
  router.post("/admin/users/:id/role", admin, validateBody(adminRoleInputSchema), setRole(deps));
  router.post("/admin/users/:id/ban", admin, validateBody(adminBanInputSchema), banUser(deps));
  router.post("/admin/users/:id/unban", admin, unbanUser(deps));
  router.post("/admin/users/:id/revoke-sessions", admin, revokeSessions(deps));
  router.post("/admin/users/:id/password-reset", admin, sendPasswordReset(deps));
  router.get("/admin/audit", admin, validateQuery(adminAuditQuerySchema), listAudit(db));
  router.get("/admin/coaching", admin, coachingOverview(db));
  return router;
}
