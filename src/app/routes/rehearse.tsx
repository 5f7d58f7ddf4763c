import { RehearsePage } from "../../features/rehearse/components/rehearse-page";

// The 3D scene inside is loaded lazily (src/components/green-3d/green-view.tsx), so three.js stays out of this chunk.
export function RehearseRoute() {
  return <RehearsePage />;
}

export { RehearseRoute as Component };
