// The player's read: an aim (slider, or an amount and a side) and a pace as a flat-putt length (slider or a number).
import { useId, useState } from "react";
import {
  formatLength,
  fromLongUnit,
  fromShortUnit,
  longUnitLabel,
  parseDecimal,
  shortUnitLabel,
  toLongUnit,
  toShortUnit,
  type UnitSystem,
} from "#shared/units";
import { aimWords } from "../../../components/green-3d/words";

const inputClass =
  "min-h-11 w-28 rounded-xl border-2 border-ink-900/15 bg-white px-3 text-base text-ink-900 tabular-nums hover:border-ink-900/30 focus:border-ink-700 focus:outline-none focus-visible:outline-3 focus-visible:outline-coral-500";

/** Aim range for a putt, m either side: generous (a dying ball on a steep green can need half the distance). */
export function aimRangeM(distanceM: number): number {
  return Math.min(8, Math.max(0.6, Math.ceil(0.55 * distanceM * 10) / 10));
}

/** Flat-putt length range for a putt, m. */
export function flatPuttRangeM(distanceM: number): { min: number; max: number } {
  return { min: Math.max(0.3, Math.floor(0.3 * distanceM * 10) / 10), max: Math.ceil((2 * distanceM + 0.5) * 10) / 10 };
}

export function AimControl({
  aimOffsetM,
  distanceM,
  units,
  disabled,
  onChange,
}: {
  aimOffsetM: number;
  distanceM: number;
  units: UnitSystem;
  disabled?: boolean;
  onChange: (m: number) => void;
}) {
  const id = useId();
  const range = aimRangeM(distanceM);
  const fmt = (m: number) => String(Number(toShortUnit(Math.abs(m), units).toFixed(1)));
  const [draft, setDraft] = useState(fmt(aimOffsetM));
  const [side, setSide] = useState<"left" | "right">(aimOffsetM > 0 ? "right" : "left");
  const [seen, setSeen] = useState(aimOffsetM);
  // When the aim moves elsewhere (the slider, a drag on the green), the typed amount follows it.
  if (seen !== aimOffsetM) {
    setSeen(aimOffsetM);
    setDraft(fmt(aimOffsetM));
    if (aimOffsetM !== 0) setSide(aimOffsetM < 0 ? "left" : "right");
  }
  const commit = (amountText: string, s: "left" | "right") => {
    const v = parseDecimal(amountText);
    if (v === null || v < 0) return;
    const m = Math.min(range, fromShortUnit(v, units)) * (s === "left" ? -1 : 1);
    setSeen(m);
    onChange(m);
  };
  return (
    <fieldset className="flex flex-col gap-1.5" disabled={disabled}>
      <legend className="sr-only">Your aim</legend>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <label htmlFor={`${id}-range`} className="text-sm font-medium text-ink-800">
          Aim at the hole&apos;s distance
        </label>
        <output htmlFor={`${id}-range`} className="font-semibold text-ink-900 tabular-nums">
          {aimWords(aimOffsetM, units)}
        </output>
      </div>
      <input
        id={`${id}-range`}
        type="range"
        min={-range}
        max={range}
        step={0.01}
        value={aimOffsetM}
        aria-valuetext={aimWords(aimOffsetM, units)}
        onChange={(e) => onChange(Number(e.target.value))}
        className="h-11 w-full cursor-pointer accent-ink-900"
      />
      <div className="flex justify-between text-xs font-medium text-ink-500" aria-hidden="true">
        <span>left</span>
        <span>at the hole</span>
        <span>right</span>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <label htmlFor={`${id}-amount`} className="text-sm text-ink-700">
          Aim offset ({shortUnitLabel(units)})
        </label>
        <input
          id={`${id}-amount`}
          type="number"
          inputMode="decimal"
          min={0}
          step={units === "metric" ? 1 : 0.5}
          value={draft}
          onChange={(e) => {
            setDraft(e.target.value);
            commit(e.target.value, side);
          }}
          className={inputClass}
        />
        <label htmlFor={`${id}-side`} className="sr-only">
          Side of the hole
        </label>
        <select
          id={`${id}-side`}
          value={side}
          onChange={(e) => {
            const s = e.target.value === "right" ? "right" : "left";
            setSide(s);
            commit(draft, s);
          }}
          className={`${inputClass} w-auto`}
        >
          <option value="left">left of the hole</option>
          <option value="right">right of the hole</option>
        </select>
      </div>
    </fieldset>
  );
}

export function FlatPuttControl({
  flatPuttLengthM,
  distanceM,
  units,
  disabled,
  onChange,
}: {
  flatPuttLengthM: number;
  distanceM: number;
  units: UnitSystem;
  disabled?: boolean;
  onChange: (m: number) => void;
}) {
  const id = useId();
  const { min, max } = flatPuttRangeM(distanceM);
  const fmt = (m: number) => String(Number(toLongUnit(m, units).toFixed(units === "metric" ? 2 : 1)));
  const [draft, setDraft] = useState(fmt(flatPuttLengthM));
  const [seen, setSeen] = useState(flatPuttLengthM);
  if (seen !== flatPuttLengthM) {
    setSeen(flatPuttLengthM);
    setDraft(fmt(flatPuttLengthM));
  }
  return (
    <fieldset className="flex flex-col gap-1.5" disabled={disabled}>
      <legend className="sr-only">Your pace</legend>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <label htmlFor={`${id}-range`} className="text-sm font-medium text-ink-800">
          Pace: hit it like a flat putt of
        </label>
        <output htmlFor={`${id}-range`} className="font-semibold text-ink-900 tabular-nums">
          {formatLength(flatPuttLengthM, units)}
        </output>
      </div>
      <input
        id={`${id}-range`}
        type="range"
        min={min}
        max={max}
        step={0.05}
        value={flatPuttLengthM}
        aria-valuetext={`as hard as a flat ${formatLength(flatPuttLengthM, units)} putt`}
        onChange={(e) => onChange(Number(e.target.value))}
        className="h-11 w-full cursor-pointer accent-ink-900"
      />
      <div className="flex justify-between text-xs font-medium text-ink-500" aria-hidden="true">
        <span>softer</span>
        <span>firmer</span>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <label htmlFor={`${id}-number`} className="text-sm text-ink-700">
          Flat-putt length ({longUnitLabel(units)})
        </label>
        <input
          id={`${id}-number`}
          type="number"
          inputMode="decimal"
          min={toLongUnit(min, units).toFixed(1)}
          max={toLongUnit(max, units).toFixed(1)}
          step={units === "metric" ? 0.1 : 0.5}
          value={draft}
          onChange={(e) => {
            setDraft(e.target.value);
            const v = parseDecimal(e.target.value);
            if (v === null) return;
            const m = Math.min(max, Math.max(min, fromLongUnit(v, units)));
            setSeen(m);
            onChange(m);
          }}
          className={inputClass}
        />
      </div>
      <p className="text-sm text-ink-500">Uphill putts play longer than they measure, downhill ones shorter.</p>
    </fieldset>
  );
}
