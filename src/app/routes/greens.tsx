import { RequireAuth } from "../../features/auth/components/require-auth";
import { GreensPage } from "../../features/practice/components/greens-page";
import { PracticeNav } from "../layout/practice-nav";

export function GreensRoute() {
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <GreensPage />
      </RequireAuth>
    </>
  );
}

export { GreensRoute as Component };
