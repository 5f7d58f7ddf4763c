import { useParams } from "react-router";
import { JoinPage } from "../../../features/coaching/components/join-page";

// Public: the invitation link works before anyone signs in.
export function JoinRoute() {
  const { token = "" } = useParams();
  return <JoinPage token={token} />;
}

export { JoinRoute as Component };
