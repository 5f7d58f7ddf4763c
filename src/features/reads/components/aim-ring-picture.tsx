// The aim-spot picture: a plan of the green around the hole (uphill at the top) with, for each length, the aim spots
// of putts coming from every side joined into one closed line. A chosen side is picked out, with its numbers.
import { useId, useState } from "react";
import { formatShort, toShortUnit, shortUnitLabel, type UnitSystem } from "#shared/units";
import { BALL_SIDES, aimRings, gridStepM, type AimRing } from "../utils/aim-ring";
import type { BreakChartAnswer } from "../utils/chart-data";
import { distanceHeading } from "../utils/chart-data";

/** One colour and one dash per length (colour is never the only cue), dark enough for a pale background. */
const RING_STYLES = [
  { colour: "#1d3f8f", dash: "" },
  { colour: "#6b2f8f", dash: "7 4" },
  { colour: "#a3321f", dash: "2 3" },
  { colour: "#7a5200", dash: "10 3 2 3" },
  { colour: "#0d5e52", dash: "" },
] as const;

const HOLE_RADIUS_M = 0.054;
// viewBox units: the picture is 360 wide; on a 390 px phone its card leaves about 320 px, so 14 here is 12.4 px or more.
const W = 360;
const H = 340;
const PAD = 16;
const INK = "#131b2e";

type Props = { answer: BreakChartAnswer; units: UnitSystem; settingsWords: string };

