import { useId } from "react";
import type { UnitSystem } from "#shared/units";
import { paceFeel, rollPastWords } from "../utils/pace-words";
import { ROLL_PAST_RANGE_M } from "../utils/rehearse-putt";

/** The pace, as roll-past, from dying (0) to firm (1.5 m past). A native range input: arrow keys, Home, End work. */
export function PaceControl({ rollPastM, units, onChange }: { rollPastM: number; units: UnitSystem; onChange: (m: number) => void }) {
  const id = useId();
  const words = `${rollPastWords(rollPastM, units)} past the hole, ${paceFeel(rollPastM)}`;
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <label htmlFor={id} className="text-sm font-medium text-ink-800">
          Pace: roll-past if it misses
        </label>
        <output htmlFor={id} className="text-base font-semibold text-ink-900 tabular-nums">
          {rollPastWords(rollPastM, units)} <span className="font-normal text-ink-500">({paceFeel(rollPastM)})</span>
        </output>
      </div>
      <input
        id={id}
        type="range"
        min={ROLL_PAST_RANGE_M.min}
        max={ROLL_PAST_RANGE_M.max}
        step={0.01}
        value={rollPastM}
        aria-valuetext={words}
        onChange={(e) => onChange(Number(e.target.value))}
        className="h-11 w-full cursor-pointer accent-coral-500"
      />
      <div className="flex justify-between text-xs font-medium text-ink-500" aria-hidden="true">
        <span>dying (0)</span>
        <span>firm ({rollPastWords(ROLL_PAST_RANGE_M.max, units)} past)</span>
      </div>
    </div>
  );
}
