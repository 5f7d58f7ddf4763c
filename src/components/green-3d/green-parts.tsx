// The pieces of the planar 3D green: the surface and its fringe, contour lines, the hole and flagstick, aim spots and
// putt lines, all placed on the tilted plane (frame.ts maps the putt frame to the scene).
import { useEffect, useMemo, type ReactNode } from "react";
import type { ThreeEvent } from "@react-three/fiber";
import { Line } from "@react-three/drei";
import * as THREE from "three";
import { contourSegments, ellipsePoints, heightRange, surfaceNormal, surfacePoint, type GreenShape, type PuttPlane } from "./frame";
import { FLAGSTICK_M, HOLE_RADIUS_M, PIN_M } from "./scene-constants";
import { LINE_COLOURS, type GreenSceneProps, type SceneAim, type ScenePutt } from "./scene-types";

const HIGH = new THREE.Color("#b4dd8e");
const LOW = new THREE.Color("#2b6638");

/**
 * A putt's line, drawn so it reads on a phone: a pixel-wide line (drei's `Line`, widths in CSS px whatever the
 * distance) over a dark green casing 3 px wider, so a pale line still stands out on pale grass.
 */
export function PuttLine({ line, plane }: { line: GreenSceneProps["lines"][number]; plane: PuttPlane }) {
  const lift = 0.004 + (line.style === "firm" ? 0.001 : 0);
  const points = useMemo(() => line.path.map(([x, y]) => surfacePoint(x, y, plane, lift)), [line.path, plane, lift]);
  const width = line.style === "yours" ? 4.5 : 5.5;
  return (
    <>
      {/* Opaque, so three.js draws it in the same (opaque) pass as the line, and renderOrder puts it first. */}
      <Line points={points} color="#163a22" lineWidth={width + 3} depthWrite={false} renderOrder={1} />
      {/* The player's own line (or the true one) on top of the others. */}
      <Line
        points={points}
        color={LINE_COLOURS[line.style]}
        lineWidth={width}
        renderOrder={line.style === "dying" || line.style === "firm" ? 2 : 3}
      />
    </>
  );
}

/** Places its children on the tilted surface at (x, y), their local +y along the surface normal. */
function OnSurface({ x, y, plane, lift = 0, children }: { x: number; y: number; plane: PuttPlane; lift?: number; children: ReactNode }) {
  const quaternion = useMemo(() => {
    const n = surfaceNormal(plane);
    return new THREE.Quaternion().setFromUnitVectors(new THREE.Vector3(0, 1, 0), new THREE.Vector3(n[0], n[1], n[2]));
  }, [plane]);
  return (
    <group position={surfacePoint(x, y, plane, lift)} quaternion={quaternion}>
      {children}
    </group>
  );
}

