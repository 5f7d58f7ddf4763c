import { RequireAuth } from "../../features/auth/components/require-auth";
import { PracticePlanPage } from "../../features/practice-plan/components/plan-page";
import { PracticeNav } from "../layout/practice-nav";

export function PracticePlanRoute() {
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <PracticePlanPage />
      </RequireAuth>
    </>
  );
}

export { PracticePlanRoute as Component };
