import { RequireAuth } from "../../../features/auth/components/require-auth";
import { AdminCoachingPage } from "../../../features/admin/components/coaching-page";

export function AdminCoachingRoute() {
  return (
    <RequireAuth roles={["admin"]}>
      <AdminCoachingPage />
    </RequireAuth>
  );
}

export { AdminCoachingRoute as Component };
