// The ball of the planar 3D green: at address, or replaying a timed roll (sampled per frame with frame.ts's
// sampleAtTime into the mesh's position: refs only, nothing allocated per frame).
import { useEffect, useMemo, useRef } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import type * as THREE from "three";
import { fallVector, sampleAtTime, surfacePoint, type PuttPlane } from "./frame";
import { BALL_RADIUS_M } from "./scene-constants";
import type { Replay, ScenePutt } from "./scene-types";

/** The ball: at address, or replaying a timed roll (sampled per frame into the mesh's position, no React state). */
export function RollingBall({ putt, plane, replay }: { putt: ScenePutt; plane: PuttPlane; replay: Replay | null }) {
  const ball = useRef<THREE.Mesh>(null);
  const clock = useRef(0);
  const playing = useRef(false);
  const hint = useRef(0);
  // One result object reused across frames.
  const sampled = useRef({ x: 0, y: 0, index: 0 });
  const invalidate = useThree((s) => s.invalidate);
  // Constants of the height function, so the frame loop allocates nothing.
  const k = useMemo(() => {
    const [ux, uy] = fallVector(plane.fallLineDeg);
    const t = (plane.slopePct / 100) * (plane.exaggeration ?? 1);
    return { ux, uy, t };
  }, [plane]);

  const place = (x: number, y: number, drop = 0) => {
    const h = -k.t * (x * k.ux + y * k.uy);
    ball.current?.position.set(x, h + BALL_RADIUS_M - drop, y === 0 ? 0 : -y);
  };

  useEffect(() => {
    clock.current = 0;
    hint.current = 0;
    playing.current = replay !== null;
    if (!replay) place(0, 0);
    invalidate();
    // place depends only on k, which follows plane.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [replay, k, invalidate]);

  useFrame((state, delta) => {
    if (!playing.current || !replay) return;
    clock.current += Math.min(delta, 0.1) * replay.rate;
    const t = clock.current;
    const { timeS, xM, yM, holeTimeS } = replay;
    if (holeTimeS !== null && t >= holeTimeS) {
      const sink = Math.min((t - holeTimeS) / 0.18, 1);
      place(0, putt.distanceM, sink * (2 * BALL_RADIUS_M + 0.01));
      if (sink >= 1) playing.current = false;
    } else {
      const s = sampleAtTime(timeS, xM, yM, t, hint.current, sampled.current);
      hint.current = s.index;
      place(s.x, s.y);
      if (t >= timeS[timeS.length - 1]!) playing.current = false;
    }
    if (playing.current) state.invalidate();
  });

  return (
    <mesh ref={ball} position={surfacePoint(0, 0, plane, BALL_RADIUS_M)}>
      <sphereGeometry args={[BALL_RADIUS_M, 28, 20]} />
      <meshStandardMaterial color="#ffffff" roughness={0.35} />
    </mesh>
  );
}
