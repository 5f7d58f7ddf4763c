import { z } from "zod";
import { timestampSchema } from "./common";
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

export const adminUserSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: z.string(),
  emailVerified: z.boolean(),
  banned: z.boolean(),
  banReason: z.string().nullable(),
  createdAt: timestampSchema,
});
export type AdminUser = z.output<typeof adminUserSchema>;
export const adminUsersSchema = z.object({
  users: z.array(adminUserSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type AdminUsers = z.output<typeof adminUsersSchema>;
export const auditEntrySchema = z.object({
  id: z.string(),
  actor: z.object({ id: z.string(), email: z.string() }),
  action: z.enum(ADMIN_ACTIONS),
  target: z.object({ id: z.string().nullable(), email: z.string().nullable() }),
  detail: z.record(z.string(), z.unknown()).nullable(),
  createdAt: timestampSchema,
});
export type AuditEntry = z.output<typeof auditEntrySchema>;
export const auditPageSchema = z.object({
  entries: z.array(auditEntrySchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
const owner = z.object({ id: z.string(), name: z.string(), email: z.string() });
export const adminCoachingSchema = z.object({
  squads: z.array(z.object({ id: z.string(), name: z.string(), owner, members: z.number().int(), createdAt: timestampSchema })),
  ladders: z.array(z.object({ id: z.string(), name: z.string(), owner, rungs: z.number().int(), createdAt: timestampSchema })),
});
export type AdminCoaching = z.output<typeof adminCoachingSchema>;
