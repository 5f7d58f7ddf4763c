import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { PlayerPage } from "../../../features/coaching/components/player-page";

export function CoachPlayerRoute() {
  const { playerId = "" } = useParams();
  return (
    <RequireAuth roles={["coach", "admin"]}>
      <PlayerPage playerId={playerId} />
    </RequireAuth>
  );
}

export { CoachPlayerRoute as Component };
