import { useParams } from "react-router";
import { RequireAuth } from "../../features/auth/components/require-auth";
import { GreenPage } from "../../features/practice/components/green-page";
import { PracticeNav } from "../layout/practice-nav";

export function GreenRoute() {
  const { greenId = "" } = useParams();
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <GreenPage key={greenId} greenId={greenId} />
      </RequireAuth>
    </>
  );
}

export { GreenRoute as Component };
