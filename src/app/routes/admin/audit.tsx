import { RequireAuth } from "../../../features/auth/components/require-auth";
import { AdminAuditPage } from "../../../features/admin/components/audit-page";

export function AdminAuditRoute() {
  return (
    <RequireAuth roles={["admin"]}>
      <AdminAuditPage />
    </RequireAuth>
  );
}

export { AdminAuditRoute as Component };
