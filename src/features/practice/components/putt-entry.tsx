import { useState } from "react";
import clsx from "clsx";
import { BREAK_TYPES, type BreakType, type MissSide } from "#shared/schemas/putts";
import { fromLongUnit, fromShortUnit, longUnitLabel, shortUnitLabel, type UnitSystem } from "#shared/units";
import { ChipGroup, Stepper } from "../../../components/ui";
import { DISTANCE_PICKS, distanceLabel, MISS_PICKS, missLabel, samePick, stepDistanceM, stepMissM } from "../utils/distances";
import { BREAK_LABELS } from "../utils/putt-text";

export type PuttDraft = {
  distanceM: number;
  holed: boolean;
  missSide: MissSide | null;
  missLengthM: number | null;
  breakType: BreakType | null;
};

export type PuttEntryProps = {
  units: UnitSystem;
  distanceM: number;
  onDistanceChange: (m: number) => void;
  breakType: BreakType | null;
  onBreakTypeChange: (b: BreakType | null) => void;
  onLog: (draft: PuttDraft) => void;
};

type Finish = "short" | "long";

/**
 * Distance (stepper and quick picks; it stays for the next putt), an optional break type (stays too), one tap for
 * "Holed", or the miss's side and length and "Missed". The miss details reset after each putt.
 */
export function PuttEntry({ units, distanceM, onDistanceChange, breakType, onBreakTypeChange, onLog }: PuttEntryProps) {
  const [side, setSide] = useState<MissSide | null>(null);
  const [finish, setFinish] = useState<Finish | null>(null);
  const [missM, setMissM] = useState<number | null>(null);

  const resetMiss = () => {
    setSide(null);
    setFinish(null);
    setMissM(null);
  };

  const logHoled = () => {
    onLog({ distanceM, holed: true, missSide: null, missLengthM: null, breakType });
    resetMiss();
  };
  // A finish is stored only as a signed length (negative = short), so "long" without "how far" cannot be kept:
  // Missed waits for the length (or for the finish to be taken back) rather than drop what the screen shows.
  const needsLength = finish !== null && missM === null;
  const logMissed = () => {
    if (needsLength) return;
    const length = finish && missM !== null ? (finish === "short" ? -missM : missM) : null;
    onLog({ distanceM, holed: false, missSide: side, missLengthM: length, breakType });
    resetMiss();
  };

  const missPicks = MISS_PICKS[units];
  const missSummary = [side, finish && missM !== null ? `${missLabel(missM, units)} ${finish}` : finish].filter(Boolean).join(", ");

  return (
    <div className="flex flex-col gap-4">
      <section aria-label="Distance" className="flex flex-col gap-2">
        <Stepper
          label="Distance"
          decreaseLabel={`Shorter by ${units === "imperial" ? "1 ft" : "0.25 m"}`}
          increaseLabel={`Longer by ${units === "imperial" ? "1 ft" : "0.25 m"}`}
          value={distanceLabel(distanceM, units)}
          onDecrease={() => onDistanceChange(stepDistanceM(distanceM, -1, units))}
          onIncrease={() => onDistanceChange(stepDistanceM(distanceM, 1, units))}
        />
        <ChipGroup
          legend={`Quick picks (${longUnitLabel(units)})`}
          showLegend={false}
          columns={5}
          options={DISTANCE_PICKS[units].map((v) => ({ value: v, label: String(v) }))}
          value={DISTANCE_PICKS[units].find((v) => samePick(fromLongUnit(v, units), distanceM, units)) ?? null}
          onChange={(v) => v !== null && onDistanceChange(fromLongUnit(v, units))}
        />
      </section>

      <button
        type="button"
        onClick={logHoled}
        className="min-h-20 w-full rounded-2xl bg-ok-600 px-6 text-2xl font-semibold text-white shadow-sm transition-colors hover:bg-ok-800 focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500 active:bg-ok-800"
      >
        Holed
      </button>

      <section aria-label="A miss" className="flex flex-col gap-3 rounded-2xl border-2 border-ink-900/10 bg-white/60 p-3 sm:p-4">
        <div className="grid grid-cols-2 gap-3">
          <ChipGroup
            legend="Missed on the"
            columns={2}
            allowNone
            options={[
              { value: "left", label: "Left" },
              { value: "right", label: "Right" },
            ]}
            value={side}
            onChange={(v) => setSide(v as MissSide | null)}
          />
          <ChipGroup
            legend="Finished"
            columns={2}
            allowNone
            options={[
              { value: "short", label: "Short" },
              { value: "long", label: "Long" },
            ]}
            value={finish}
            onChange={(v) => {
              setFinish(v as Finish | null);
              if (v === null) setMissM(null);
            }}
          />
        </div>
        <div className={clsx("flex flex-col gap-2", !finish && "opacity-60")}>
          <ChipGroup
            legend={
              finish
                ? `How far ${finish === "short" ? "short" : "past"} (${shortUnitLabel(units)})`
                : `How far (${shortUnitLabel(units)}), after short or long`
            }
            columns={4}
            disabled={!finish}
            options={missPicks.map((v) => ({ value: v, label: String(v) }))}
            value={missPicks.find((v) => missM !== null && Math.abs(fromShortUnit(v, units) - missM) < 1e-9) ?? null}
            onChange={(v) => setMissM(v === null ? null : fromShortUnit(v, units))}
          />
          {finish ? (
            <Stepper
              size="md"
              label="Miss length"
              decreaseLabel="Miss length less"
              increaseLabel="Miss length more"
              value={missM === null ? "–" : missLabel(missM, units)}
              onDecrease={() => setMissM(stepMissM(missM ?? fromShortUnit(missPicks[0]!, units), -1, units))}
              onIncrease={() => setMissM(stepMissM(missM ?? 0, 1, units))}
            />
          ) : null}
        </div>
        {needsLength ? (
          <p id="miss-needs-length" className="text-sm text-ink-700" role="status">
            Pick how far {finish === "short" ? "short" : "long"} it finished, or tap {finish === "short" ? "Short" : "Long"} again to log
            the miss without it.
          </p>
        ) : null}
        <button
          type="button"
          onClick={logMissed}
          disabled={needsLength}
          aria-describedby={needsLength ? "miss-needs-length" : undefined}
          className="min-h-16 w-full rounded-2xl bg-ink-900 px-6 text-xl font-semibold text-sand-50 transition-colors hover:bg-ink-700 focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500 active:bg-ink-800 disabled:cursor-not-allowed disabled:opacity-50"
        >
          Missed{missSummary ? " " : null}
          {missSummary ? <span className="block text-sm font-normal text-sand-200">{missSummary}</span> : null}
        </button>
      </section>

      <ChipGroup
        legend="Break (optional; stays for the next putt)"
        columns={3}
        allowNone
        options={BREAK_TYPES.map((b) => ({ value: b, label: BREAK_LABELS[b] }))}
        value={breakType}
        onChange={onBreakTypeChange}
      />
    </div>
  );
}
