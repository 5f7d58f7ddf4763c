import clsx from "clsx";
import { PuttDiagram } from "../../../components/putt-diagram/putt-diagram";
import type { ReadResponse } from "#shared/schemas/reads";
import type { UnitSystem } from "#shared/units";
import { aimWords, captureWords, paceWords } from "../utils/answer-text";
import { breakWords } from "../utils/directions";

export type ReadAnswerProps = {
  read: ReadResponse;
  distanceM: number;
  fallLineDeg: number;
  units: UnitSystem;
  /**
   * "live": worked out in the browser while the dial moves; "updating": a newer answer is on its way; "stale": the
   * form now holds values that cannot be read, so this answer is for the last putt that could (greyed, with why).
   */
  state?: "fresh" | "live" | "updating" | "stale";
  /** Why the answer is stale (the form's messages). */
  staleBecause?: string[];
};

export const CAUTION = "Assumes an even slope and a true roll; grain, wind and contours are yours to judge.";

/** The read, large enough to take in at a glance on a phone: where to start it, how firmly, and the line drawn. */
export function ReadAnswer({ read, distanceM, fallLineDeg, units, state = "fresh", staleBecause }: ReadAnswerProps) {
  const aim = aimWords(read.aimOffsetM, read.startLineDeg, units);
  const pace = paceWords(read.rollPastM, read.flatPuttLengthM, units);
  const capture = captureWords(read.entrySpeedMps, read.capture, units);

  return (
    <section
      aria-labelledby="read-answer-title"
      aria-live="polite"
      aria-busy={state === "updating" || undefined}
      className="flex flex-col gap-5"
    >
      <div className="flex items-center justify-between gap-3">
        <h2 id="read-answer-title" className="text-sm font-semibold tracking-wide text-coral-700 uppercase">
          The read
        </h2>
        {state === "live" ? (
          <span className="rounded-full bg-ink-900/5 px-3 py-1 text-xs font-medium text-ink-600">Live while you turn the dial</span>
        ) : null}
        {state === "updating" ? <span className="text-xs font-medium text-ink-500">Updating…</span> : null}
      </div>
      {state === "stale" ? (
        <div
          role="status"
          data-testid="stale-answer"
          className="rounded-xl bg-warn-50 px-4 py-3 text-sm text-warn-800 ring-1 ring-warn-800/20"
        >
          <p className="font-semibold">Not the putt in the form: this answer is for the last putt that could be read.</p>
          {staleBecause && staleBecause.length > 0 ? (
            <ul className="mt-1 list-disc pl-5">
              {staleBecause.map((why) => (
                <li key={why}>{why}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <div
        data-testid="answer-body"
        aria-disabled={state === "stale" || undefined}
        className={clsx(
          "flex flex-col gap-5 transition-opacity",
          state === "updating" && "opacity-70",
          state === "stale" && "opacity-40 grayscale select-none",
        )}
      >
        <div>
          <p className="text-sm font-medium text-ink-500">Where to start it</p>
          <p
            className="mt-1 text-3xl leading-tight font-semibold tracking-tight text-balance text-ink-900 sm:text-4xl"
            data-testid="aim-headline"
          >
            {aim.headline}
          </p>
          <p className="mt-1 text-lg text-ink-700">{aim.detail}</p>
          <p className="mt-0.5 text-sm text-ink-500">{aim.startLine}</p>
        </div>

        <div>
          <p className="text-sm font-medium text-ink-500">How firmly</p>
          <p className="mt-1 text-2xl leading-snug font-semibold text-ink-900">{pace.headline}</p>
          <p className="mt-1 text-lg text-ink-700">{pace.flatPutt}</p>
        </div>

        <dl className="grid grid-cols-1 gap-3 sm:grid-cols-2">
          <div className="rounded-xl bg-white/70 px-4 py-3 ring-1 ring-ink-900/5">
            <dt className="text-sm text-ink-500">Break</dt>
            <dd className="text-lg font-semibold">{breakWords(read.breaks)}</dd>
          </div>
          <div className="rounded-xl bg-white/70 px-4 py-3 ring-1 ring-ink-900/5">
            <dt className="text-sm text-ink-500">At the hole</dt>
            <dd className="text-lg font-semibold">{capture.entry}</dd>
            <dd className={clsx("mt-0.5 text-sm", capture.tone === "ok" ? "text-ok-800" : "text-warn-800")}>{capture.verdict}</dd>
          </div>
        </dl>

        <PuttDiagram
          className="mx-auto max-w-xs"
          paths={[{ points: read.path, style: "chosen" }]}
          holeDistanceM={distanceM}
          aimSpots={read.aimOffsetM === null ? [] : [{ xM: read.aimOffsetM }]}
          fallLineDeg={fallLineDeg}
          units={units}
          title="The line from above"
          description={`${aim.headline}. ${breakWords(read.breaks)}. The ball starts toward the aim spot and curves into the hole.`}
        />

        <p className="text-sm text-ink-500">{CAUTION}</p>
      </div>
    </section>
  );
}
