import { parseDecimal } from "#shared/units";
import { useEffect, useEffectEvent, useId, useState } from "react";
import clsx from "clsx";
import type { MissSide } from "#shared/schemas/putts";
import { fromShortUnit, shortUnitLabel, type UnitSystem } from "#shared/units";
import { Button } from "../../../components/ui";

type Length = "short" | "long";

const IDLE_SKIP_MS = 30_000;

function Toggle<T extends string>({
  legend,
  options,
  value,
  onChange,
}: {
  legend: string;
  options: { value: T; label: string }[];
  value: T | null;
  onChange: (v: T | null) => void;
}) {
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="text-sm font-medium text-ink-800">{legend}</legend>
      <div className="grid grid-cols-2 gap-2">
        {options.map((o) => (
          <button
            key={o.value}
            type="button"
            aria-pressed={value === o.value}
            onClick={() => onChange(value === o.value ? null : o.value)}
            className={clsx(
              "min-h-12 rounded-xl border-2 px-3 font-medium transition-colors",
              value === o.value
                ? "border-ink-900 bg-ink-900 text-sand-50"
                : "border-ink-900/15 bg-white text-ink-900 hover:border-ink-900/30",
            )}
          >
            {o.label}
          </button>
        ))}
      </div>
    </fieldset>
  );
}

export type MissDetailsProps = {
  units: UnitSystem;
  onSave: (details: { missSide?: MissSide; missLengthM?: number }) => void;
  onSkip: () => void;
};

/** Where the miss went, all optional: side, short or long, and by how much. The next putt skips it. */
export function MissDetails({ units, onSave, onSkip }: MissDetailsProps) {
  const id = useId();
  const [side, setSide] = useState<MissSide | null>(null);
  const [length, setLength] = useState<Length | null>(null);
  const [howFar, setHowFar] = useState("");
  const far = parseDecimal(howFar) ?? Number.NaN;
  // Left alone, the miss is sent without details, so a walk to the next ball does not hold it back.
  const skipIdle = useEffectEvent(onSkip);
  useEffect(() => {
    const timer = setTimeout(skipIdle, IDLE_SKIP_MS);
    return () => clearTimeout(timer);
  }, [side, length, howFar]);
  const farOk = howFar.trim() !== "" && Number.isFinite(far) && far > 0 && far <= (units === "imperial" ? 360 : 900);
  // A miss length is stored as a signed length, so "long" without how far cannot be kept: Save waits for it (or
  // for Short/Long to be taken back) rather than drop what the screen shows (issue 14, as in the session logger).
  const needsFar = length !== null && !farOk;

  const save = () => {
    const details: { missSide?: MissSide; missLengthM?: number } = {};
    if (side) details.missSide = side;
    if (length && farOk) details.missLengthM = Math.round(fromShortUnit(far, units) * (length === "short" ? -1 : 1) * 1000) / 1000;
    onSave(details);
  };

  return (
    <section aria-label="Miss details" className="flex flex-col gap-4 rounded-(--radius-card) bg-white p-4 ring-1 ring-ink-900/10">
      <p className="text-sm text-ink-600">Where did it miss? Optional: the next putt skips this.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <Toggle
          legend="Side"
          value={side}
          onChange={setSide}
          options={[
            { value: "left", label: "Left" },
            { value: "right", label: "Right" },
          ]}
        />
        <Toggle
          legend="Length"
          value={length}
          onChange={setLength}
          options={[
            { value: "short", label: "Short" },
            { value: "long", label: "Long" },
          ]}
        />
      </div>
      {length ? (
        <div className="flex flex-col gap-1.5">
          <label htmlFor={`${id}-far`} className="text-sm font-medium text-ink-800">
            How far {length} ({shortUnitLabel(units)})
          </label>
          <input
            id={`${id}-far`}
            inputMode="decimal"
            value={howFar}
            onChange={(e) => setHowFar(e.target.value)}
            className="block min-h-12 w-40 rounded-xl border-2 border-ink-900/15 bg-white px-4 text-base focus:border-ink-700 focus:outline-none"
          />
          {howFar.trim() !== "" && !farOk ? (
            <p className="text-sm text-bad-600">Enter a length, e.g. {units === "imperial" ? "18" : "45"}.</p>
          ) : null}
        </div>
      ) : null}
      {needsFar && howFar.trim() === "" ? (
        <p className="text-sm text-ink-700" role="status">
          Enter how far {length}, or tap {length === "short" ? "Short" : "Long"} again to save the miss without it.
        </p>
      ) : null}
      <div className="flex gap-2">
        <Button onClick={save} disabled={needsFar || (!side && !length)}>
          Save miss
        </Button>
        <Button variant="ghost" onClick={onSkip}>
          Skip
        </Button>
      </div>
    </section>
  );
}
