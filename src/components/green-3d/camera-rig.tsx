// The camera of the planar 3D green: the named views (behind the ball, above, free), framed on the putt, and the
// move between them (refs only; the player's own orbiting cancels it).
import { useEffect, useRef } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import * as THREE from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { surfacePoint, type PuttPlane } from "./frame";
import { BEHIND_M, EYE_HEIGHT_M } from "./scene-constants";
import type { CameraView, GreenSceneProps, ScenePutt } from "./scene-types";

type CameraGoal = { position: THREE.Vector3; target: THREE.Vector3 };

/** The part of the green worth framing from above: ball, hole, every line and aim spot, with a margin (putt frame). */
export type FrameBox = { minX: number; maxX: number; minY: number; maxY: number };

export function frameBox(putt: ScenePutt, lines: GreenSceneProps["lines"], aims: GreenSceneProps["aims"]): FrameBox {
  let minX = -0.3;
  let maxX = 0.3;
  let minY = -0.5;
  let maxY = putt.distanceM + 0.6;
  for (const l of lines) {
    for (const [x, y] of l.path) {
      minX = Math.min(minX, x);
      maxX = Math.max(maxX, x);
      minY = Math.min(minY, y);
      maxY = Math.max(maxY, y);
    }
  }
  for (const a of aims) {
    minX = Math.min(minX, a.xM);
    maxX = Math.max(maxX, a.xM);
  }
  const m = 0.12 * Math.max(maxY - minY, maxX - minX);
  return { minX: minX - m, maxX: maxX + m, minY: minY - m * 0.5, maxY: maxY + m * 0.5 };
}

function cameraGoal(view: CameraView, putt: ScenePutt, box: FrameBox, plane: PuttPlane, aspect: number, fovDeg: number): CameraGoal {
  const D = putt.distanceM;
  const at = (x: number, y: number, lift: number) => new THREE.Vector3(...surfacePoint(x, y, plane, lift));
  if (view === "behind") {
    // Standing behind the ball at eye height, looking along the line ball → hole, tipped down so the ball sits in
    // the lower part of the picture and the hole, its pin and label in the upper part: within 22° below and 20°
    // above the centre of the 50° vertical field.
    const depressionBall = Math.atan2(EYE_HEIGHT_M, BEHIND_M);
    const depressionHole = Math.atan2(EYE_HEIGHT_M, BEHIND_M + D);
    const deg = Math.PI / 180;
    const pitch = Math.min(Math.max(0.58 * depressionBall + 0.42 * depressionHole, depressionBall - 22 * deg), depressionHole + 20 * deg);
    return { position: at(0, -BEHIND_M, EYE_HEIGHT_M), target: at(0, -BEHIND_M + EYE_HEIGHT_M / Math.tan(pitch), 0) };
  }
  if (view === "above") {
    const half = Math.tan(((fovDeg / 2) * Math.PI) / 180);
    const cx = (box.minX + box.maxX) / 2;
    const cy = (box.minY + box.maxY) / 2;
    const h = Math.max((box.maxY - box.minY) / 2 / half, (box.maxX - box.minX) / 2 / (half * aspect));
    // A hair toward the ball so "up" on screen is toward the hole.
    return { position: at(cx, cy - 0.001 * h, h), target: at(cx, cy, 0) };
  }
  // Free view: behind and a little to the left of the ball, high enough to see the curve, framing the putt itself.
  const back = 0.35 * D + 1.4;
  return { position: at(-0.3 * D - 0.5, -back, 0.3 * D + 1.5), target: at(0, 0.5 * D, 0) };
}

/** Moves the camera to a named view over 0.6 s (refs only); the user's own orbiting cancels the move. */
export function CameraRig({
  putt,
  box,
  plane,
  view,
  viewKey,
}: {
  putt: ScenePutt;
  box: FrameBox;
  plane: PuttPlane;
  view: CameraView;
  viewKey: number;
}) {
  const camera = useThree((s) => s.camera) as THREE.PerspectiveCamera;
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const aspect = useThree((s) => s.size.width / Math.max(1, s.size.height));
  const invalidate = useThree((s) => s.invalidate);
  const anim = useRef<{ from: CameraGoal; to: CameraGoal; t: number } | null>(null);
  const first = useRef(true);
  const scratch = useRef({ p: new THREE.Vector3(), q: new THREE.Vector3() });
  // The framing is read when a view is asked for, not followed: moving the pace must not move the camera.
  const boxRef = useRef(box);
  useEffect(() => {
    boxRef.current = box;
  });

  useEffect(() => {
    if (!controls) return;
    const goal = cameraGoal(view, putt, boxRef.current, plane, aspect, camera.fov);
    if (first.current) {
      first.current = false;
      camera.position.copy(goal.position);
      controls.target.copy(goal.target);
      controls.update();
      invalidate();
      return;
    }
    anim.current = { from: { position: camera.position.clone(), target: controls.target.clone() }, to: goal, t: 0 };
    invalidate();
    // Recompute when the view is asked for again or the putt changes shape; not on every small aspect change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [view, viewKey, controls, putt.distanceM, plane]);

  useEffect(() => {
    if (!controls) return;
    const cancel = () => {
      anim.current = null;
    };
    controls.addEventListener("start", cancel);
    return () => controls.removeEventListener("start", cancel);
  }, [controls]);

  useFrame((state, delta) => {
    const a = anim.current;
    if (!a || !controls) return;
    a.t = Math.min(1, a.t + delta / 0.6);
    const e = a.t < 0.5 ? 2 * a.t * a.t : 1 - (-2 * a.t + 2) ** 2 / 2;
    const { p, q } = scratch.current;
    camera.position.copy(p.copy(a.from.position).lerp(a.to.position, e));
    controls.target.copy(q.copy(a.from.target).lerp(a.to.target, e));
    controls.update();
    if (a.t >= 1) anim.current = null;
    else state.invalidate();
  });
  return null;
}
