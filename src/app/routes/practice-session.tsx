import { useParams } from "react-router";
import { RequireAuth } from "../../features/auth/components/require-auth";
import { SessionLogPage } from "../../features/practice/components/session-log-page";

// No practice tabs here: on the green the screen is for logging only.
export function PracticeSessionRoute() {
  const { sessionId = "" } = useParams();
  return (
    <RequireAuth>
      <SessionLogPage key={sessionId} sessionId={sessionId} />
    </RequireAuth>
  );
}

export { PracticeSessionRoute as Component };
