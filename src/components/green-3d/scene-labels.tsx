// Words on the 3D green ("higher", "lower", each aim spot's name) as plain DOM over the canvas, laid out every
// rendered frame so none overlaps another (label-layout.ts); the frame loop moves their elements, never React state.
import { useEffect, useRef, type RefObject } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import * as THREE from "three";
import { greenShape, heightRange, surfacePoint, type PuttPlane } from "./frame";
import { placeLabels, type LabelBox } from "./label-layout";
import { PIN_M } from "./scene-constants";
import { LINE_COLOURS, LINE_NAMES, type GreenSceneProps } from "./scene-types";

export type SceneLabel = {
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
export function sceneLabels({ putt, aims, exaggeration = 1 }: GreenSceneProps): SceneLabel[] {
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
export function LabelProjector({ labels, els }: { labels: SceneLabel[]; els: RefObject<Map<string, HTMLElement>> }) {
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
