import { TARGET_ROLL_PAST_M, type Evaluation } from "#shared/training";
import { formatLength, formatShort, type UnitSystem } from "#shared/units";
import { aimWords, holeWidthsWords } from "../../../components/green-3d/words";

type Ok = Extract<Evaluation, { ok: true }>;

/** Short lengths in cm or inches, longer ones (two feet and up) as "5 ft 11 in" or metres. */
function lengthWords(m: number, units: UnitSystem): string {
  return Math.abs(m) < 0.6 ? formatShort(m, units) : formatLength(Math.abs(m), units);
}

function finishWords(e: Ok, units: UnitSystem): string {
  const y = e.yours;
  if (y.holed) return "Your ball drops.";
  const along =
    Math.abs(y.finishPastM) < 0.01 ? "level with the hole" : `${lengthWords(y.finishPastM, units)} ${y.finishPastM > 0 ? "past" : "short"}`;
  const side =
    Math.abs(y.finishSideM) < 0.01 ? "" : ` and ${lengthWords(y.finishSideM, units)} ${y.finishSideM > 0 ? "right" : "left"} of it`;
  return `${y.outcome === "lip-out" ? "It lips out and" : "Your ball misses and"} stops ${along}${side}.`;
}

function aimErrorWords(e: Ok, units: UnitSystem): string {
  if (Math.abs(e.aimErrorM) < 0.005) return "Your aim was spot on.";
  return `You aimed ${lengthWords(e.aimErrorM, units)} too far ${e.aimErrorM > 0 ? "right" : "left"} (${holeWidthsWords(e.aimErrorM)}).`;
}

function paceErrorWords(e: Ok, distanceM: number, units: UnitSystem): string {
  const share = Math.round((Math.abs(e.paceErrorM) / distanceM) * 100);
  if (Math.abs(e.paceErrorM) < 0.02)
    return `Your pace was spot on: hit it as hard as a flat ${formatLength(e.truth.flatPuttLengthM, units)} putt.`;
  return `You hit it as hard as a flat ${formatLength(e.yours.flatPuttLengthM, units)} putt; it needed a flat ${formatLength(e.truth.flatPuttLengthM, units)} putt, so you were ${lengthWords(e.paceErrorM, units)} ${e.paceErrorM > 0 ? "firmer" : "softer"} than needed (${share} % of the putt's length).`;
}

/**
 * The score and what it is made of, in words. `scored` false (a second read of a putt whose line was seen): no
 * score, the same account of the roll.
 */
export function ResultPanel({
  result,
  distanceM,
  units,
  scored = true,
}: {
  result: Ok;
  distanceM: number;
  units: UnitSystem;
  scored?: boolean;
}) {
  return (
    <section aria-labelledby="training-result" className="flex flex-col gap-3 rounded-(--radius-card) bg-ink-900 p-4 text-sand-50 sm:p-5">
      {scored ? (
        <div className="flex items-baseline gap-3">
          <h2 id="training-result" className="text-sm font-semibold tracking-wide text-coral-300 uppercase">
            Score
          </h2>
          <p className="text-4xl font-semibold tabular-nums" aria-label={`Score ${result.score} out of 100`}>
            {result.score}
            <span className="text-lg font-normal text-sand-200"> / 100</span>
          </p>
        </div>
      ) : (
        <h2 id="training-result" className="text-sm font-semibold tracking-wide text-coral-300 uppercase">
          Practice read · not scored
        </h2>
      )}
      <p className="text-lg font-medium">{finishWords(result, units)}</p>
      <ul className="flex flex-col gap-1.5 text-sand-100">
        <li>{aimErrorWords(result, units)}</li>
        <li>{paceErrorWords(result, distanceM, units)}</li>
        <li>
          The true read, for a pace that would finish {formatShort(TARGET_ROLL_PAST_M, units)} past: aim{" "}
          {aimWords(result.truth.aimOffsetM, units)}, hit as hard as a flat {formatLength(result.truth.flatPuttLengthM, units)} putt.
        </li>
      </ul>
    </section>
  );
}
