// The 3D green. This module (and three.js with it) is only reached through a lazy import, so the first page never
// downloads it. Motion follows the house rules: the frame loop mutates refs (camera, ball), never React state; the
// paths come in computed once and are only sampled per frame.
import { useEffect, useMemo, useRef, type ReactNode, type RefObject } from "react";
import { Canvas, useFrame, useThree, type ThreeEvent } from "@react-three/fiber";
import { Line, OrbitControls } from "@react-three/drei";
import * as THREE from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import {
  contourSegments,
  ellipsePoints,
  fallVector,
  greenShape,
  heightRange,
  surfaceNormal,
  surfacePoint,
  type GreenShape,
  type PuttPlane,
} from "./frame";
import { placeLabels, type LabelBox } from "./label-layout";
import {
  AIM_LIMIT_M,
  LINE_COLOURS,
  LINE_NAMES,
  type CameraView,
  type GreenSceneProps,
  type Replay,
  type SceneAim,
  type ScenePutt,
} from "./scene-types";

const BALL_RADIUS_M = 0.04267 / 2;
const HOLE_RADIUS_M = 0.054;
const FLAGSTICK_M = 2.13;
const EYE_HEIGHT_M = 1.6;
/** How far behind the ball the "behind the ball" camera stands, m. */
const BEHIND_M = 1.6;
/** Height of the pin that marks an aim spot, m. */
const PIN_M = 0.3;
const SKY = "#dce6df";
const HIGH = new THREE.Color("#b4dd8e");
const LOW = new THREE.Color("#2b6638");

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

type SceneLabel = {
  id: string;
  at: [number, number, number];
  text: string;
  tone: "light" | "dark";
  side: "up" | "left" | "right";
  colour?: string;
  /** Lower goes first when labels compete for room: the player's own aim, then the others, then higher/lower. */
  priority: number;
};

/** Words on the green: "higher" and "lower" near its rim, and each aim spot's name above its pin. */
function sceneLabels({ putt, aims, exaggeration = 1 }: GreenSceneProps): SceneLabel[] {
  const plane: PuttPlane = { slopePct: putt.slopePct, fallLineDeg: putt.fallLineDeg, exaggeration };
  const shape = greenShape(putt.distanceM);
  const out: SceneLabel[] = [];
  if (plane.slopePct > 0) {
    const r = heightRange(shape, plane);
    const at = (p: [number, number]) => surfacePoint(shape.cx + (p[0] - shape.cx) * 0.78, shape.cy + (p[1] - shape.cy) * 0.78, plane, 0.05);
    out.push(
      { id: "higher", at: at(r.highPoint), text: "higher", tone: "light", side: "up", priority: 2 },
      { id: "lower", at: at(r.lowPoint), text: "lower", tone: "dark", side: "up", priority: 2 },
    );
  }
  for (const a of aims) {
    out.push({
      id: `aim-${a.id}`,
      at: surfacePoint(a.xM, putt.distanceM, plane, PIN_M),
      text: a.label ?? LINE_NAMES[a.style],
      tone: "dark",
      side: a.labelSide ?? "up",
      colour: LINE_COLOURS[a.style],
      priority: a.style === "chosen" || a.style === "yours" ? 0 : 1,
    });
  }
  return out.sort((a, b) => a.priority - b.priority);
}

/** Gap between a label and its anchor, px. */
const ANCHOR_GAP_PX = 10;

/** The rectangle a label wants beside its anchor (x, y), for its side. */
function wantedRect(side: SceneLabel["side"], x: number, y: number, w: number, h: number) {
  if (side === "left") return { x: x - ANCHOR_GAP_PX - w, y: y - h / 2, w, h };
  if (side === "right") return { x: x + ANCHOR_GAP_PX, y: y - h / 2, w, h };
  return { x: x - w / 2, y: y - ANCHOR_GAP_PX - h, w, h };
}

/**
 * Projects each label's anchor to the canvas every rendered frame, lays the labels out so none overlaps another or
 * leaves the view (label-layout.ts), and moves their elements (refs only). A label with no clear place is hidden.
 */
