import { RequireAuth } from "../../../features/auth/components/require-auth";
import { LaddersPage } from "../../../features/coaching/components/ladders-page";

export function LaddersRoute() {
  return (
    <>
      <title>Ladders · Borrowline</title>
      <RequireAuth roles={["coach", "admin"]}>
        <LaddersPage />
      </RequireAuth>
    </>
  );
}

export { LaddersRoute as Component };
