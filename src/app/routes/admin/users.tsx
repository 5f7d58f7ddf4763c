import { RequireAuth } from "../../../features/auth/components/require-auth";
import { AdminUsersPage } from "../../../features/admin/components/users-page";

export function AdminUsersRoute() {
  return <RequireAuth roles={["admin"]}>{(me) => <AdminUsersPage me={me.user.id} />}</RequireAuth>;
}

export { AdminUsersRoute as Component };
