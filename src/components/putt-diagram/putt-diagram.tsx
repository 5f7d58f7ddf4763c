// A putt seen from above, drawn to scale: ball at the bottom, hole at the top, the rolled line(s), where to aim,
// and which way the green falls. Used by the read calculator and as the 2D fallback of the 3D rehearse scene.
import { useId } from "react";
import clsx from "clsx";
import { HOLE_DIAMETER_M, METRES_PER_FOOT, METRES_PER_INCH, type UnitSystem } from "../../../shared/units";

/** How a line is drawn: the read's own line, or a dying / firm comparison. */
export type PuttLineStyle = "chosen" | "dying" | "firm";

export type PuttLine = {
  /** [x, y] in metres in the putt frame: ball at (0, 0), hole at (0, holeDistanceM), x to the golfer's right. */
  points: ReadonlyArray<readonly [number, number]>;
  /** Default "chosen". */
  style?: PuttLineStyle;
  /** Shown in the legend when given, e.g. "dying pace". */
  label?: string;
};

export type AimSpot = {
  /** Metres right (+) or left (−) of the hole centre. */
  xM: number;
  /** Metres from the ball; default the hole's distance (the aim offset is measured there). */
  yM?: number;
  /** Colours the spot and its start line like the line it belongs to; default "chosen". */
  style?: PuttLineStyle;
};

export type PuttDiagramProps = {
  /** One or more lines; the first "chosen" one is drawn on top. */
  paths: ReadonlyArray<PuttLine>;
  /** Ball to hole, m. */
  holeDistanceM: number;
  /** Aim spots; each gets a dashed start line from the ball. */
  aimSpots?: ReadonlyArray<AimSpot>;
  /** The fall line (clockwise from ball→hole, 0 = straight downhill) for the small "falls" cue; omit to hide it. */
  fallLineDeg?: number;
  /** Units of the scale bar. */
  units: UnitSystem;
  /** Accessible name; default "The putt seen from above". */
  title?: string;
  /** Accessible description, e.g. the aim in words. */
  description?: string;
  className?: string;
};

const W = 320;
const H = 440;
const PAD = { top: 34, bottom: 44, side: 22 };

const lineClass: Record<PuttLineStyle, string> = {
  chosen: "stroke-coral-400",
  dying: "stroke-sand-300",
  firm: "stroke-ink-200",
};
const spotClass: Record<PuttLineStyle, string> = {
  chosen: "fill-coral-400",
  dying: "fill-sand-300",
  firm: "fill-ink-200",
};
const lineWidth: Record<PuttLineStyle, number> = { chosen: 4, dying: 3, firm: 3 };
const lineDash: Record<PuttLineStyle, string | undefined> = { chosen: undefined, dying: undefined, firm: "1 6" };

/** A round length for the scale bar and grid, at most `maxM` long: 1 in … 20 ft or 1 cm … 10 m. */
export function scaleStep(maxM: number, units: UnitSystem): { m: number; label: string } {
  const imperial: Array<[number, string]> = [
    [3 * METRES_PER_INCH, "3 in"],
    [6 * METRES_PER_INCH, "6 in"],
    [METRES_PER_FOOT, "1 ft"],
    [2 * METRES_PER_FOOT, "2 ft"],
    [3 * METRES_PER_FOOT, "3 ft"],
    [5 * METRES_PER_FOOT, "5 ft"],
    [10 * METRES_PER_FOOT, "10 ft"],
    [20 * METRES_PER_FOOT, "20 ft"],
  ];
  const metric: Array<[number, string]> = [
    [0.05, "5 cm"],
    [0.1, "10 cm"],
    [0.2, "20 cm"],
    [0.5, "50 cm"],
    [1, "1 m"],
    [2, "2 m"],
    [5, "5 m"],
    [10, "10 m"],
  ];
  const list = units === "imperial" ? imperial : metric;
  let pick = list[0] as [number, string];
  for (const step of list) if (step[0] <= maxM) pick = step;
  return { m: pick[0], label: pick[1] };
}

/** Metres → drawing units: the same scale across and along the putt, so the curve is shown as it is. */
export function diagramScale(paths: ReadonlyArray<PuttLine>, holeDistanceM: number, aimSpots: ReadonlyArray<AimSpot>) {
  let maxAbsX = HOLE_DIAMETER_M;
  let minY = 0;
  let maxY = Math.max(holeDistanceM, 0.1);
  for (const p of paths) {
    for (const [x, y] of p.points) {
      maxAbsX = Math.max(maxAbsX, Math.abs(x));
      minY = Math.min(minY, y);
      maxY = Math.max(maxY, y);
    }
  }
  for (const s of aimSpots) maxAbsX = Math.max(maxAbsX, Math.abs(s.xM));
  const innerW = W - 2 * PAD.side;
  const innerH = H - PAD.top - PAD.bottom;
  const k = Math.min(innerH / (maxY - minY), innerW / (2 * maxAbsX * 1.15));
  // Anchor the hole near the top, the ball above the bottom band.
  const toX = (x: number) => W / 2 + x * k;
  const toY = (y: number) => PAD.top + (maxY - y) * k;
  return { k, toX, toY, minY, maxY };
}

function pointsAttr(points: ReadonlyArray<readonly [number, number]>, toX: (x: number) => number, toY: (y: number) => number): string {
  return points.map(([x, y]) => `${toX(x).toFixed(1)},${toY(y).toFixed(1)}`).join(" ");
}