function LabelProjector({ labels, els }: { labels: SceneLabel[]; els: RefObject<Map<string, HTMLElement>> }) {
  const v = useRef(new THREE.Vector3());
  const sizes = useRef(new Map<string, { text: string; w: number; h: number }>());
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => invalidate(), [labels, invalidate]);
  useFrame(({ camera, size }) => {
    const boxes: LabelBox[] = [];
    for (const l of labels) {
      const el = els.current.get(l.id);
      if (!el) continue;
      const p = v.current.set(l.at[0], l.at[1], l.at[2]).project(camera);
      if (!(p.z < 1 && Math.abs(p.x) < 1.1 && Math.abs(p.y) < 1.1)) {
        el.style.visibility = "hidden";
        continue;
      }
      // Measured once per text (a layout read), not every frame.
      let s = sizes.current.get(l.id);
      if (!s || s.text !== l.text || s.w === 0) {
        const span = el.firstElementChild as HTMLElement | null;
        s = { text: l.text, w: span?.offsetWidth ?? 0, h: span?.offsetHeight ?? 0 };
        sizes.current.set(l.id, s);
      }
      boxes.push({ id: l.id, rect: wantedRect(l.side, ((p.x + 1) / 2) * size.width, ((1 - p.y) / 2) * size.height, s.w, s.h) });
    }
    const placement = placeLabels(boxes, size);
    for (const b of boxes) {
      const el = els.current.get(b.id)!;
      const at = placement.get(b.id);
      el.style.visibility = at ? "visible" : "hidden";
      if (at) el.style.transform = `translate(${(b.rect.x + at.dx).toFixed(1)}px, ${(b.rect.y + at.dy).toFixed(1)}px)`;
    }
  });
  return null;
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

/**
 * A putt's line, drawn so it reads on a phone: a pixel-wide line (drei's `Line`, widths in CSS px whatever the
 * distance) over a dark green casing 3 px wider, so a pale line still stands out on pale grass.
 */
function PuttLine({ line, plane }: { line: GreenSceneProps["lines"][number]; plane: PuttPlane }) {
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
function GreenSurface({ shape, plane, events }: { shape: GreenShape; plane: PuttPlane; events: Record<string, unknown> }) {
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
function Contours({ shape, plane, intervalM }: { shape: GreenShape; plane: PuttPlane; intervalM: number | null }) {
  const points = useMemo(() => {
    if (!intervalM) return null;
    const segs = contourSegments(shape, plane, intervalM);
    if (segs.length === 0) return null;
    return segs.flatMap((s) => [surfacePoint(s.from[0], s.from[1], plane, 0.002), surfacePoint(s.to[0], s.to[1], plane, 0.002)]);
  }, [shape, plane, intervalM]);
  if (!points) return null;
  return <Line points={points} segments color="#0f3a1c" lineWidth={1.6} transparent opacity={0.55} />;
}

function Hole({ putt, plane }: { putt: ScenePutt; plane: PuttPlane }) {
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

function AimSpot({
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

/** The ball: at address, or replaying a timed roll (sampled per frame into the mesh's position, no React state). */
function RollingBall({ putt, plane, replay }: { putt: ScenePutt; plane: PuttPlane; replay: Replay | null }) {
  const ball = useRef<THREE.Mesh>(null);
  const clock = useRef(0);
  const playing = useRef(false);
  const hint = useRef(0);
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
      const s = sampleAt(timeS, xM, yM, t, hint);
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

// One result object reused across frames.
const sampled = { x: 0, y: 0 };
function sampleAt(times: readonly number[], xs: readonly number[], ys: readonly number[], t: number, hint: { current: number }) {
  const n = times.length;
  let i = Math.min(hint.current, n - 2);
  while (i < n - 2 && times[i + 1]! < t) i++;
  hint.current = i;
  const t0 = times[i]!;
  const t1 = times[i + 1] ?? t0;
  const f = t1 > t0 ? Math.min(Math.max((t - t0) / (t1 - t0), 0), 1) : 0;
  sampled.x = xs[i]! + f * ((xs[i + 1] ?? xs[i]!) - xs[i]!);
  sampled.y = ys[i]! + f * ((ys[i + 1] ?? ys[i]!) - ys[i]!);
  return sampled;
}

type CameraGoal = { position: THREE.Vector3; target: THREE.Vector3 };

/** The part of the green worth framing from above: ball, hole, every line and aim spot, with a margin (putt frame). */
export type FrameBox = { minX: number; maxX: number; minY: number; maxY: number };

function frameBox(putt: ScenePutt, lines: GreenSceneProps["lines"], aims: GreenSceneProps["aims"]): FrameBox {
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
function CameraRig({
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
