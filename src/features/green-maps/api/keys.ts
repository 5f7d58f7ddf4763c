// Query keys for green height maps. Upload and a walked map's save invalidate `greenMapsKeys.green(id)`, which holds
// both the green (whose hasHeightMap turns true and so enables the map's query) and its map; surface reads sit under
// it too, so a new map never answers with an old surface's read. Delete sets the map to null and asks the green again.
import type { SurfaceSolveRequest } from "#shared/schemas/height-map";

export const greenMapsKeys = {
  all: ["green-maps"] as const,
  green: (greenId: string) => [...greenMapsKeys.all, greenId] as const,
  details: (greenId: string) => [...greenMapsKeys.green(greenId), "details"] as const,
  heightMap: (greenId: string) => [...greenMapsKeys.green(greenId), "height-map"] as const,
  solve: (greenId: string, input: SurfaceSolveRequest | null) => [...greenMapsKeys.green(greenId), "solve", input] as const,
};
