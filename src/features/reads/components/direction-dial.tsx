import { useRef, type KeyboardEvent, type PointerEvent } from "react";
import clsx from "clsx";
import { angleFromPoint, fallLineValueText, normaliseDeg } from "../utils/directions";

export type DirectionDialProps = {
  /** fallLineDeg; NaN while the typed value is not a number (the handle is hidden then). */
  value: number;
  /** Every move while dragging (`done: false`) and the final value on release or a key press (`done: true`). */
  onChange: (deg: number, done: boolean) => void;
  id?: string;
  className?: string;
  describedBy?: string;
};

const SIZE = 260;
const C = SIZE / 2;
const RING = 80;
const LABEL_R = 114;

/** Within 4° of a named direction (every 45°) the dial settles on it, so a thumb can hit "falls to the right". */
export function snapDeg(deg: number): number {
  const d = normaliseDeg(deg);
  const nearest = Math.round(d / 45) * 45;
  return normaliseDeg(Math.abs(d - nearest) <= 4 ? nearest : Math.round(d));
}

/** A point on the dial, to 0.01 of a viewBox unit: Node's and the browser's sine can differ in the last bit, and
 *  the dial drawn at build time (src/prerender.tsx) must be the one the browser draws when it hydrates the page. */
function polar(deg: number, r: number): [number, number] {
  const rad = (deg * Math.PI) / 180;
  const hundredths = (v: number) => Math.round(v * 100) / 100;
  return [hundredths(C + r * Math.sin(rad)), hundredths(C - r * Math.cos(rad))];
}

/**
 * The fall-line dial: the hole in the middle, the golfer below it, and a handle on the ring pointing the way the
 * green falls. Drag it (mouse, pen or touch), or focus it and use the arrow keys (5° a press, 1° with Shift,
 * 45° with Page Up/Down, Home for straight downhill).
 */
export function DirectionDial({ value, onChange, id, className, describedBy }: DirectionDialProps) {
  const svgRef = useRef<SVGSVGElement>(null);
  const dragging = useRef(false);
  const valid = Number.isFinite(value);
  const deg = valid ? normaliseDeg(value) : 0;

  const angleAt = (event: PointerEvent<SVGSVGElement>) => {
    const box = svgRef.current?.getBoundingClientRect();
    if (!box || box.width === 0) return null;
    const scale = SIZE / box.width;
    const dx = (event.clientX - box.left) * scale - C;
    const dy = (event.clientY - box.top) * scale - C;
    if (Math.hypot(dx, dy) < 8) return null;
    return snapDeg(angleFromPoint(dx, dy));
  };

  const onPointerDown = (event: PointerEvent<SVGSVGElement>) => {
    if (event.button !== 0) return;
    event.preventDefault();
    svgRef.current?.focus();
    svgRef.current?.setPointerCapture?.(event.pointerId);
    dragging.current = true;
    const a = angleAt(event);
    if (a !== null) onChange(a, false);
  };
  const onPointerMove = (event: PointerEvent<SVGSVGElement>) => {
    if (!dragging.current) return;
    const a = angleAt(event);
    if (a !== null) onChange(a, false);
  };
  const end = (event: PointerEvent<SVGSVGElement>) => {
    if (!dragging.current) return;
    dragging.current = false;
    svgRef.current?.releasePointerCapture?.(event.pointerId);
    const a = angleAt(event);
    onChange(a ?? deg, true);
  };

  const onKeyDown = (event: KeyboardEvent<SVGSVGElement>) => {
    const stepBy = event.shiftKey ? 1 : 5;
    let next: number | null = null;
    if (event.key === "ArrowRight" || event.key === "ArrowUp") next = deg + stepBy;
    else if (event.key === "ArrowLeft" || event.key === "ArrowDown") next = deg - stepBy;
    else if (event.key === "PageUp") next = deg + 45;
    else if (event.key === "PageDown") next = deg - 45;
    else if (event.key === "Home") next = 0;
    else if (event.key === "End") next = 180;
    if (next === null) return;
    event.preventDefault();
    onChange(normaliseDeg(Math.round(next)), true);
  };

  const [hx, hy] = polar(deg, RING);
  const [tx, ty] = polar(deg, RING - 24);
  const ticks = Array.from({ length: 24 }, (_, i) => i * 15);

  return (
    <svg
      ref={svgRef}
      id={id}
      viewBox={`0 0 ${SIZE} ${SIZE}`}
      role="slider"
      tabIndex={0}
      aria-label="Which way the green falls"
      aria-valuemin={0}
      aria-valuemax={359}
      aria-valuenow={valid ? Math.round(deg) : undefined}
      aria-valuetext={valid ? fallLineValueText(deg) : "not set"}
      aria-describedby={describedBy}
      aria-orientation="horizontal"
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={end}
      onPointerCancel={end}
      onKeyDown={onKeyDown}
      className={clsx(
        "block aspect-square w-full cursor-grab touch-none rounded-full select-none focus-visible:outline-offset-4 active:cursor-grabbing",
        className,
      )}
    >
      <circle cx={C} cy={C} r={C - 2} className="fill-ink-800" />
      <circle cx={C} cy={C} r={RING} fill="none" className="stroke-sand-50/15" strokeWidth="20" />
      {ticks.map((t) => {
        const major = t % 45 === 0;
        const [x1, y1] = polar(t, RING + (major ? 11 : 13));
        const [x2, y2] = polar(t, RING + 18);
        return (
          <line
            key={t}
            x1={x1}
            y1={y1}
            x2={x2}
            y2={y2}
            className={major ? "stroke-sand-100" : "stroke-sand-50/30"}
            strokeWidth={major ? 2 : 1}
          />
        );
      })}

      {/* the golfer's side: the ball below the hole, the line to the hole */}
      <line x1={C} y1={C + 40} x2={C} y2={C + 10} className="stroke-sand-50/40" strokeWidth="1.5" strokeDasharray="2 5" />
      <circle cx={C} cy={C + 44} r="5" className="fill-sand-50" />
      <text x={C} y={C + 62} textAnchor="middle" className="pointer-events-none fill-sand-200 text-[14px]">
        ball
      </text>

      {[
        [0, "away"],
        [90, "right"],
        [180, "toward you"],
        [270, "left"],
      ].map(([a, word]) => {
        const [x, y] = polar(a as number, LABEL_R);
        return (
          <text key={word} x={x} y={y + 4} textAnchor="middle" className="pointer-events-none fill-sand-200 text-[14px]">
            {word}
          </text>
        );
      })}

      {valid ? (
        <g className="pointer-events-none">
          <line x1={C} y1={C} x2={tx} y2={ty} className="stroke-coral-400" strokeWidth="4" strokeLinecap="round" />
          <polygon points="0,-9 7,5 -7,5" transform={`translate(${tx} ${ty}) rotate(${deg})`} className="fill-coral-400" />
          <circle cx={hx} cy={hy} r="13" className="fill-coral-500 stroke-sand-50" strokeWidth="3" />
        </g>
      ) : null}
      <circle cx={C} cy={C} r="9" className="pointer-events-none fill-ink-950 stroke-sand-50" strokeWidth="2" />
    </svg>
  );
}
