import { useParams } from "react-router";
import { useMe } from "../../features/auth/api/get-me";
import { RequireAuth } from "../../features/auth/components/require-auth";
import { GreenPage } from "../../features/practice/components/green-page";
import { PracticeNav } from "../layout/practice-nav";

export function GreenRoute() {
  const { greenId = "" } = useParams();
  // Only a coach (or an admin) has squads to share a green with.
  const role = useMe().data?.user.role;
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <GreenPage key={greenId} greenId={greenId} canShare={role === "coach" || role === "admin"} />
      </RequireAuth>
    </>
  );
}

export { GreenRoute as Component };
