// The admin screens' API (server/routes/admin): users through better-auth's admin plugin, the audit list,
// and every coach's squads and ladders.
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AdminCoaching, AdminUser, AdminUsers, AuditEntry } from "#shared/schemas/admin";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";

export type { AdminCoaching, AdminUser, AdminUsers, AuditEntry };
export type UsersQuery = { search?: string; field: "email" | "name"; role?: "player" | "coach" | "admin"; page: number };
export type AdminActionName = "role" | "ban" | "unban" | "revoke-sessions" | "password-reset";

export const adminKeys = {
  all: ["admin"] as const,
  users: (q: UsersQuery) => [...adminKeys.all, "users", q] as const,
  audit: (page: number) => [...adminKeys.all, "audit", page] as const,
  coaching: () => [...adminKeys.all, "coaching"] as const,
};

export function usersQueryOptions(q: UsersQuery) {
  return queryOptions({
    queryKey: adminKeys.users(q),
    queryFn: ({ signal }) => api.get<AdminUsers>(apiPaths.adminUsers, { query: { ...q, search: q.search || undefined }, signal }),
    placeholderData: keepPreviousData,
  });
}
export const useAdminUsers = (q: UsersQuery) => useQuery(usersQueryOptions(q));

export const useAudit = (page: number) =>
  useQuery({
    queryKey: adminKeys.audit(page),
    queryFn: ({ signal }) =>
      api.get<{ entries: AuditEntry[]; total: number; page: number; pageSize: number }>(apiPaths.adminAudit, { query: { page }, signal }),
    placeholderData: keepPreviousData,
  });

export const useAdminCoaching = () =>
  useQuery({ queryKey: adminKeys.coaching(), queryFn: ({ signal }) => api.get<AdminCoaching>(apiPaths.adminCoaching, { signal }) });

/** One admin action on one account; every list of the admin screens is refreshed after it (the audit too). */
export function useAdminAction() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, action, body }: { userId: string; action: AdminActionName; body?: unknown }) =>
      api.post<AdminUser | undefined>(apiPaths.adminUserAction(userId, action), body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.all }),
  });
}
