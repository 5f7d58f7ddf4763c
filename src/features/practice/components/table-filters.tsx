import { useState, type KeyboardEvent, type ReactNode } from "react";
import { fromLongUnit, longUnitLabel, parseDecimal, toLongUnit, type UnitSystem } from "#shared/units";
import { Button, InputField, SelectField } from "../../../components/ui";

/** Filters in a panel that folds away on a phone; says how many are on. */
export function FilterBar({ active, onClear, children }: { active: number; onClear: () => void; children: ReactNode }) {
  return (
    <details className="rounded-xl border-2 border-ink-900/10 bg-white/60 px-4 py-1 open:pb-4 sm:open:pb-4" open={active > 0 || undefined}>
      <summary className="flex min-h-12 cursor-pointer items-center justify-between gap-3 font-medium text-ink-800">
        <span>Filters{active > 0 ? ` (${active} on)` : ""}</span>
      </summary>
      <div className="mt-2 grid items-end gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {children}
        {active > 0 ? (
          <Button variant="ghost" size="sm" onClick={onClear} className="justify-self-start">
            Clear filters
          </Button>
        ) : null}
      </div>
    </details>
  );
}

export function DateRangeFilter({ from, to, onChange }: { from?: string; to?: string; onChange: (from?: string, to?: string) => void }) {
  return (
    <>
      <InputField label="From" type="date" value={from ?? ""} max={to} onChange={(e) => onChange(e.target.value || undefined, to)} />
      <InputField label="To" type="date" value={to ?? ""} min={from} onChange={(e) => onChange(from, e.target.value || undefined)} />
    </>
  );
}

export function SelectFilter({
  label,
  value,
  options,
  onChange,
}: {
  label: string;
  value: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  onChange: (v: string) => void;
}) {
  return <SelectField label={label} value={value} options={options} onChange={(e) => onChange(e.target.value)} />;
}

function shown(m: number | undefined, units: UnitSystem): string {
  return m === undefined ? "" : String(Number(toLongUnit(m, units).toFixed(2)));
}

function parse(text: string, units: UnitSystem): number | undefined | null {
  if (text.trim() === "") return undefined;
  const n = parseDecimal(text);
  if (n === null || n < 0) return null;
  return Math.min(60, fromLongUnit(n, units));
}

/** Shortest and longest putt in the user's unit; applied on Enter or when the field is left. Sends metres. */
export function DistanceRangeFilter({
  minM,
  maxM,
  units,
  onChange,
}: {
  minM?: number;
  maxM?: number;
  units: UnitSystem;
  onChange: (minM?: number, maxM?: number) => void;
}) {
  const [text, setText] = useState({ min: shown(minM, units), max: shown(maxM, units), key: `${minM}|${maxM}|${units}` });
  const key = `${minM}|${maxM}|${units}`;
  if (text.key !== key) setText({ min: shown(minM, units), max: shown(maxM, units), key });
  const [error, setError] = useState<string | undefined>();
  const apply = () => {
    const a = parse(text.min, units);
    const b = parse(text.max, units);
    if (a === null || b === null) {
      setError("Enter a length, or leave it empty");
      return;
    }
    setError(undefined);
    onChange(a, b);
  };
  const unit = longUnitLabel(units);
  const onKey = (e: KeyboardEvent) => {
    if (e.key === "Enter") apply();
  };
  return (
    <>
      <InputField
        label={`Shortest putt (${unit})`}
        inputMode="decimal"
        value={text.min}
        error={error}
        onChange={(e) => setText({ ...text, min: e.target.value })}
        onBlur={apply}
        onKeyDown={onKey}
      />
      <InputField
        label={`Longest putt (${unit})`}
        inputMode="decimal"
        value={text.max}
        onChange={(e) => setText({ ...text, max: e.target.value })}
        onBlur={apply}
        onKeyDown={onKey}
      />
    </>
  );
}
