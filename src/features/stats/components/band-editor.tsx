import { useState } from "react";
import { longUnitLabel, type UnitSystem } from "#shared/units";
import { Button, InputField } from "../../../components/ui";
import { bandLabel, DEFAULT_BAND_EDGES_M, edgesFromText, edgesToText } from "../utils/bands";

export type BandEditorProps = { units: UnitSystem; edgesM: number[] | null; onChange: (edgesM: number[] | null) => void };

/** Band edges in the player's unit ("3, 6, 10, 15"); the first band starts at 0 and the last is open-ended. */
export function BandEditor({ units, edgesM, onChange }: BandEditorProps) {
  const current = edgesM ?? DEFAULT_BAND_EDGES_M[units];
  const [text, setText] = useState(edgesToText(current, units));
  const [error, setError] = useState<string | undefined>();
  const parsed = edgesFromText(text, units);
  const preview = parsed.ok ? [0, ...parsed.edgesM].map((from, i, all) => bandLabel(from, all[i + 1] ?? null, units)) : [];
  return (
    <form
      noValidate
      aria-label="Distance bands"
      className="flex flex-col gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (!parsed.ok) {
          setError(parsed.message);
          return;
        }
        setError(undefined);
        onChange(parsed.edgesM);
      }}
    >
      <InputField
        label={`Band edges (${longUnitLabel(units)})`}
        hint="Separated by commas. The first band starts at 0 and the last runs on from the final edge."
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setError(undefined);
        }}
        error={error}
        inputMode="decimal"
        autoComplete="off"
      />
      {preview.length > 0 ? <p className="text-sm text-ink-600">Bands: {preview.join(" · ")}</p> : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" size="sm">
          Use these bands
        </Button>
        <Button
          size="sm"
          variant="ghost"
          onClick={() => {
            setText(edgesToText(DEFAULT_BAND_EDGES_M[units], units));
            setError(undefined);
            onChange(null);
          }}
        >
          Back to the defaults
        </Button>
      </div>
    </form>
  );
}
