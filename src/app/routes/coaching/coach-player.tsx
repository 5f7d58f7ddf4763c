import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { PlayerPage } from "../../../features/coaching/components/player-page";
import { StatsBody } from "../../../features/stats/components/stats-page";

// The coach's view of a player composes two features: coaching (notes, ladders) and stats (the player's
// make rates, trend, comparison, strokes gained and misses, read through ?playerId=).
export function CoachPlayerRoute() {
  const { playerId = "" } = useParams();
  return (
    <RequireAuth roles={["coach", "admin"]}>
      <PlayerPage playerId={playerId} stats={(player) => <StatsBody player={player} />} />
    </RequireAuth>
  );
}

export { CoachPlayerRoute as Component };
