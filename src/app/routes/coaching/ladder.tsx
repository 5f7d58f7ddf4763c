import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { LadderPage } from "../../../features/coaching/components/ladder-page";

export function LadderRoute() {
  const { ladderId = "" } = useParams();
  return (
    <RequireAuth roles={["coach", "admin"]}>
      <LadderPage ladderId={ladderId} />
    </RequireAuth>
  );
}

export { LadderRoute as Component };
