// Read training on a real green: the golfer writes down the slope and fall line they see, then measures them with
// the phone (components/measure) and sees how far their eye was off.
import { useState } from "react";
import { parseDecimal } from "#shared/units";
import { fallLineWords } from "../../../components/green-3d/words";
import { MeasureOnGreen, type Measured } from "../../../components/measure/measure-on-green";
import { Card, InputField, SelectField } from "../../../components/ui";

const DIRECTIONS = [
  { value: "0", label: "Toward the hole (downhill)" },
  { value: "45", label: "Right and toward the hole" },
  { value: "90", label: "To the right" },
  { value: "135", label: "Right and toward me" },
  { value: "180", label: "Toward me (uphill)" },
  { value: "225", label: "Left and toward me" },
  { value: "270", label: "To the left" },
  { value: "315", label: "Left and toward the hole" },
];

/** Signed difference of two directions, −180…180°. */
function angleGap(a: number, b: number): number {
  return ((a - b + 540) % 360) - 180;
}

export function EyeCheck() {
  const [slopeText, setSlopeText] = useState("");
  const [fall, setFall] = useState("90");
  const [measured, setMeasured] = useState<Measured | null>(null);
  const guess = parseDecimal(slopeText);
  const guessOk = guess !== null && guess >= 0 && guess <= 15;

  return (
    <Card className="mt-8 flex flex-col gap-4">
      <div>
        <h2 className="text-lg font-semibold tracking-tight">Check your eye on a real green</h2>
        <p className="text-sm text-ink-600">
          Stand behind a putt, say how steep it is and which way it falls, then let the phone measure it. Reading slopes by eye is the skill
          this trains.
        </p>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField
          label="Your slope (%)"
          inputMode="decimal"
          autoComplete="off"
          value={slopeText}
          onChange={(e) => setSlopeText(e.target.value)}
          hint="Most greens: 1–3 %"
          error={slopeText !== "" && !guessOk ? "Enter a slope from 0 to 15 %." : undefined}
        />
        <SelectField label="It falls" value={fall} onChange={(e) => setFall(e.target.value)} options={DIRECTIONS} />
      </div>
      <MeasureOnGreen onMeasured={setMeasured} />
      {measured && guessOk ? (
        <p className="text-sm text-ink-800" role="status">
          Your eye: {guess.toFixed(1)} %, the green {fallLineWords(Number(fall))}. The phone: {measured.slopePct.toFixed(1)} %. You read it{" "}
          {Math.abs(guess - measured.slopePct) < 0.25
            ? "about right"
            : `${Math.abs(guess - measured.slopePct).toFixed(1)} % too ${guess < measured.slopePct ? "flat" : "steep"}`}
          , and the direction {Math.abs(angleGap(Number(fall), measured.fallLineDeg)).toFixed(0)}° off.
        </p>
      ) : measured ? (
        <p className="text-sm text-ink-600">Write down your own reading first, then measure again to compare.</p>
      ) : null}
    </Card>
  );
}