export function AimRingPicture({ answer, units, settingsWords }: Props) {
  const rings = aimRings(answer);
  const [side, setSide] = useState<number>(90);
  const titleId = useId();
  const descId = useId();
  const all = rings.flatMap((r) => r.spots);
  const halfWidthM = Math.max(0.08, ...all.map((s) => Math.abs(s.xM)), ...all.map((s) => s.yM * 0.75));
  const topM = Math.max(0.08, ...all.map((s) => s.yM)) * 1.12;
  const bottomM = -Math.max(0.05, topM * 0.22);
  const k = Math.min((W - 2 * PAD) / (2 * halfWidthM * 1.08), (H - 2 * PAD - 18) / (topM - bottomM));
  const cx = W / 2;
  const toX = (x: number) => cx + x * k;
  const toY = (y: number) => PAD + 18 + (topM - y) * k;
  const step = gridStepM(halfWidthM, units);
  const gridXs: number[] = [];
  for (let x = -Math.floor((halfWidthM * 1.08) / step) * step; x <= halfWidthM * 1.08 + 1e-9; x += step) gridXs.push(x);
  const gridYs: number[] = [];
  for (let y = Math.ceil(bottomM / step) * step; y <= topM + 1e-9; y += step) gridYs.push(y);

  const longest = rings[rings.length - 1];
  const furthest = longest ? Math.max(0, ...longest.spots.map((s) => s.yM)) : 0;
  const labels = ringLabels(rings, toX, toY, units);
  const chosen = rings.map((r) => ({ ring: r, spot: r.spots.find((s) => s.bearingDeg === side) }));
  const sideLabel = BALL_SIDES.find((s) => s.bearingDeg === side)?.label ?? "";
  const sideRad = (side * Math.PI) / 180;
  const unit = shortUnitLabel(units);

  return (
    <figure className="grid gap-4 lg:grid-cols-[minmax(0,28rem)_minmax(0,1fr)] lg:items-start">
      <div className="mx-auto w-full max-w-[28rem]">
        <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby={`${titleId} ${descId}`} className="block h-auto w-full">
          <title id={titleId}>Aim spots all round the hole</title>
          <desc id={descId}>
            {`Plan of the green around the hole, uphill at the top. ${settingsWords}. For each length, a closed line joins the aim spots of putts coming from every side. All lie on the high side of the hole; straight up and down the slope the aim is the hole itself. The longest putts' spots reach ${formatShort(furthest, units)} above the hole.`}
          </desc>
          <defs>
            <linearGradient id={`${titleId}-slope`} x1="0" y1="0" x2="0" y2="1">
              <stop offset="0" stopColor="#eaf4dc" />
              <stop offset="1" stopColor="#bcd6ac" />
            </linearGradient>
          </defs>
          <rect x="0" y="0" width={W} height={H} rx="14" fill={`url(#${titleId}-slope)`} />
          {/* Grid every `step`, thin, so spots can be measured by eye. */}
          <g stroke="#5f7a55" strokeOpacity="0.28" strokeWidth="1">
            {gridXs.map((x) => (
              <line key={`gx${x.toFixed(4)}`} x1={toX(x)} x2={toX(x)} y1={PAD + 18} y2={H - PAD} />
            ))}
            {gridYs.map((y) => (
              <line key={`gy${y.toFixed(4)}`} x1={PAD} x2={W - PAD} y1={toY(y)} y2={toY(y)} />
            ))}
          </g>
          <text x={PAD} y={PAD + 6} fontSize="14" fontWeight="600" fill={INK}>
            ↑ uphill
          </text>
          <text x={W - PAD} y={PAD + 6} fontSize="14" fill={INK} textAnchor="end">
            grid: {formatShort(step, units)}
          </text>
          <text x={PAD} y={H - PAD + 10} fontSize="14" fontWeight="600" fill={INK}>
            ↓ the green falls this way
          </text>
          {/* The chosen side: the way its balls come in, toward the hole. */}
          <line
            x1={toX(0) + Math.sin(sideRad) * (W / 2 - PAD)}
            y1={toY(0) - Math.cos(sideRad) * (W / 2 - PAD)}
            x2={toX(0)}
            y2={toY(0)}
            stroke={INK}
            strokeOpacity="0.35"
            strokeWidth="2"
            strokeDasharray="1 5"
            strokeLinecap="round"
          />
          {/* The hole to scale, under the rings and see-through, so short putts' spots inside its rim still show. */}
          <circle
            data-testid="hole"
            cx={toX(0)}
            cy={toY(0)}
            r={Math.max(4, HOLE_RADIUS_M * k)}
            fill="#06090f"
            fillOpacity="0.22"
            stroke="#06090f"
            strokeWidth="2"
          />
          {rings.map((r, i) => {
            const s = RING_STYLES[i % RING_STYLES.length]!;
            if (r.spots.length < 2) return null;
            const d = r.spots.map((p, j) => `${j === 0 ? "M" : "L"}${toX(p.xM).toFixed(1)},${toY(p.yM).toFixed(1)}`).join(" ");
            return (
              <g key={r.distanceM} data-ring={distanceHeading(r.distanceM, units)}>
                <path
                  d={r.missing === 0 ? `${d} Z` : d}
                  fill="none"
                  stroke={s.colour}
                  strokeWidth="2.5"
                  strokeDasharray={s.dash || undefined}
                  strokeLinejoin="round"
                />
                {r.spots.map((p) => (
                  <circle
                    key={p.bearingDeg}
                    data-bearing={p.bearingDeg}
                    cx={toX(p.xM)}
                    cy={toY(p.yM)}
                    r={p.bearingDeg === side ? 5 : 2.2}
                    fill={s.colour}
                    stroke={p.bearingDeg === side ? "#ffffff" : "none"}
                    strokeWidth="2"
                  />
                ))}
              </g>
            );
          })}
          {labels.map((l) => (
            <text
              key={l.key}
              x={l.x}
              y={l.y}
              fontSize="14"
              fontWeight="600"
              fill={INK}
              textAnchor="middle"
              stroke="#f4f8ee"
              strokeWidth="4"
              paintOrder="stroke"
            >
              {l.text}
            </text>
          ))}
        </svg>
      </div>
      <figcaption className="flex flex-col gap-3 text-sm text-ink-700">
        <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Lengths drawn">
          {rings.map((r, i) => {
            const s = RING_STYLES[i % RING_STYLES.length]!;
            return (
              <li key={r.distanceM} className="flex items-center gap-1.5">
                <svg width="28" height="8" aria-hidden="true">
                  <line x1="1" x2="27" y1="4" y2="4" stroke={s.colour} strokeWidth="2.5" strokeDasharray={s.dash || undefined} />
                </svg>
                {distanceHeading(r.distanceM, units)} putts
                {r.missing > 0 ? <span className="text-ink-500"> ({r.missing} sides left out: the ball would not stop)</span> : null}
              </li>
            );
          })}
        </ul>
        <fieldset>
          <legend className="mb-1.5 font-medium text-ink-900">Pick out a ball coming from</legend>
          <div className="flex flex-wrap gap-1.5">
            {BALL_SIDES.map((b) => (
              <label
                key={b.bearingDeg}
                className="flex min-h-11 cursor-pointer items-center rounded-lg border-2 border-ink-900/15 bg-white px-2.5 has-checked:border-ink-900 has-checked:bg-ink-50 has-focus-visible:outline-3 has-focus-visible:outline-coral-500"
              >
                <input
                  type="radio"
                  name={`${titleId}-side`}
                  className="sr-only"
                  checked={side === b.bearingDeg}
                  onChange={() => setSide(b.bearingDeg)}
                />
                {b.label}
              </label>
            ))}
          </div>
        </fieldset>
        <div aria-live="polite">
          <p className="font-medium text-ink-900">Ball {sideLabel.toLowerCase()} of the hole, standing behind it:</p>
          <ul className="mt-1 flex flex-col">
            {chosen.map(({ ring, spot }) => (
              <li key={ring.distanceM} className="tabular-nums">
                {distanceHeading(ring.distanceM, units)}:{" "}
                {!spot
                  ? "no aim shown (the ball would not stop)"
                  : Math.abs(spot.aimOffsetM) < 0.005
                    ? "aim at the hole"
                    : `aim ${formatShort(spot.aimOffsetM, units)} ${spot.aimOffsetM < 0 ? "left" : "right"} of the hole`}
              </li>
            ))}
          </ul>
          <p className="mt-1 text-ink-500">
            Aims are measured across the line at the hole&apos;s distance; the grid is in {unit === "in" ? "inches" : "centimetres"} (
            {Number(toShortUnit(step, units).toFixed(1))} {unit} a square).
          </p>
        </div>
      </figcaption>
    </figure>
  );
}

type Label = { key: string; text: string; x: number; y: number };

/** Each length's name just above its ring's highest spot, pushed up so no two labels overlap (14 px type). */
function ringLabels(rings: AimRing[], toX: (x: number) => number, toY: (y: number) => number, units: UnitSystem): Label[] {
  const out: Label[] = [];
  const placed: { x: number; y: number; w: number }[] = [];
  for (const r of rings) {
    if (r.spots.length === 0) continue;
    const top = r.spots.reduce((a, b) => (b.yM > a.yM ? b : a));
    const text = distanceHeading(r.distanceM, units);
    const w = text.length * 8.5 + 8;
    let y = toY(top.yM) - 8;
    const x = toX(top.xM);
    for (let tries = 0; tries < 20; tries++) {
      const clash = placed.find((p) => Math.abs(p.x - x) < (p.w + w) / 2 && Math.abs(p.y - y) < 16);
      if (!clash) break;
      y = clash.y - 16;
    }
    placed.push({ x, y, w });
    out.push({ key: text, text, x, y: Math.max(30, y) });
  }
  return out;
}
