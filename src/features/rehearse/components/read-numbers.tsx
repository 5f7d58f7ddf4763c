import { STOPPED_AT_HOLE_MPS, formatSpeed } from "#shared/format";
import type { Read } from "#physics";
import { formatLength, type UnitSystem } from "#shared/units";
import { aimWords, holeWidthsWords } from "../../../components/green-3d/words";
import { rollPastWords } from "../utils/pace-words";

function Row({ term, value, detail }: { term: string; value: string; detail?: string }) {
  return (
    <div className="flex flex-col gap-0.5 rounded-xl bg-white/70 px-3 py-2 ring-1 ring-ink-900/5">
      <dt className="text-xs font-semibold tracking-wide text-ink-500 uppercase">{term}</dt>
      <dd className="text-lg leading-tight font-semibold text-ink-900 tabular-nums">{value}</dd>
      {detail ? <dd className="text-sm text-ink-500">{detail}</dd> : null}
    </div>
  );
}

function breakWords(b: Read["breaks"]): string {
  return b === "left-to-right" ? "breaks left to right" : b === "right-to-left" ? "breaks right to left" : "runs straight";
}

/** The read's numbers for the chosen pace. */
export function ReadNumbers({ read, units }: { read: Read; units: UnitSystem }) {
  const side = read.startLineDeg < 0 ? "left" : "right";
  return (
    <dl aria-label="The read at this pace" className="grid grid-cols-2 gap-2">
      <Row
        term="Aim"
        value={aimWords(read.aimOffsetM, units, read.startLineDeg)}
        detail={`${read.aimOffsetM === null ? "judge it by the start direction" : holeWidthsWords(read.aimOffsetM)}; start line ${Math.abs(read.startLineDeg).toFixed(1)}° ${Math.abs(read.startLineDeg) < 0.05 ? "" : side}; ${breakWords(read.breaks)}`}
      />
      <Row term="Roll-past" value={`${rollPastWords(read.rollPastM, units)} past`} detail="if it misses" />
      <Row
        term="Flat-putt length"
        value={formatLength(Math.max(0, read.flatPuttLengthM), units)}
        detail="hit it as hard as a flat putt this long"
      />
      <Row
        term="At the hole"
        value={
          read.entrySpeedMps < STOPPED_AT_HOLE_MPS ? "Just reaches it, dying" : `Still rolling, ${formatSpeed(read.entrySpeedMps, units)}`
        }
        detail={`${formatSpeed(read.launchSpeedMps, units)} off the putter`}
      />
    </dl>
  );
}
