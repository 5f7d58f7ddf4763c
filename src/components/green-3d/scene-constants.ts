// Sizes and colours of the 3D greens (green-scene.tsx, surface-scene.tsx). The ball and the hole are the physics'
// own (physics/constants.ts, the one source), so the scene draws the hole the capture test uses.
export { BALL_RADIUS_M, HOLE_RADIUS_M } from "../../../physics/constants";

/** Flagstick height, m (about 7 ft, common practice). */
export const FLAGSTICK_M = 2.13;
/** A golfer's eye height for the camera behind the ball, m. */
export const EYE_HEIGHT_M = 1.6;
/** How far behind the ball the "behind the ball" camera stands, m. */
export const BEHIND_M = 1.6;
/** Height of the pin that marks an aim spot, m. */
export const PIN_M = 0.3;
export const SKY = "#dce6df";
