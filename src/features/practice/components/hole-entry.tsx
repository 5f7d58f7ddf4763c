// One hole of a round on the round page (round-page.tsx): its first-putt length and putt count, entered and saved.
import { useState } from "react";
import clsx from "clsx";
import type { Round } from "#shared/schemas/rounds";
import { formatLength, fromLongUnit, longUnitLabel, type UnitSystem } from "#shared/units";
import { Alert, Button, ChipGroup, Stepper } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useSaveHole } from "../api/put-hole";
import { DEFAULT_DISTANCE, DISTANCE_PICKS, distanceLabel, samePick, stepDistanceM } from "../utils/distances";
import { holeBody, LEAVE_PICKS } from "../utils/hole-entry";

export function HoleEntry({
  round,
  holeNumber,
  units,
  onSaved,
}: {
  round: Round;
  holeNumber: number;
  units: UnitSystem;
  onSaved: (n: number) => void;
}) {
  const existing = round.holes.find((h) => h.holeNumber === holeNumber);
  const save = useSaveHole(round.id);
  const [distanceM, setDistanceM] = useState(existing?.firstPuttM ?? fromLongUnit(DEFAULT_DISTANCE[units] * 2, units));
  const [leaveM, setLeaveM] = useState<number | null>(existing?.leftAfterFirstM ?? null);
  const [fourPlus, setFourPlus] = useState(existing ? existing.putts >= 4 : false);

  const commit = (putts: number) => {
    save.mutate(
      { holeNumber, ...holeBody({ firstPuttM: distanceM, putts, leftAfterFirstM: putts >= 2 ? leaveM : null }) },
      { onSuccess: () => onSaved(holeNumber) },
    );
  };
  const leavePicks = LEAVE_PICKS[units];

  return (
    <section aria-labelledby="hole-heading" className="flex flex-col gap-4">
      <div className="flex items-baseline justify-between">
        <h2 id="hole-heading" className="text-2xl font-semibold tracking-tight">
          Hole {holeNumber}
        </h2>
        {existing ? (
          <p className="text-sm text-ink-500">
            Saved: {existing.putts} {existing.putts === 1 ? "putt" : "putts"}
            {existing.firstPuttM !== null ? ` from ${formatLength(existing.firstPuttM, units)}` : ""}
          </p>
        ) : null}
      </div>

      <div className="flex flex-col gap-3">
        <h3 className="text-sm font-semibold tracking-wide text-ink-600 uppercase">First putt</h3>
        <Stepper
          label="First putt"
          decreaseLabel={`First putt shorter by ${units === "imperial" ? "1 ft" : "0.25 m"}`}
          increaseLabel={`First putt longer by ${units === "imperial" ? "1 ft" : "0.25 m"}`}
          value={distanceLabel(distanceM, units)}
          onDecrease={() => setDistanceM(stepDistanceM(distanceM, -1, units))}
          onIncrease={() => setDistanceM(stepDistanceM(distanceM, 1, units))}
        />
        <ChipGroup
          legend={`First putt quick picks (${longUnitLabel(units)})`}
          showLegend={false}
          columns={5}
          options={DISTANCE_PICKS[units].map((v) => ({ value: v, label: String(v) }))}
          value={DISTANCE_PICKS[units].find((v) => samePick(fromLongUnit(v, units), distanceM, units)) ?? null}
          onChange={(v) => v !== null && setDistanceM(fromLongUnit(v, units))}
        />
      </div>

      <ChipGroup
        legend={`Left after the first putt (optional, ${longUnitLabel(units)}; for two putts or more)`}
        columns={3}
        allowNone
        options={leavePicks.map((v) => ({ value: v, label: String(v) }))}
        value={leavePicks.find((v) => leaveM !== null && Math.abs(fromLongUnit(v, units) - leaveM) < 1e-9) ?? null}
        onChange={(v) => setLeaveM(v === null ? null : fromLongUnit(v, units))}
      />

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-2 text-sm font-semibold tracking-wide text-ink-600 uppercase">Putts taken — tap to save the hole</legend>
        <div className="grid grid-cols-4 gap-2">
          {[1, 2, 3].map((n) => (
            <button
              key={n}
              type="button"
              onClick={() => {
                if (save.isPending) return;
                setFourPlus(false);
                commit(n);
              }}
              aria-disabled={save.isPending || undefined}
              aria-pressed={existing?.putts === n}
              className={clsx(
                "min-h-20 rounded-2xl text-3xl font-semibold transition-colors aria-disabled:opacity-60",
                existing?.putts === n ? "bg-coral-500 text-ink-950" : "bg-ink-900 text-sand-50 hover:bg-ink-700",
              )}
            >
              {n}
            </button>
          ))}
          <button
            type="button"
            onClick={() => setFourPlus(!fourPlus)}
            aria-expanded={fourPlus}
            className={clsx(
              "min-h-20 rounded-2xl text-3xl font-semibold",
              existing && existing.putts >= 4 ? "bg-coral-500 text-ink-950" : "bg-ink-900 text-sand-50 hover:bg-ink-700",
            )}
          >
            4+
          </button>
        </div>
        {fourPlus ? (
          <div className="grid grid-cols-3 gap-2">
            {[4, 5, 6].map((n) => (
              <Button key={n} size="lg" variant="secondary" onClick={() => commit(n)} pending={save.isPending} aria-label={`${n} putts`}>
                {n} putts
              </Button>
            ))}
          </div>
        ) : null}
        <Button variant="ghost" size="sm" onClick={() => commit(0)} pending={save.isPending} className="self-start">
          Holed from off the green (no putt)
        </Button>
      </fieldset>
      <p aria-live="polite" className="text-sm text-ink-500">
        {save.isPending ? `Saving hole ${holeNumber}…` : save.isSuccess ? `Hole ${holeNumber} saved.` : ""}
      </p>
      {save.isError ? (
        <Alert tone="error" title={`Hole ${holeNumber} was not saved`}>
          {errorMessage(save.error)}
        </Alert>
      ) : null}
    </section>
  );
}

/** A round on the course, logged hole by hole from a phone; each hole is saved as soon as its putts are tapped. */
