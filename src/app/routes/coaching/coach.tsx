import { RequireAuth } from "../../../features/auth/components/require-auth";
import { CoachDashboard } from "../../../features/coaching/components/coach-dashboard";

export function CoachRoute() {
  return (
    <>
      <title>Coach dashboard · Borrowline</title>
      <RequireAuth roles={["coach", "admin"]}>
        <CoachDashboard />
      </RequireAuth>
    </>
  );
}

export { CoachRoute as Component };
