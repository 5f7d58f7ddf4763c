import { z } from "zod";
import { SIGN_UP_ROLES } from "../roles";
import { ROLES } from "../roles";
import { plainText } from "./text";

/** GET /api/admin/users: search one field (contains, case as stored), optional role filter, pages of 25. */
export const adminUsersQuerySchema = z
  .object({
    search: plainText(100).optional(),
    field: z.enum(["email", "name"]).default("email"),
    role: z.enum(ROLES).optional(),
    page: z.coerce.number().int().min(1).max(10_000).default(1),
  })
  .strict();
export type AdminUsersQuery = z.infer<typeof adminUsersQuerySchema>;
export const ADMIN_PAGE_SIZE = 25;

/** POST /api/admin/users/:id/role: only between player and coach (admins come from the CLI). */
export const adminRoleInputSchema = z.object({ role: z.enum(SIGN_UP_ROLES, { message: "role must be player or coach" }) }).strict();
export const adminBanInputSchema = z.object({ reason: plainText(200).optional() }).strict();
export const adminAuditQuerySchema = z.object({ page: z.coerce.number().int().min(1).max(10_000).default(1) }).strict();

export const ADMIN_ACTIONS = ["role.set", "user.ban", "user.unban", "sessions.revoke", "password-reset.send"] as const;
export type AdminAction = (typeof ADMIN_ACTIONS)[number];

export type AdminUser = {
  id: string;
  name: string;
  email: string;
  role: string;
  emailVerified: boolean;
  banned: boolean;
  banReason: string | null;
  createdAt: string;
};
export type AdminUsers = { users: AdminUser[]; total: number; page: number; pageSize: number };
export type AuditEntry = {
  id: string;
  actor: { id: string; email: string };
  action: AdminAction;
  target: { id: string | null; email: string | null };
  detail: Record<string, unknown> | null;
  createdAt: string;
};
export type AdminCoaching = {
  squads: { id: string; name: string; owner: { id: string; name: string; email: string }; members: number; createdAt: string }[];
  ladders: { id: string; name: string; owner: { id: string; name: string; email: string }; rungs: number; createdAt: string }[];
};
