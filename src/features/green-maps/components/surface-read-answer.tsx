import { atHoleText } from "#shared/format";
import { formatLength, formatShort, type UnitSystem } from "#shared/units";
import { aimWords, holeWidthsWords } from "../../../components/green-3d/words";
import type { SurfaceReadResponse } from "../api/solve-on-surface";

const BREAK_WORDS: Record<string, string> = {
  "left-to-right": "Breaks left to right",
  "right-to-left": "Breaks right to left",
  none: "No break to speak of",
};

/** The read on the real surface: aim, pace, flat-putt length, in the words of the read page. */
export function SurfaceReadAnswer({ read, units, updating }: { read: SurfaceReadResponse; units: UnitSystem; updating: boolean }) {
  const side = read.startLineDeg < 0 ? "left" : "right";
  return (
    <section aria-label="The read on this green" className="flex flex-col gap-3" aria-busy={updating || undefined}>
      <div className="flex items-center justify-between gap-2">
        <h2 className="text-sm font-semibold tracking-wide text-coral-700 uppercase">The read on this green</h2>
        {updating ? (
          <span role="status" className="text-xs font-medium text-ink-500">
            Updating…
          </span>
        ) : null}
      </div>
      <p className="text-2xl leading-tight font-semibold tracking-tight" data-testid="surface-aim">
        Aim {aimWords(read.aimOffsetM, units, read.startLineDeg)}
      </p>
      <p className="text-sm text-ink-600">
        {read.aimOffsetM === null ? "Judge it by the start direction" : holeWidthsWords(read.aimOffsetM)}; start line{" "}
        {Math.abs(read.startLineDeg).toFixed(1)}° {side} of the straight line. {BREAK_WORDS[read.breaks] ?? ""}.
      </p>
      <dl className="grid grid-cols-2 gap-3">
        <div className="rounded-xl bg-white p-3 ring-1 ring-ink-900/5">
          <dt className="text-sm text-ink-600">Pace</dt>
          <dd className="font-semibold">Finish {formatShort(read.rollPastM, units)} past if it misses</dd>
          <dd className="text-sm text-ink-600">{atHoleText(read.entrySpeedMps, units)} at the hole</dd>
        </div>
        <div className="rounded-xl bg-white p-3 ring-1 ring-ink-900/5">
          <dt className="text-sm text-ink-600">Flat-putt length</dt>
          <dd className="font-semibold" data-testid="surface-flat-putt">
            as hard as a flat {formatLength(Math.max(0, read.flatPuttLengthM), units)} putt
          </dd>
          <dd className="text-sm text-ink-600">the putt is {formatLength(read.distanceM, units)}</dd>
        </div>
      </dl>
      <p className="text-sm text-ink-500">
        Rolled on the surface of the map; the average slope along this putt is {read.meanPlane.slopePct.toFixed(1)} %. Grain and wind are
        yours to judge.
      </p>
    </section>
  );
}
