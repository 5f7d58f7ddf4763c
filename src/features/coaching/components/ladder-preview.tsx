import clsx from "clsx";
import type { FailRule, PassRule } from "#shared/schemas/ladders";
import type { BreakType } from "#shared/schemas/putts";
import { formatLength, type UnitSystem } from "#shared/units";
import { BREAK_TYPE_WORDS, FAIL_RULE_WORDS, rungInWords } from "../utils/rule-words";

export type PreviewRung = { distanceM: number; balls: number; passRule: PassRule; breakType?: BreakType; note?: string } | null;

export type LadderPreviewProps = {
  name: string;
  description?: string | null;
  failRule: FailRule;
  /** null for a rung whose numbers are not complete yet. */
  rungs: readonly PreviewRung[];
  units: UnitSystem;
  className?: string;
};

/** The ladder as the player will read it: the rungs from the first (shortest) up, each rule in words. */
export function LadderPreview({ name, description, failRule, rungs, units, className }: LadderPreviewProps) {
  return (
    <section aria-label="Preview for the player" className={clsx("rounded-(--radius-card) bg-ink-900 p-5 text-sand-50 sm:p-6", className)}>
      <p className="text-sm font-semibold tracking-wide text-coral-300 uppercase">As the player sees it</p>
      <h2 className="mt-1 text-xl font-semibold tracking-tight">{name.trim() || "Untitled ladder"}</h2>
      {description?.trim() ? <p className="mt-1 text-sand-200">{description}</p> : null}
      <p className="mt-2 text-sm text-sand-300">
        Start at rung 1 and work up. If a rung is missed: {FAIL_RULE_WORDS[failRule].label.toLowerCase()}.
      </p>
      <ol className="mt-4 flex flex-col gap-2" data-testid="ladder-preview-rungs">
        {rungs.map((rung, i) => {
          const shorter = rung && i > 0 && rungs[i - 1] && rung.distanceM < rungs[i - 1]!.distanceM;
          return (
            <li key={i} className="flex items-start gap-3 rounded-xl bg-sand-50/5 px-3 py-2.5">
              <span
                aria-hidden="true"
                className="mt-0.5 flex size-7 shrink-0 items-center justify-center rounded-full bg-coral-500 text-sm font-semibold text-ink-950"
              >
                {i + 1}
              </span>
              <div className="min-w-0">
                <p className="font-medium">
                  <span className="sr-only">Rung {i + 1}: </span>
                  {rung ? rungInWords(rung, units) : "Not complete yet"}
                </p>
                {rung && (rung.breakType || rung.note) ? (
                  <p className="text-sm text-sand-300">
                    {[rung.breakType ? BREAK_TYPE_WORDS[rung.breakType] : null, rung.note].filter(Boolean).join(" · ")}
                  </p>
                ) : null}
                {shorter ? (
                  <p className="text-sm text-coral-300">Shorter than rung {i}: players usually climb from short to long.</p>
                ) : null}
              </div>
            </li>
          );
        })}
      </ol>
      {rungs.length > 0 && rungs.every(Boolean) ? (
        <p className="mt-3 text-sm text-sand-300">
          Top rung: {formatLength(rungs[rungs.length - 1]!.distanceM, units)}. Pass it and the ladder is complete.
        </p>
      ) : null}
    </section>
  );
}
