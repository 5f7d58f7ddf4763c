// The green from above: height shading (lighter is higher), contour lines, slope ticks (one length, along the fall
// line, coloured by steepness, a bead at the low end), and the putt — the
// ball, the hole, the start line to the aim spot and the curved line the ball rolls. A tap places the ball or the hole.
import { useId, useMemo, type MouseEvent } from "react";
import { scaleStep } from "../../../components/putt-diagram/putt-diagram";
import { contourLines, type HeightRaster } from "../../../components/green-3d/surface-grid";
import type { UnitSystem } from "#shared/units";
import { mapLayout, screenToGreen } from "../utils/map-view";
import { shadingDataUrl } from "../utils/shading-image";
import { SLOPE_BANDS, type SlopeTick } from "../utils/slope-ticks";

export type SurfaceMapProps = {
  raster: HeightRaster;
  contourIntervalM: number | null;
  ticks: SlopeTick[];
  ball: [number, number] | null;
  hole: [number, number] | null;
  aim: [number, number] | null;
  /** The ball's path in the green's frame. */
  line: ReadonlyArray<readonly [number, number]> | null;
  placing: "ball" | "hole";
  onTap: (point: [number, number]) => void;
  units: UnitSystem;
  /** Accessible description (the putt in words). */
  description: string;
};

const HOLE_R_M = 0.054;

export function SurfaceMap({
  raster,
  contourIntervalM,
  ticks,
  ball,
  hole,
  aim,
  line,
  placing,
  onTap,
  units,
  description,
}: SurfaceMapProps) {
  const id = useId();
  const layout = useMemo(() => mapLayout(raster.bounds), [raster]);
  const image = useMemo(() => shadingDataUrl(raster), [raster]);
  const contourPath = useMemo(() => {
    if (!contourIntervalM) return "";
    return contourLines(raster, contourIntervalM)
      .map(
        (s) =>
          `M${layout.toX(s.from[0]).toFixed(1)} ${layout.toY(s.from[1]).toFixed(1)}L${layout.toX(s.to[0]).toFixed(1)} ${layout.toY(s.to[1]).toFixed(1)}`,
      )
      .join("");
  }, [raster, contourIntervalM, layout]);
  const { toX, toY, k, width, height, pad, bounds } = layout;
  const step = scaleStep((width - 2 * pad) / k / 4, units);

  const tap = (e: MouseEvent<SVGSVGElement>) => {
    const point = screenToGreen(e.clientX, e.clientY, e.currentTarget.getBoundingClientRect(), layout);
    if (point) onTap(point);
  };

  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-labelledby={`${id}-t`}
      aria-describedby={`${id}-d`}
      className="block h-auto w-full cursor-crosshair touch-manipulation select-none"
      onClick={tap}
      data-testid="surface-map"
    >
      <title id={`${id}-t`}>{`The green from above. Tap to place the ${placing}.`}</title>
      <desc id={`${id}-d`}>{description}</desc>
      <rect width={width} height={height} rx="14" className="fill-ink-800" />
      <image
        href={image}
        x={toX(bounds.minX)}
        y={toY(bounds.maxY)}
        width={(bounds.maxX - bounds.minX) * k}
        height={(bounds.maxY - bounds.minY) * k}
        preserveAspectRatio="none"
      />
      {contourPath ? <path d={contourPath} fill="none" className="stroke-ink-950/45" strokeWidth="1.2" /> : null}
      <g aria-hidden="true" data-testid="slope-ticks">
        {ticks.map((t, i) => (
          <g key={i} data-band={t.band}>
            <line
              x1={toX(t.from[0])}
              y1={toY(t.from[1])}
              x2={toX(t.to[0])}
              y2={toY(t.to[1])}
              stroke="#0b1120"
              strokeOpacity="0.55"
              strokeWidth="5"
              strokeLinecap="round"
            />
            <line
              x1={toX(t.from[0])}
              y1={toY(t.from[1])}
              x2={toX(t.to[0])}
              y2={toY(t.to[1])}
              stroke={SLOPE_BANDS[t.band]!.colour}
              strokeWidth="2.5"
              strokeLinecap="round"
            />
            <circle cx={toX(t.to[0])} cy={toY(t.to[1])} r="3.4" fill={SLOPE_BANDS[t.band]!.colour} stroke="#0b1120" strokeWidth="1.2" />
          </g>
        ))}
      </g>

      {ball && aim ? (
        <line
          x1={toX(ball[0])}
          y1={toY(ball[1])}
          x2={toX(aim[0])}
          y2={toY(aim[1])}
          className="stroke-sand-50"
          strokeWidth="2"
          strokeDasharray="6 5"
        />
      ) : null}
      {aim ? (
        <circle cx={toX(aim[0])} cy={toY(aim[1])} r="6" className="fill-none stroke-sand-50" strokeWidth="2" data-testid="aim-spot" />
      ) : null}
      {line && line.length > 1 ? (
        <polyline
          points={line.map(([x, y]) => `${toX(x).toFixed(1)},${toY(y).toFixed(1)}`).join(" ")}
          fill="none"
          className="stroke-coral-500"
          strokeWidth="3.5"
          strokeLinecap="round"
          strokeLinejoin="round"
          data-testid="surface-line"
        />
      ) : null}
      {hole ? (
        <g data-testid="hole-marker">
          <circle
            cx={toX(hole[0])}
            cy={toY(hole[1])}
            r={Math.max(HOLE_R_M * k, 6.5)}
            className="fill-ink-950 stroke-sand-50"
            strokeWidth="2"
          />
          <line x1={toX(hole[0])} y1={toY(hole[1])} x2={toX(hole[0])} y2={toY(hole[1]) - 24} className="stroke-sand-50" strokeWidth="2" />
          <path d={`M${toX(hole[0])} ${toY(hole[1]) - 24}l13 5l-13 5z`} className="fill-coral-500" />
        </g>
      ) : null}
      {ball ? (
        <circle
          cx={toX(ball[0])}
          cy={toY(ball[1])}
          r="6.5"
          className="fill-white stroke-ink-950"
          strokeWidth="1.5"
          data-testid="ball-marker"
        />
      ) : null}

      <g aria-hidden="true" className="fill-sand-100 text-[13px] font-semibold">
        <text x={width - pad} y={pad - 7} textAnchor="end">
          N ↑
        </text>
      </g>
      <g transform={`translate(${pad} ${height - 8})`} aria-hidden="true">
        <line x1="0" y1="0" x2={step.m * k} y2="0" className="stroke-sand-100" strokeWidth="2" />
        <line x1="0" y1="-4" x2="0" y2="4" className="stroke-sand-100" strokeWidth="2" />
        <line x1={step.m * k} y1="-4" x2={step.m * k} y2="4" className="stroke-sand-100" strokeWidth="2" />
        <text x={step.m * k + 6} y="4" className="fill-sand-100 text-[13px]">
          {step.label}
        </text>
      </g>
    </svg>
  );
}
