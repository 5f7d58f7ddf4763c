import { useEffect } from "react";
import { useSearchParams } from "react-router";
import clsx from "clsx";
import { TRAINING_LEVELS, TRAINING_LEVEL_IDS, levelDescription, type TrainingLevelId } from "#shared/training";
import { parseDecimal, type UnitSystem } from "#shared/units";
import { PageHeader, PageSpinner } from "../../../components/ui";
import { useMe } from "../../auth/api/get-me";
import { useUnits } from "../../auth/hooks/use-units";
import { newSeed } from "../utils/putt-generator";
import { EyeCheck } from "./eye-check";
import { HistorySection } from "./history-section";
import { TrainingRound } from "./training-round";

const DEFAULT_LEVEL: TrainingLevelId = "club";

function parseLevel(v: string | null): TrainingLevelId {
  return (TRAINING_LEVEL_IDS as readonly string[]).includes(v ?? "") ? (v as TrainingLevelId) : DEFAULT_LEVEL;
}
function parseInt0(v: string | null): number | null {
  if (v === null || !/^\d{1,10}$/.test(v)) return null;
  return parseDecimal(v);
}
function roundQuery(level: TrainingLevelId, seed: number, n: number): string {
  return new URLSearchParams({ level, seed: String(seed), n: String(n) }).toString();
}

export function TrainPage() {
  const [params, setParams] = useSearchParams();
  const level = parseLevel(params.get("level"));
  const seed = parseInt0(params.get("seed"));
  const n = parseInt0(params.get("n")) ?? 0;
  const me = useMe();
  // The golfer's units, signed in or out (a signed-out choice lives in this browser).
  const { units } = useUnits();

  // A round without a seed gets one, written into the URL so the round can be replayed from its link.
  useEffect(() => {
    if (seed === null) setParams(roundQuery(level, newSeed(), 0), { replace: true });
  }, [seed, level, setParams]);

  return (
    <>
      <title>Read training · Borrowline</title>
      <PageHeader
        eyebrow="Read training"
        title="Read it, then see the line"
        description="A putt on a green you have not seen. Set where you would start the ball and how firmly you would hit it, then reveal the true line and your score."
      />
      <LevelPicker level={level} units={units} onChange={(l) => setParams(roundQuery(l, newSeed(), 0))} />
      {seed === null ? (
        <PageSpinner label="Choosing a putt" />
      ) : (
        <TrainingRound
          key={`${level}|${seed}|${n}`}
          level={level}
          seed={seed}
          n={n}
          units={units}
          signedIn={Boolean(me.data)}
          onNext={() => setParams(roundQuery(level, seed, n + 1))}
          onNewRound={() => setParams(roundQuery(level, newSeed(), 0))}
        />
      )}
      <EyeCheck />
      <div className="mt-8">
        <HistorySection signedIn={Boolean(me.data)} />
      </div>
    </>
  );
}

// A new level starts a new round: two levels with the same ranges would otherwise hand out the same putts.
function LevelPicker({ level, units, onChange }: { level: TrainingLevelId; units: UnitSystem; onChange: (l: TrainingLevelId) => void }) {
  return (
    <fieldset className="mb-5">
      <legend className="mb-2 text-sm font-medium text-ink-800">Level</legend>
      <div className="flex flex-wrap gap-2">
        {TRAINING_LEVEL_IDS.map((id) => {
          const l = TRAINING_LEVELS[id];
          return (
            <label
              key={id}
              className={clsx(
                "flex min-h-11 cursor-pointer flex-col justify-center rounded-xl border-2 px-3 py-1.5 has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-coral-500",
                level === id ? "border-ink-900 bg-ink-50" : "border-ink-900/15 bg-white hover:border-ink-900/30",
              )}
            >
              <input
                type="radio"
                name="training-level"
                value={id}
                checked={level === id}
                onChange={() => onChange(id)}
                className="sr-only"
              />
              <span className="font-medium text-ink-900">{l.label}</span>
              <span className="text-xs text-ink-500">{levelDescription(id, units)}</span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
