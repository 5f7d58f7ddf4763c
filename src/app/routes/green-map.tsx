import { useParams } from "react-router";
import { RequireAuth } from "../../features/auth/components/require-auth";
import { GreenMapPage } from "../../features/green-maps/components/green-map-page";

// The 3D view inside is loaded lazily (src/components/green-3d/surface-view.tsx), so three.js stays out of this chunk.
export function GreenMapRoute() {
  const { greenId = "" } = useParams();
  return (
    <RequireAuth>
      <GreenMapPage key={greenId} greenId={greenId} />
    </RequireAuth>
  );
}

export { GreenMapRoute as Component };
