// What the 3D scene and its flat fallback draw. Putt frame, SI (see frame.ts).
import type { UnitSystem } from "../../../shared/units";

/** The aim spot stays within this far of the hole, m (the API's limit too). */
export const AIM_LIMIT_M = 8;

export type LineStyle = "chosen" | "dying" | "firm" | "yours" | "truth";

export type SceneLine = { id: string; path: readonly (readonly [number, number])[]; style: LineStyle; label?: string };
/** An aim spot at the hole's distance, `xM` to the side (+ right); drawn with a dashed start line from the ball. */
export type SceneAim = {
  id: string;
  xM: number;
  style: LineStyle;
  label?: string;
  /** where the label sits, so labels of near spots do not overlap */ labelSide?: "left" | "right" | "up";
};
export type ScenePutt = { distanceM: number; slopePct: number; fallLineDeg: number };

/** A roll to replay: timed samples from simulateRoll; `holeTimeS` when the ball drops. */
export type Replay = {
  key: number;
  rate: number;
  timeS: readonly number[];
  xM: readonly number[];
  yM: readonly number[];
  holeTimeS: number | null;
};

export type CameraView = "free" | "behind" | "above";

export type GreenSceneProps = {
  putt: ScenePutt;
  units: UnitSystem;
  lines: SceneLine[];
  aims: SceneAim[];
  /** Where a ball came to rest (hole covered), drawn as a ball. */
  restMarkers?: { id: string; xM: number; yM: number; style: LineStyle }[];
  contourIntervalM: number | null;
  exaggeration?: number;
  view: CameraView;
  /** Changes when a view button is pressed again, so the camera returns even if the view is the same. */
  viewKey?: number;
  replay?: Replay | null;
  /** Training: dragging the aim spot or tapping the green sets the aim (x at the hole's distance). */
  onAimChange?: (xM: number) => void;
  /** Label for the canvas, read by screen readers. */
  label: string;
};

/** Colours of our own: on a green surface, warm yellow for dying, deep blue for firm, coral for the chosen line. */
export const LINE_COLOURS: Record<LineStyle, string> = {
  chosen: "#e05a36",
  dying: "#f5c842",
  firm: "#2f5fd0",
  yours: "#ffffff",
  truth: "#e05a36",
};

export const LINE_NAMES: Record<LineStyle, string> = {
  chosen: "Your pace",
  dying: "Dying",
  firm: "Firm",
  yours: "Your read",
  truth: "True line",
};