/** The green (height-shaded: lighter is higher), its fringe and the ground around it. */
export function GreenSurface({ shape, plane, events }: { shape: GreenShape; plane: PuttPlane; events: Record<string, unknown> }) {
  const geometry = useMemo(() => {
    const range = heightRange(shape, plane);
    const span = range.maxM - range.minM;
    return fanGeometry(shape, plane, 0, (h) =>
      span > 1e-9 ? LOW.clone().lerp(HIGH, (h / (plane.exaggeration ?? 1) - range.minM) / span) : LOW.clone().lerp(HIGH, 0.55),
    );
  }, [shape, plane]);
  const fringe = useMemo(() => fanGeometry(shape, plane, 0.45, () => new THREE.Color("#3d6f3a"), -0.006), [shape, plane]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  useEffect(() => () => fringe.dispose(), [fringe]);
  return (
    <>
      <mesh position={[0, -0.03, 0]} rotation={[-Math.PI / 2, 0, 0]}>
        <circleGeometry args={[120, 48]} />
        <meshBasicMaterial color="#6f8f5e" />
      </mesh>
      <mesh geometry={fringe}>
        <meshBasicMaterial vertexColors side={THREE.DoubleSide} />
      </mesh>
      <mesh geometry={geometry} {...events}>
        <meshBasicMaterial vertexColors side={THREE.DoubleSide} />
      </mesh>
    </>
  );
}

/** A fan of triangles over the ellipse; the surface is planar and the shading linear, so a fan is exact. */
function fanGeometry(
  shape: GreenShape,
  plane: PuttPlane,
  grow: number,
  colourAt: (h: number) => THREE.Color,
  lift = 0,
): THREE.BufferGeometry {
  const rim = ellipsePoints(shape, 96, grow);
  const pts: [number, number][] = [[shape.cx, shape.cy], ...rim];
  const positions = new Float32Array(pts.length * 3);
  const colours = new Float32Array(pts.length * 3);
  pts.forEach(([x, y], i) => {
    const p = surfacePoint(x, y, plane, lift);
    positions.set(p, i * 3);
    const c = colourAt(p[1] - lift);
    colours.set([c.r, c.g, c.b], i * 3);
  });
  const index: number[] = [];
  for (let i = 1; i <= rim.length; i++) index.push(0, i, i === rim.length ? 1 : i + 1);
  const g = new THREE.BufferGeometry();
  g.setAttribute("position", new THREE.BufferAttribute(positions, 3));
  g.setAttribute("color", new THREE.BufferAttribute(colours, 3));
  g.setIndex(index);
  return g;
}

/** Lines joining ground of equal height, a fixed step apart (the legend beside the scene names the step). */
export function Contours({ shape, plane, intervalM }: { shape: GreenShape; plane: PuttPlane; intervalM: number | null }) {
  const points = useMemo(() => {
    if (!intervalM) return null;
    const segs = contourSegments(shape, plane, intervalM);
    if (segs.length === 0) return null;
    return segs.flatMap((s) => [surfacePoint(s.from[0], s.from[1], plane, 0.002), surfacePoint(s.to[0], s.to[1], plane, 0.002)]);
  }, [shape, plane, intervalM]);
  if (!points) return null;
  return <Line points={points} segments color="#0f3a1c" lineWidth={1.6} transparent opacity={0.55} />;
}

export function Hole({ putt, plane }: { putt: ScenePutt; plane: PuttPlane }) {
  const base = surfacePoint(0, putt.distanceM, plane);
  return (
    <>
      <OnSurface x={0} y={putt.distanceM} plane={plane} lift={0.0015}>
        <mesh rotation={[-Math.PI / 2, 0, 0]}>
          <circleGeometry args={[HOLE_RADIUS_M, 40]} />
          <meshBasicMaterial color="#06090f" />
        </mesh>
        <mesh rotation={[-Math.PI / 2, 0, 0]} position={[0, 0.0005, 0]}>
          <ringGeometry args={[HOLE_RADIUS_M, HOLE_RADIUS_M + 0.007, 40]} />
          <meshBasicMaterial color="#f4f1e8" />
        </mesh>
      </OnSurface>
      {/* The flagstick stands plumb, whatever the tilt of the green. */}
      <group position={base}>
        <mesh position={[0, FLAGSTICK_M / 2, 0]}>
          <cylinderGeometry args={[0.009, 0.009, FLAGSTICK_M, 10]} />
          <meshStandardMaterial color="#f7f4ec" roughness={0.6} />
        </mesh>
        <mesh position={[0.24, FLAGSTICK_M - 0.17, 0]}>
          <planeGeometry args={[0.46, 0.32]} />
          <meshStandardMaterial color="#e05a36" side={THREE.DoubleSide} roughness={0.8} />
        </mesh>
      </group>
    </>
  );
}

export function AimSpot({
  aim,
  putt,
  plane,
  onGrab,
}: {
  aim: SceneAim;
  putt: ScenePutt;
  plane: PuttPlane;
  onGrab?: (e: ThreeEvent<PointerEvent>) => void;
}) {
  const colour = LINE_COLOURS[aim.style];
  const start = surfacePoint(0, 0, plane, 0.003);
  const end = surfacePoint(aim.xM, putt.distanceM, plane, 0.003);
  return (
    <>
      <Line points={[start, end]} color={colour} lineWidth={3} dashed dashSize={0.07} gapSize={0.06} transparent opacity={0.95} />
      <OnSurface x={aim.xM} y={putt.distanceM} plane={plane} lift={0.002}>
        <mesh rotation={[-Math.PI / 2, 0, 0]}>
          <ringGeometry args={[0.065, 0.1, 40]} />
          <meshBasicMaterial color={colour} side={THREE.DoubleSide} />
        </mesh>
        {/* A short pin so the spot reads from behind the ball, where the ring is seen almost edge-on. */}
        <mesh position={[0, PIN_M / 2, 0]}>
          <cylinderGeometry args={[0.008, 0.008, PIN_M, 8]} />
          <meshStandardMaterial color={colour} />
        </mesh>
        <mesh position={[0, PIN_M, 0]}>
          <sphereGeometry args={[0.04, 16, 12]} />
          <meshStandardMaterial color={colour} />
        </mesh>
        {onGrab ? (
          <mesh rotation={[-Math.PI / 2, 0, 0]} position={[0, 0.01, 0]} onPointerDown={onGrab}>
            <circleGeometry args={[0.3, 24]} />
            <meshBasicMaterial transparent opacity={0} depthWrite={false} />
          </mesh>
        ) : null}
      </OnSurface>
    </>
  );
}
