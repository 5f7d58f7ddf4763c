// Where the simulated putts finish, seen from above around the hole: each miss a dot where it stopped (a ring when
// it leaves a second putt over 1 m, the circle drawn round the hole), and the holed ones counted into a tray below,
// since they all finish in the same place. Putt frame, to scale: ball below, hole at (0, D).
import { useId } from "react";
import clsx from "clsx";
import { HOLE_DIAMETER_M, type UnitSystem } from "#shared/units";
import { scaleStep } from "../../../components/putt-diagram/putt-diagram";

export const SECOND_PUTT_RING_M = 1;

const W = 320;
const PLOT_H = 250;
const PAD = 16;
const TRAY_PER_ROW = 25;
const TRAY_STEP = 11;

type Point = readonly [number, number];

/** The part of the green drawn: around the hole, wide enough for every miss and the 1 m ring, same scale both ways. */
export function finishesFrame(finishes: ReadonlyArray<Point>, finishHoled: ReadonlyArray<boolean>, distanceM: number) {
  let minX = -SECOND_PUTT_RING_M * 1.15;
  let maxX = SECOND_PUTT_RING_M * 1.15;
  let minY = distanceM - SECOND_PUTT_RING_M * 1.15;
  let maxY = distanceM + SECOND_PUTT_RING_M * 1.15;
  finishes.forEach(([x, y], i) => {
    if (finishHoled[i]) return;
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
  });
  const innerW = W - 2 * PAD;
  const innerH = PLOT_H - 2 * PAD;
  const k = Math.min(innerW / (maxX - minX), innerH / (maxY - minY));
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  const toX = (x: number) => W / 2 + (x - cx) * k;
  const toY = (y: number) => PLOT_H / 2 - (y - cy) * k;
  return { k, toX, toY };
}

export type FinishesPictureProps = {
  /** Rest points [x, y], m, putt frame (a holed putt sits at the hole). */
  finishes: ReadonlyArray<Point>;
  finishHoled: ReadonlyArray<boolean>;
  distanceM: number;
  /** The read's line from the ball, putt frame. */
  line?: ReadonlyArray<Point> | null;
  units: UnitSystem;
  className?: string;
};

export function FinishesPicture({ finishes, finishHoled, distanceM, line, units, className }: FinishesPictureProps) {
  const id = useId();
  const { k, toX, toY } = finishesFrame(finishes, finishHoled, distanceM);
  const holed = finishHoled.filter(Boolean).length;
  const far = finishes.filter(([x, y], i) => !finishHoled[i] && Math.hypot(x, y - distanceM) > SECOND_PUTT_RING_M).length;
  const near = finishes.length - holed - far;
  const rows = Math.max(1, Math.ceil(holed / TRAY_PER_ROW));
  const trayTop = PLOT_H + 26;
  const H = trayTop + rows * TRAY_STEP + 12;
  const holeX = toX(0);
  const holeY = toY(distanceM);
  const holeR = Math.max((HOLE_DIAMETER_M / 2) * k, 5);
  const step = scaleStep((W - 2 * PAD) / k / 4, units);
  const ballInside = toY(0) < PLOT_H - 4;
  const linePoints = (line ?? []).map(([x, y]) => `${toX(x).toFixed(1)},${toY(y).toFixed(1)}`).join(" ");
  const summary = `${finishes.length} simulated putts: ${holed} holed, ${near} finish within 1 m of the hole, ${far} leave more than 1 m.`;
  const holedOrder = finishHoled.flatMap((h, i) => (h ? [i] : []));

  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-labelledby={`${id}-t`}
      aria-describedby={`${id}-d`}
      className={clsx("block h-auto w-full", className)}
    >
      <title id={`${id}-t`}>Where {finishes.length} simulated putts finish</title>
      <desc id={`${id}-d`}>{summary}</desc>
      <defs>
        <clipPath id={`${id}-plot`}>
          <rect width={W} height={PLOT_H} rx="14" />
        </clipPath>
      </defs>
      <rect width={W} height={H} rx="14" className="fill-ink-800" />
      <g clipPath={`url(#${id}-plot)`}>
        <circle
          cx={holeX}
          cy={holeY}
          r={SECOND_PUTT_RING_M * k}
          className="fill-sand-50/5 stroke-sand-100/45"
          strokeWidth="1.5"
          strokeDasharray="4 5"
        />
        {linePoints ? (
          <polyline
            points={linePoints}
            fill="none"
            className="stroke-coral-400/80"
            strokeWidth="2.5"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        ) : null}
        <circle cx={holeX} cy={holeY} r={holeR} className="fill-ink-950 stroke-sand-50" strokeWidth="2" />
        {ballInside ? <circle cx={toX(0)} cy={toY(0)} r={4.5} className="fill-sand-50" /> : null}
        {finishes.map(([x, y], i) => {
          if (finishHoled[i]) return null;
          const beyond = Math.hypot(x, y - distanceM) > SECOND_PUTT_RING_M;
          return beyond ? (
            <circle key={i} data-finish="far" cx={toX(x)} cy={toY(y)} r="3.2" className="fill-none stroke-sand-100" strokeWidth="1.6" />
          ) : (
            <circle key={i} data-finish="near" cx={toX(x)} cy={toY(y)} r="3.2" className="fill-sand-100/85" />
          );
        })}
      </g>
      <text
        x={holeX + SECOND_PUTT_RING_M * k * 0.72 + 4}
        y={holeY - SECOND_PUTT_RING_M * k * 0.72}
        className="fill-sand-200 text-[11px]"
        aria-hidden="true"
      >
        1 m
      </text>
      {!ballInside ? (
        <text x={W / 2 + 8} y={PLOT_H - 8} className="fill-sand-200 text-[11px]" aria-hidden="true">
          from the ball
        </text>
      ) : null}
      <g transform={`translate(${PAD} ${PLOT_H - 12})`} aria-hidden="true">
        <line x1="0" y1="0" x2={step.m * k} y2="0" className="stroke-sand-100" strokeWidth="2" />
        <line x1="0" y1="-4" x2="0" y2="4" className="stroke-sand-100" strokeWidth="2" />
        <line x1={step.m * k} y1="-4" x2={step.m * k} y2="4" className="stroke-sand-100" strokeWidth="2" />
        <text x={step.m * k + 6} y="4" className="fill-sand-100 text-[11px]">
          {step.label}
        </text>
      </g>
      <line x1={PAD} y1={PLOT_H} x2={W - PAD} y2={PLOT_H} className="stroke-sand-50/15" strokeWidth="1" />
      <text x={PAD} y={PLOT_H + 17} className="fill-sand-100 text-[12px] font-semibold">
        In the hole: {holed}
      </text>
      {holedOrder.map((i, n) => {
        return (
          <circle
            key={`holed-${i}`}
            data-finish="holed"
            cx={PAD + 4 + (n % TRAY_PER_ROW) * TRAY_STEP}
            cy={trayTop + 4 + Math.floor(n / TRAY_PER_ROW) * TRAY_STEP}
            r="3.8"
            className="fill-coral-400"
          />
        );
      })}
    </svg>
  );
}
