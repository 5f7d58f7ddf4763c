import { useState, type FormEvent } from "react";
import { READ_LIMITS } from "#shared/schemas/reads";
import { fromLongUnit, longUnitLabel, parseDecimal, toLongUnit, type UnitSystem } from "#shared/units";
import { formatNumber } from "#shared/format";
import { Button, InputField } from "../../../components/ui";
import type { RehearsePutt } from "../utils/rehearse-putt";

type Draft = { distance: string; slopePct: string; fallLineDeg: string; stimpFt: string };

function draftOf(p: RehearsePutt, units: UnitSystem): Draft {
  return {
    distance: formatNumber(toLongUnit(p.distanceM, units), 2),
    slopePct: String(p.slopePct),
    fallLineDeg: String(p.fallLineDeg),
    stimpFt: String(p.stimpFt),
  };
}

/** Change the putt on the green; the page's URL carries it (so a changed putt can be shared). */
export function PuttEditor({ putt, units, onSubmit }: { putt: RehearsePutt; units: UnitSystem; onSubmit: (p: RehearsePutt) => void }) {
  const [draft, setDraft] = useState(() => draftOf(putt, units));
  const [errors, setErrors] = useState<Partial<Record<keyof Draft, string>>>({});
  const unit = longUnitLabel(units);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const n = (t: string) => parseDecimal(t) ?? Number.NaN;
    const distanceM = fromLongUnit(n(draft.distance), units);
    const next = {
      ...putt,
      distanceM,
      slopePct: n(draft.slopePct),
      fallLineDeg: n(draft.fallLineDeg),
      stimpFt: n(draft.stimpFt),
    };
    const bad: Partial<Record<keyof Draft, string>> = {};
    const check = (k: keyof Draft, v: number, [min, max]: [number, number], words: string) => {
      if (!Number.isFinite(v) || v < min || v > max || draft[k].trim() === "") bad[k] = words;
    };
    check(
      "distance",
      distanceM,
      [READ_LIMITS.distanceM.min, READ_LIMITS.distanceM.max],
      `From ${toLongUnit(READ_LIMITS.distanceM.min, units).toFixed(1)} to ${Math.round(toLongUnit(READ_LIMITS.distanceM.max, units))} ${unit}`,
    );
    check("slopePct", next.slopePct, [0, READ_LIMITS.slopePct.max], `From 0 to ${READ_LIMITS.slopePct.max} %`);
    check("fallLineDeg", next.fallLineDeg, [0, 359.999], "From 0 to 359°");
    check(
      "stimpFt",
      next.stimpFt,
      [READ_LIMITS.stimpFt.min, READ_LIMITS.stimpFt.max],
      `From ${READ_LIMITS.stimpFt.min} to ${READ_LIMITS.stimpFt.max} ft`,
    );
    setErrors(bad);
    if (Object.keys(bad).length === 0) onSubmit(next);
  };
  const field = (k: keyof Draft, label: string, hint?: string) => (
    <InputField
      label={label}
      hint={hint}
      inputMode="decimal"
      value={draft[k]}
      error={errors[k]}
      onChange={(e) => setDraft((d) => ({ ...d, [k]: e.target.value }))}
    />
  );
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" noValidate>
      {field("distance", `Distance (${unit})`)}
      {field("slopePct", "Slope (%)")}
      {field("fallLineDeg", "Fall line (°)", "0 downhill, 90 falls right, 180 uphill, 270 falls left")}
      {field("stimpFt", "Stimp (ft)")}
      <div className="sm:col-span-2">
        <Button type="submit" variant="secondary">
          Show this putt
        </Button>
      </div>
    </form>
  );
}
