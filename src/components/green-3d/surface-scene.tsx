// The 3D view of a real green from its height map. Like green-scene.tsx, this module (and three.js with it) is only
// reached through a lazy import. The mesh, its height colours and the contour lines come from surface-grid.ts (pure);
// here they only become three.js objects. The camera moves when a view is asked for, never per frame from React.
import { useEffect, useMemo } from "react";
import { Canvas, useThree } from "@react-three/fiber";
import { Line, OrbitControls } from "@react-three/drei";
import * as THREE from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { surfaceFromGrid } from "../../../physics";
import { contourLines, greenToScene, heightRaster, surfaceMesh, type HeightRaster } from "./surface-grid";
import { BALL_RADIUS_M, EYE_HEIGHT_M, FLAGSTICK_M, HOLE_RADIUS_M, SKY } from "./scene-constants";
import { LINE_COLOURS } from "./scene-types";
import type { SurfaceSceneProps } from "./surface-types";

export default function SurfaceScene(props: SurfaceSceneProps) {
  return (
    <div role="img" aria-label={props.label} className="relative size-full">
      <Canvas
        gl={{ preserveDrawingBuffer: true, antialias: true }}
        frameloop="demand"
        dpr={[1, 2]}
        camera={{ fov: 50, near: 0.02, far: 600, position: [0, 8, 12] }}
        onCreated={({ gl }) => gl.setClearColor(SKY)}
      >
        <SurfaceContents {...props} />
      </Canvas>
    </div>
  );
}

function SurfaceContents({ map, ball, hole, aim, line, contourIntervalM, exaggeration = 1, view, viewKey = 0 }: SurfaceSceneProps) {
  const surface = useMemo(() => surfaceFromGrid(map), [map]);
  const raster = useMemo(() => heightRaster(map, 128, surface), [map, surface]);
  const at = useMemo(
    () =>
      (x: number, y: number, lift = 0): [number, number, number] => {
        const p = greenToScene(x, y, surface.heightAt(x, y), raster, exaggeration);
        return [p[0], p[1] + lift, p[2]];
      },
    [surface, raster, exaggeration],
  );
  const linePoints = useMemo(() => (line && line.length > 1 ? line.map(([x, y]) => at(x, y, 0.008)) : null), [line, at]);

  return (
    <>
      <ambientLight intensity={1.6} />
      <directionalLight position={[-3, 8, 4]} intensity={2.2} />
      <Ground raster={raster} />
      <SurfaceMesh raster={raster} exaggeration={exaggeration} />
      <Contours raster={raster} intervalM={contourIntervalM} at={at} />
      {ball && aim ? (
        <Line
          points={[at(ball[0], ball[1], 0.006), at(aim[0], aim[1], 0.006)]}
          color="#ffffff"
          lineWidth={2}
          dashed
          dashSize={0.12}
          gapSize={0.1}
        />
      ) : null}
      {linePoints ? <Line points={linePoints} color={LINE_COLOURS.chosen} lineWidth={4.5} /> : null}
      {hole ? <Hole at={at(hole[0], hole[1])} /> : null}
      {ball ? (
        <mesh position={at(ball[0], ball[1], BALL_RADIUS_M)}>
          <sphereGeometry args={[BALL_RADIUS_M, 24, 16]} />
          <meshStandardMaterial color="#ffffff" roughness={0.35} />
        </mesh>
      ) : null}
      <CameraRig raster={raster} ball={ball} hole={hole} at={at} view={view} viewKey={viewKey} />
      <OrbitControls makeDefault enableDamping={false} maxPolarAngle={Math.PI / 2 - 0.05} minDistance={0.4} maxDistance={120} />
    </>
  );
}

function Ground({ raster }: { raster: HeightRaster }) {
  const { bounds } = raster;
  const r = Math.hypot(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY) * 3;
  return (
    <mesh position={[0, -0.05, 0]} rotation={[-Math.PI / 2, 0, 0]}>
      <circleGeometry args={[r, 48]} />
      <meshBasicMaterial color="#6f8f5e" />
    </mesh>
  );
}

