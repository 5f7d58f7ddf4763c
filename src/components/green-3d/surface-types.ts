// What the 3D view of a height map draws. Green frame (x east, y north, metres); see surface-grid.ts.
import type { HeightMapGrid } from "./surface-grid";
import type { CameraView } from "./scene-types";

export type SurfaceSceneProps = {
  map: HeightMapGrid;
  ball: readonly [number, number] | null;
  hole: readonly [number, number] | null;
  /** Where the start line passes the hole. */
  aim: readonly [number, number] | null;
  /** The ball's path. */
  line: ReadonlyArray<readonly [number, number]> | null;
  contourIntervalM: number | null;
  /** Heights drawn this many times taller (1 = true). */
  exaggeration?: number;
  view: CameraView;
  viewKey?: number;
  /** For screen readers. */
  label: string;
};
