import { formatStimp } from "#shared/format";
import { useState } from "react";
import type { UnitSystem } from "#shared/units";
import { Alert, Button, InputField } from "../../../components/ui";
import { formatRoll, stimpFeetAndInches, rollFt, twoWayStimp, type RollText } from "../utils/stimp";

export const STIMP_CAUTION = "Measure green speed only where the course allows it and off the line of play.";

function RollInputs({
  legend,
  hint,
  value,
  onChange,
  units,
}: {
  legend: string;
  hint: string;
  value: RollText;
  onChange: (v: RollText) => void;
  units: UnitSystem;
}) {
  const [major, minor] = units === "imperial" ? ["ft", "in"] : ["m", "cm"];
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="text-sm font-medium text-ink-800">{legend}</legend>
      <p className="text-sm text-ink-500">{hint}</p>
      <div className="mt-1 grid grid-cols-2 gap-3">
        <InputField
          label={
            <>
              <span className="sr-only">{legend}, </span>
              {major}
            </>
          }
          className="text-lg"
          inputMode="decimal"
          autoComplete="off"
          value={value.major}
          onChange={(e) => onChange({ ...value, major: e.target.value })}
        />
        <InputField
          label={
            <>
              <span className="sr-only">{legend}, </span>
              {minor}
            </>
          }
          className="text-lg"
          inputMode="decimal"
          autoComplete="off"
          value={value.minor}
          onChange={(e) => onChange({ ...value, minor: e.target.value })}
        />
      </div>
    </fieldset>
  );
}

export type StimpHelperProps = {
  units: UnitSystem;
  /** Saves the two rolls (feet); the server applies the same correction. */
  onSave: (rolls: { upFt: number; downFt: number }) => void;
  saving?: boolean;
};

/**
 * Two rolls in opposite directions on a slope → the corrected Stimp, shown before saving:
 * S = 2·S↑·S↓/(S↑ + S↓) (A. D. Brede, USGA Green Section Record 28(6), 1990), via physics' stimpFromTwoWays.
 */
export function StimpHelper({ units, onSave, saving = false }: StimpHelperProps) {
  const [up, setUp] = useState<RollText>({ major: "", minor: "" });
  const [down, setDown] = useState<RollText>({ major: "", minor: "" });
  const upFt = rollFt(up, units);
  const downFt = rollFt(down, units);
  const typed = (r: RollText) => r.major.trim() !== "" || r.minor.trim() !== "";
  const result = twoWayStimp(upFt, downFt);
  const bothTyped = typed(up) && typed(down);

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-600">
        On a slope a single roll is too long downhill and too short uphill. Roll from the same spot both ways (average three balls each way)
        and enter how far the balls rolled; the harmonic mean of the two gives the green’s speed as if it were level (Brede, 1990).
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        <RollInputs legend="Up-slope roll" hint="The balls rolled up the slope" value={up} onChange={setUp} units={units} />
        <RollInputs legend="Down-slope roll" hint="The balls rolled back down" value={down} onChange={setDown} units={units} />
      </div>
      <div aria-live="polite" className="rounded-xl bg-ink-900 px-4 py-3 text-sand-50">
        {result.ok ? (
          <>
            <p className="text-sm text-sand-200">Corrected Stimp</p>
            <p className="text-3xl font-semibold tabular-nums" data-testid="corrected-stimp">
              {stimpFeetAndInches(result.stimpFt)}
            </p>
            <p className="mt-1 text-sm text-sand-200">
              From {formatRoll(result.upFt, units)} up and {formatRoll(result.downFt, units)} down; a plain average would say{" "}
              {result.plainAverageFt.toFixed(1)} ft.
            </p>
          </>
        ) : (
          <p className="text-sand-200">{bothTyped ? result.reason : "Enter both rolls to see the corrected Stimp."}</p>
        )}
      </div>
      <Alert tone="warning">{STIMP_CAUTION}</Alert>
      <Button
        variant="primary"
        disabled={!result.ok}
        loading={saving}
        loadingText="Saving…"
        onClick={() => result.ok && onSave({ upFt: result.upFt, downFt: result.downFt })}
        className="sm:self-start"
      >
        {result.ok ? `Save ${formatStimp(result.stimpFt)} ft` : "Save the reading"}
      </Button>
    </div>
  );
}
