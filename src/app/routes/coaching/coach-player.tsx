import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { PlayerPage } from "../../../features/coaching/components/player-page";
import { PracticePlanView } from "../../../features/practice-plan/components/plan-view";
import { StatsBody } from "../../../features/stats/components/stats-page";

// The coach's view of a player composes three features: coaching (notes, ladders), the practice plan (adopt it into
// the ladder library) and stats (the player's make rates, trend, comparison, strokes gained and misses, read through
// ?playerId=).
export function CoachPlayerRoute() {
  const { playerId = "" } = useParams();
  return (
    <RequireAuth roles={["coach", "admin"]}>
      <PlayerPage
        playerId={playerId}
        stats={(player) => (
          <>
            <PracticePlanView playerId={player.id} mode="coach" />
            <StatsBody player={player} />
          </>
        )}
      />
    </RequireAuth>
  );
}

export { CoachPlayerRoute as Component };
