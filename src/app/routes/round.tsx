import { useParams } from "react-router";
import { RequireAuth } from "../../features/auth/components/require-auth";
import { RoundPage } from "../../features/practice/components/round-page";

// No practice tabs here: on the course the screen is for entering holes only.
export function RoundRoute() {
  const { roundId = "" } = useParams();
  return (
    <RequireAuth>
      <RoundPage key={roundId} roundId={roundId} />
    </RequireAuth>
  );
}

export { RoundRoute as Component };