function SurfaceMesh({ raster, exaggeration }: { raster: HeightRaster; exaggeration: number }) {
  const geometry = useMemo(() => {
    const mesh = surfaceMesh(raster, exaggeration);
    const g = new THREE.BufferGeometry();
    g.setAttribute("position", new THREE.BufferAttribute(mesh.positions, 3));
    g.setAttribute("color", new THREE.BufferAttribute(mesh.colours, 3));
    g.setIndex(new THREE.BufferAttribute(mesh.index, 1));
    return g;
  }, [raster, exaggeration]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  return (
    <mesh geometry={geometry}>
      <meshBasicMaterial vertexColors side={THREE.DoubleSide} />
    </mesh>
  );
}

function Contours({
  raster,
  intervalM,
  at,
}: {
  raster: HeightRaster;
  intervalM: number | null;
  at: (x: number, y: number, lift?: number) => [number, number, number];
}) {
  const points = useMemo(() => {
    if (!intervalM) return null;
    const segs = contourLines(raster, intervalM);
    if (segs.length === 0) return null;
    return segs.flatMap((s) => [at(s.from[0], s.from[1], 0.004), at(s.to[0], s.to[1], 0.004)]);
  }, [raster, intervalM, at]);
  if (!points) return null;
  return <Line points={points} segments color="#0f3a1c" lineWidth={1.4} transparent opacity={0.55} />;
}

function Hole({ at }: { at: [number, number, number] }) {
  return (
    <group position={at}>
      <mesh rotation={[-Math.PI / 2, 0, 0]} position={[0, 0.006, 0]}>
        <circleGeometry args={[HOLE_RADIUS_M, 40]} />
        <meshBasicMaterial color="#06090f" />
      </mesh>
      <mesh rotation={[-Math.PI / 2, 0, 0]} position={[0, 0.0065, 0]}>
        <ringGeometry args={[HOLE_RADIUS_M, HOLE_RADIUS_M + 0.01, 40]} />
        <meshBasicMaterial color="#f4f1e8" />
      </mesh>
      <mesh position={[0, FLAGSTICK_M / 2, 0]}>
        <cylinderGeometry args={[0.012, 0.012, FLAGSTICK_M, 10]} />
        <meshStandardMaterial color="#f7f4ec" roughness={0.6} />
      </mesh>
      <mesh position={[0.24, FLAGSTICK_M - 0.17, 0]}>
        <planeGeometry args={[0.46, 0.32]} />
        <meshStandardMaterial color="#e05a36" side={THREE.DoubleSide} roughness={0.8} />
      </mesh>
    </group>
  );
}

/** Puts the camera at the named view when it is asked for (or the putt changes); orbiting is the user's from there. */
function CameraRig({
  raster,
  ball,
  hole,
  at,
  view,
  viewKey,
}: {
  raster: HeightRaster;
  ball: SurfaceSceneProps["ball"];
  hole: SurfaceSceneProps["hole"];
  at: (x: number, y: number, lift?: number) => [number, number, number];
  view: SurfaceSceneProps["view"];
  viewKey: number;
}) {
  const camera = useThree((s) => s.camera) as THREE.PerspectiveCamera;
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const invalidate = useThree((s) => s.invalidate);
  const { bounds } = raster;
  const ballX = ball?.[0];
  const ballY = ball?.[1];
  const holeX = hole?.[0];
  const holeY = hole?.[1];

  useEffect(() => {
    if (!controls) return;
    const span = Math.max(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY);
    const cx = (bounds.minX + bounds.maxX) / 2;
    const cy = (bounds.minY + bounds.maxY) / 2;
    let position: [number, number, number];
    let target: [number, number, number];
    if (view === "behind" && ballX !== undefined && ballY !== undefined && holeX !== undefined && holeY !== undefined) {
      const d = Math.hypot(holeX - ballX, holeY - ballY) || 1;
      const back = 1.2;
      position = at(ballX - ((holeX - ballX) / d) * back, ballY - ((holeY - ballY) / d) * back, EYE_HEIGHT_M);
      target = at(holeX, holeY);
    } else if (view === "above") {
      const half = Math.tan(((camera.fov / 2) * Math.PI) / 180);
      target = at(cx, cy);
      // A hair to the south so north stays at the top of the screen.
      position = [target[0], target[1] + (span * 0.62) / half, target[2] + 0.001];
    } else {
      target = at(cx, cy);
      position = [target[0] - span * 0.35, target[1] + span * 0.55, target[2] + span * 0.85];
    }
    camera.position.set(...position);
    controls.target.set(...target);
    controls.update();
    invalidate();
    // Re-placed when a view is asked for again (viewKey) or the putt moves, not when `at` is recreated with the same map.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [view, viewKey, controls, ballX, ballY, holeX, holeY, bounds, camera]);
  return null;
}
