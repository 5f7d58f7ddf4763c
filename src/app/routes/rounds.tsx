import { RequireAuth } from "../../features/auth/components/require-auth";
import { RoundsPage } from "../../features/practice/components/rounds-page";
import { PracticeNav } from "../layout/practice-nav";

export function RoundsRoute() {
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <RoundsPage />
      </RequireAuth>
    </>
  );
}

export { RoundsRoute as Component };