/**
 * The putt from above, to scale (the hole and ball are drawn at least a few pixels wide so they stay visible).
 * @example <PuttDiagram paths={[{ points: read.path }]} holeDistanceM={3} aimSpots={[{ xM: read.aimOffsetM }]} fallLineDeg={90} units="imperial" />
 */
export function PuttDiagram({
  paths,
  holeDistanceM,
  aimSpots = [],
  fallLineDeg,
  units,
  title = "The putt seen from above",
  description,
  className,
}: PuttDiagramProps) {
  const id = useId();
  const { k, toX, toY } = diagramScale(paths, holeDistanceM, aimSpots);
  const step = scaleStep((W - 2 * PAD.side) / k / 3, units);
  const gridPx = step.m * k;
  const holeR = Math.max((HOLE_DIAMETER_M / 2) * k, 6);
  const ballR = Math.max(0.02135 * k, 4.5);
  const holeX = toX(0);
  const holeY = toY(holeDistanceM);
  const ballY = toY(0);
  const ordered = [...paths].sort((a, b) => Number((a.style ?? "chosen") === "chosen") - Number((b.style ?? "chosen") === "chosen"));
  const legend = paths.filter((p) => p.label);

  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-labelledby={`${id}-t`}
      aria-describedby={description ? `${id}-d` : undefined}
      className={clsx("block h-auto w-full", className)}
    >
      <title id={`${id}-t`}>{title}</title>
      {description ? <desc id={`${id}-d`}>{description}</desc> : null}
      <defs>
        <pattern id={`${id}-grid`} width={gridPx} height={gridPx} patternUnits="userSpaceOnUse" x={holeX} y={ballY}>
          <path d={`M${gridPx} 0H0V${gridPx}`} fill="none" className="stroke-sand-50/8" strokeWidth="1" />
        </pattern>
        <marker id={`${id}-arrow`} viewBox="0 0 10 10" refX="7" refY="5" markerWidth="5" markerHeight="5" orient="auto">
          <path d="M0 0L10 5L0 10z" className="fill-sand-100" />
        </marker>
      </defs>
      <rect width={W} height={H} rx="18" className="fill-ink-800" />
      <rect width={W} height={H} rx="18" fill={`url(#${id}-grid)`} />

      {/* the straight line ball → hole, for reference */}
      <line x1={holeX} y1={ballY} x2={holeX} y2={holeY} className="stroke-sand-50/30" strokeWidth="1.5" strokeDasharray="2 6" />

      {aimSpots.map((s, i) => {
        const style = s.style ?? "chosen";
        const sx = toX(s.xM);
        const sy = toY(s.yM ?? holeDistanceM);
        return (
          <g key={`aim-${i}`}>
            <line
              x1={holeX}
              y1={ballY}
              x2={sx}
              y2={sy}
              className={clsx(lineClass[style], "opacity-60")}
              strokeWidth="1.5"
              strokeDasharray="5 5"
            />
            <circle cx={sx} cy={sy} r="5" className={spotClass[style]} />
            <circle cx={sx} cy={sy} r="9" fill="none" className={lineClass[style]} strokeWidth="1.5" />
          </g>
        );
      })}

      {ordered.map((p, i) => {
        const style = p.style ?? "chosen";
        return (
          <polyline
            key={`line-${i}`}
            points={pointsAttr(p.points, toX, toY)}
            fill="none"
            className={lineClass[style]}
            strokeWidth={lineWidth[style]}
            strokeDasharray={lineDash[style]}
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        );
      })}

      <circle cx={holeX} cy={holeY} r={holeR} className="fill-ink-950 stroke-sand-50" strokeWidth="2" />
      <circle cx={holeX} cy={ballY} r={ballR} className="fill-sand-50" />

      {fallLineDeg !== undefined ? (
        <g transform="translate(40 40)" aria-hidden="true">
          <circle r="20" className="fill-ink-900/70 stroke-sand-50/20" strokeWidth="1" />
          <line
            x1="0"
            y1="11"
            x2="0"
            y2="-12"
            transform={`rotate(${fallLineDeg})`}
            className="stroke-sand-100"
            strokeWidth="2.5"
            markerEnd={`url(#${id}-arrow)`}
          />
          <text y="34" textAnchor="middle" className="fill-sand-200 text-[13.5px]">
            falls
          </text>
        </g>
      ) : null}

      <g transform={`translate(${PAD.side} ${H - 18})`} aria-hidden="true">
        <line x1="0" y1="0" x2={gridPx} y2="0" className="stroke-sand-100" strokeWidth="2" />
        <line x1="0" y1="-4" x2="0" y2="4" className="stroke-sand-100" strokeWidth="2" />
        <line x1={gridPx} y1="-4" x2={gridPx} y2="4" className="stroke-sand-100" strokeWidth="2" />
        <text x={gridPx + 8} y="4" className="fill-sand-100 text-[13.5px]">
          {step.label}
        </text>
      </g>

      {legend.length > 0 ? (
        <g transform={`translate(${W - PAD.side} ${H - 18 - (legend.length - 1) * 16})`} aria-hidden="true">
          {legend.map((p, i) => {
            const style = p.style ?? "chosen";
            return (
              <g key={`legend-${i}`} transform={`translate(0 ${i * 16})`}>
                <text x="-30" y="4" textAnchor="end" className="fill-sand-100 text-[13.5px]">
                  {p.label}
                </text>
                <line
                  x1="-22"
                  y1="0"
                  x2="0"
                  y2="0"
                  className={lineClass[style]}
                  strokeWidth={lineWidth[style]}
                  strokeDasharray={lineDash[style]}
                  strokeLinecap="round"
                />
              </g>
            );
          })}
        </g>
      ) : null}
    </svg>
  );
}
