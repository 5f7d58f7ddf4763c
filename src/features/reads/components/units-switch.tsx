import { useId } from "react";
import clsx from "clsx";
import type { UnitSystem } from "#shared/units";

const options: ReadonlyArray<{ value: UnitSystem; label: string; long: string }> = [
  { value: "imperial", label: "ft · in", long: "Feet and inches" },
  { value: "metric", label: "m · cm", long: "Metres and centimetres" },
];

export type UnitsSwitchProps = { value: UnitSystem; onChange: (units: UnitSystem) => void; saving?: boolean; className?: string };

/** Feet/inches ↔ metres/centimetres, as a pair of radio buttons drawn as one switch. */
export function UnitsSwitch({ value, onChange, saving, className }: UnitsSwitchProps) {
  const name = useId();
  return (
    <fieldset className={clsx("flex items-center gap-3", className)} aria-busy={saving || undefined}>
      <legend className="sr-only">Units</legend>
      <span aria-hidden="true" className="text-sm font-medium text-ink-600">
        Units
      </span>
      <div className="inline-flex rounded-xl border-2 border-ink-900/15 bg-white p-1">
        {options.map((o) => (
          <label
            key={o.value}
            className={clsx(
              "flex min-h-10 cursor-pointer items-center rounded-lg px-3 text-sm font-medium transition-colors has-focus-visible:outline-3 has-focus-visible:outline-coral-500",
              value === o.value ? "bg-ink-900 text-sand-50" : "text-ink-700 hover:bg-ink-900/5",
            )}
          >
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="sr-only"
              aria-label={o.long}
            />
            <span aria-hidden="true">{o.label}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
