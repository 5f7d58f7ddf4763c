import { RequireAuth } from "../../features/auth/components/require-auth";
import { PracticePage } from "../../features/practice/components/practice-page";
import { PracticeNav } from "../layout/practice-nav";

export function PracticeRoute() {
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <PracticePage />
      </RequireAuth>
    </>
  );
}

export { PracticeRoute as Component };
