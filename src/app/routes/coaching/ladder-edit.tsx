import { useParams } from "react-router";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { LadderEditPage } from "../../../features/coaching/components/ladder-edit-page";

// /ladders/new and /ladders/:ladderId/edit: the ladder builder.
export function LadderEditRoute() {
  const { ladderId } = useParams();
  return (
    <RequireAuth roles={["coach", "admin"]}>
      <LadderEditPage key={ladderId ?? "new"} ladderId={ladderId} />
    </RequireAuth>
  );
}

export { LadderEditRoute as Component };
