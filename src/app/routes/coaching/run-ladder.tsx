import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { RunPage } from "../../../features/coaching/components/run-page";

// Any signed-in role: the player runs it; the coach who gave it may look (the server decides who may log putts).
export function RunLadderRoute() {
  const { assignmentId = "" } = useParams();
  return (
    <RequireAuth>
      <RunPage assignmentId={assignmentId} />
    </RequireAuth>
  );
}

export { RunLadderRoute as Component };
