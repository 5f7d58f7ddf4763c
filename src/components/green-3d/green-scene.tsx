// The 3D green. This module (and three.js with it) is only reached through a lazy import, so the first page never
// downloads it. Motion follows the house rules: the frame loop mutates refs (camera, ball), never React state; the
// paths come in computed once and are only sampled per frame. Its pieces: green-parts.tsx (surface, contours, hole,
// aim spots, lines), rolling-ball.tsx, camera-rig.tsx, scene-labels.tsx; sizes in scene-constants.ts.
import { useEffect, useMemo, useRef } from "react";
import { Canvas, useThree, type ThreeEvent } from "@react-three/fiber";
import { OrbitControls } from "@react-three/drei";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { CameraRig, frameBox } from "./camera-rig";
import { greenShape, surfacePoint, type PuttPlane } from "./frame";
import { AimSpot, Contours, GreenSurface, Hole, PuttLine } from "./green-parts";
import { RollingBall } from "./rolling-ball";
import { BALL_RADIUS_M, SKY } from "./scene-constants";
import { LabelProjector, sceneLabels } from "./scene-labels";
import { AIM_LIMIT_M, LINE_COLOURS, type GreenSceneProps } from "./scene-types";

export default function GreenScene(props: GreenSceneProps) {
  const labels = useMemo(() => sceneLabels(props), [props]);
  const labelEls = useRef(new Map<string, HTMLElement>());
  return (
    <div role="img" aria-label={props.label} className="relative size-full">
      <Canvas
        // preserveDrawingBuffer lets a test (or a "save image") read the pixels back.
        gl={{ preserveDrawingBuffer: true, antialias: true }}
        frameloop="demand"
        dpr={[1, 2]}
        camera={{ fov: 50, near: 0.02, far: 400, position: [0, 2, 3] }}
        onCreated={({ gl }) => gl.setClearColor(SKY)}
      >
        <SceneContents {...props} />
        <LabelProjector labels={labels} els={labelEls} />
      </Canvas>
      {/* Labels are plain DOM over the canvas (no extra React roots); the frame loop moves them. */}
      <div aria-hidden="true" className="pointer-events-none absolute inset-0 overflow-hidden">
        {labels.map((l) => (
          <div
            key={l.id}
            ref={(el) => {
              if (el) labelEls.current.set(l.id, el);
              else labelEls.current.delete(l.id);
            }}
            className="absolute top-0 left-0"
            style={{ visibility: "hidden" }}
          >
            <span
              data-scene-label={l.id}
              className={`block rounded-md px-2 py-0.5 text-xs font-semibold whitespace-nowrap select-none ${l.tone === "light" ? "bg-sand-50/90 text-ink-900" : "bg-ink-900/85 text-sand-50"}`}
            >
              {l.colour ? <span className="mr-1 inline-block size-2 rounded-full" style={{ background: l.colour }} /> : null}
              {l.text}
            </span>
          </div>
        ))}
      </div>
    </div>
  );
}

function SceneContents(props: GreenSceneProps) {
  const { putt, lines, aims, restMarkers = [], contourIntervalM, exaggeration = 1, onAimChange } = props;
  const plane: PuttPlane = useMemo(
    () => ({ slopePct: putt.slopePct, fallLineDeg: putt.fallLineDeg, exaggeration }),
    [putt.slopePct, putt.fallLineDeg, exaggeration],
  );
  const shape = useMemo(() => greenShape(putt.distanceM), [putt.distanceM]);
  const dragging = useRef(false);
  const get = useThree((s) => s.get);
  // Orbiting pauses while the aim spot is dragged (R3F's pointer handlers run before OrbitControls' own).
  const setOrbit = (on: boolean) => {
    const controls = get().controls as OrbitControlsImpl | null;
    if (controls) controls.enabled = on;
  };

  useEffect(() => {
    const stop = () => {
      if (!dragging.current) return;
      dragging.current = false;
      const controls = get().controls as OrbitControlsImpl | null;
      if (controls) controls.enabled = true;
    };
    window.addEventListener("pointerup", stop);
    window.addEventListener("pointercancel", stop);
    return () => {
      window.removeEventListener("pointerup", stop);
      window.removeEventListener("pointercancel", stop);
    };
  }, [get]);

  const clampAim = (x: number) => Math.max(-AIM_LIMIT_M, Math.min(AIM_LIMIT_M, x));
  const surfaceEvents = onAimChange
    ? {
        onPointerMove: (e: ThreeEvent<PointerEvent>) => {
          if (dragging.current) onAimChange(clampAim(e.point.x));
        },
        onClick: (e: ThreeEvent<MouseEvent>) => {
          // A tap places the aim spot; a drag that orbited the camera does not.
          if (e.delta < 6) onAimChange(clampAim(e.point.x));
        },
      }
    : {};
  const startDrag = (e: ThreeEvent<PointerEvent>) => {
    e.stopPropagation();
    dragging.current = true;
    setOrbit(false);
  };

  return (
    <>
      <ambientLight intensity={1.6} />
      <directionalLight position={[-3, 8, 4]} intensity={2.2} />
      <GreenSurface shape={shape} plane={plane} events={surfaceEvents} />
      <Contours shape={shape} plane={plane} intervalM={contourIntervalM} />
      <Hole putt={putt} plane={plane} />
      {aims.map((a) => (
        <AimSpot key={a.id} aim={a} putt={putt} plane={plane} onGrab={onAimChange && a.style === "yours" ? startDrag : undefined} />
      ))}
      {lines.map((l) => (
        <PuttLine key={l.id} line={l} plane={plane} />
      ))}
      {restMarkers.map((r) => (
        <mesh key={r.id} position={surfacePoint(r.xM, r.yM, plane, BALL_RADIUS_M)}>
          <sphereGeometry args={[BALL_RADIUS_M, 20, 14]} />
          <meshStandardMaterial color={LINE_COLOURS[r.style]} roughness={0.5} />
        </mesh>
      ))}
      <RollingBall putt={putt} plane={plane} replay={props.replay ?? null} />
      <CameraRig putt={putt} box={frameBox(putt, lines, aims)} plane={plane} view={props.view} viewKey={props.viewKey ?? 0} />
      <OrbitControls makeDefault enableDamping={false} maxPolarAngle={Math.PI / 2 - 0.05} minDistance={0.4} maxDistance={60} />
    </>
  );
}
