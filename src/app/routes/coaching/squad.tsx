import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { SquadPage } from "../../../features/coaching/components/squad-page";

export function SquadRoute() {
  const { squadId = "" } = useParams();
  return (
    <RequireAuth roles={["coach", "admin"]}>
      <SquadPage squadId={squadId} />
    </RequireAuth>
  );
}

export { SquadRoute as Component };
