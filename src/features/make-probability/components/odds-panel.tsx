// "Your odds from here": how often this player holes the read on the page, from their own start-line and pace spread
// (POST /api/reads/make-probability), their best pace with a button to use it, the spread used and where it comes
// from, and where 100 simulated putts finish. While the fall-line dial is dragged a Web Worker simulates the putt
// for instant feedback; the numbers the panel settles on always come from the API.
import { formatCount } from "#shared/format";
import type { ReadRequest } from "#shared/schemas/reads";
import { formatShort, type UnitSystem } from "#shared/units";
import { Alert, Button, Spinner, TextLink } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { useMyDispersion } from "../api/get-dispersion";
import { ODDS_SEED, useMakeProbability } from "../api/get-make-probability";
import { useLiveOdds } from "../hooks/use-live-odds";
import {
  angleWords,
  basisWords,
  comparedPercents,
  makeHeadline,
  paceSpreadWords,
  percentWords,
  rangeWords,
  rollPastWords,
  samePace,
  sampleErrorWords,
  secondPuttLengthWords,
} from "../utils/odds-words";
import { LIVE_SAMPLES } from "../utils/live-samples";
import { FinishesPicture } from "./finishes-picture";

export type OddsPanelProps = {
  /** The committed read (already debounced by the read form), or null while the form is invalid. */
  read: ReadRequest | null;
  /** The read under the finger while the dial is dragged. */
  liveRead?: ReadRequest | null;
  /** The read's line (putt frame) for the picture. */
  line?: ReadonlyArray<readonly [number, number]> | null;
  units: UnitSystem;
  signedIn: boolean;
  /** Where "sign in" leads (back to this read afterwards). */
  signInHref: string;
  /** Puts this roll-past into the read form. */
  onApplyRollPast: (rollPastM: number) => void;
};

const heading = <h2 className="text-sm font-semibold tracking-wide text-coral-700 uppercase">Your odds from here</h2>;

export function OddsPanel(props: OddsPanelProps) {
  if (!props.signedIn) {
    return (
      <p className="text-sm text-ink-600" data-testid="odds-sign-in">
        <TextLink to={props.signInHref}>Sign in</TextLink> to see how often you hole this putt, from your own logged putts.
      </p>
    );
  }
  return <SignedInOdds {...props} />;
}

function SignedInOdds({ read, liveRead = null, line, units, onApplyRollPast }: OddsPanelProps) {
  const odds = useMakeProbability(read);
  const spread = useMyDispersion();
  const used = odds.data?.dispersion ?? (spread.data ? { angleDeg: spread.data.angleDeg.estimate, pace: spread.data.pace.estimate } : null);
  const live = useLiveOdds(liveRead, used ? { angleDeg: used.angleDeg, pace: used.pace } : null, ODDS_SEED);
  const liveOk = live && live.ok ? live : null;

  const error = odds.error;
  const cannotStop = isApiError(error) && error.status === 422;
  const data = odds.data;
  const distanceM = (liveOk ? liveRead?.distanceM : read?.distanceM) ?? 0;

  if (!read && !liveOk) {
    return (
      <section aria-label="Your odds from here" className="flex flex-col gap-2">
        {heading}
        <p className="text-ink-600">Fix the values marked in the form and your odds appear here.</p>
      </section>
    );
  }
  if (cannotStop && !liveOk) {
    return (
      <section aria-label="Your odds from here" className="flex flex-col gap-2">
        {heading}
        <p className="text-ink-600">This ball would not stop on that slope at that green speed, so there are no odds to give.</p>
      </section>
    );
  }
  if (error && !data && !liveOk) {
    return (
      <section aria-label="Your odds from here" className="flex flex-col gap-3">
        {heading}
        <Alert
          tone="error"
          title="Could not work out your odds"
          action={
            <Button size="sm" variant="secondary" onClick={() => void odds.refetch()}>
              Try again
            </Button>
          }
        >
          {error.message}
        </Alert>
      </section>
    );
  }
  if (!data && !liveOk) {
    return (
      <section aria-label="Your odds from here" className="flex flex-col gap-2">
        {heading}
        <Spinner label="Simulating your putts" />
      </section>
    );
  }

  const shown = liveOk ?? data!;
  const updating = !liveOk && (odds.isPlaceholderData || odds.isFetching);
  const best = data?.bestPace;
  const current = data?.defaultPace;
  const [currentPct, bestPct] = best && current ? comparedPercents(current.makeProbability, best.makeProbability) : ["", ""];

  return (
    <section aria-label="Your odds from here" className="flex flex-col gap-4" aria-busy={updating || undefined}>
      <div className="flex items-center justify-between gap-3">
        {heading}
        {liveOk ? (
          <span role="status" className="text-xs font-medium text-ink-500">
            Live: {formatCount(LIVE_SAMPLES)} putts while you turn the dial
          </span>
        ) : updating ? (
          <span role="status" className="text-xs font-medium text-ink-500">
            Updating…
          </span>
        ) : null}
      </div>

      <div>
        <p className="text-2xl leading-tight font-semibold tracking-tight text-ink-900" data-testid="odds-headline">
          {makeHeadline(shown.makeProbability)}
        </p>
        <p className="mt-1 text-sm text-ink-500">
          {sampleErrorWords(shown.makeProbabilityStandardError, liveOk ? liveOk.samples : data!.samples)}.
        </p>
      </div>

      <dl className="grid gap-3 sm:grid-cols-2">
        <div className="rounded-xl bg-white p-3 ring-1 ring-ink-900/5">
          <dt className="text-sm text-ink-600">A second putt {secondPuttLengthWords(units)}</dt>
          <dd className="text-lg font-semibold">{percentWords(shown.secondPuttOver1mProbability)} of the time</dd>
        </div>
        {data && !liveOk ? (
          <div className="rounded-xl bg-white p-3 ring-1 ring-ink-900/5">
            <dt className="text-sm text-ink-600">Your misses</dt>
            <dd className="text-lg font-semibold">
              {percentWords(data.misses.shortProbability)} short, {percentWords(data.misses.longProbability)} long
            </dd>
          </div>
        ) : null}
      </dl>

      {best && current && !liveOk ? (
        <div className="flex flex-col gap-2 rounded-xl border-2 border-ink-900/10 p-3" data-testid="best-pace">
          <h3 className="text-sm font-semibold text-ink-900">Your best pace</h3>
          <dl className="grid grid-cols-2 gap-3 text-sm">
            <div>
              <dt className="text-ink-600">This read ({rollPastWords(current.rollPastM, units)})</dt>
              <dd className="text-base font-semibold">holes {currentPct}</dd>
            </div>
            <div>
              <dt className="text-ink-600">Best for you ({rollPastWords(best.rollPastM, units)})</dt>
              <dd className="text-base font-semibold">holes {bestPct}</dd>
            </div>
          </dl>
          <p className="text-sm text-ink-600">
            {best.meetsRiskLimit
              ? `The pace that holes the most while a second putt ${secondPuttLengthWords(units)} stays at ${percentWords(data!.secondPuttRiskMax)} or less (${percentWords(best.secondPuttOver1mProbability)} at this pace).`
              : `No pace keeps a second putt ${secondPuttLengthWords(units)} under ${percentWords(data!.secondPuttRiskMax)}; this is the safest one (${percentWords(best.secondPuttOver1mProbability)}).`}
          </p>
          {samePace(best.rollPastM, current.rollPastM) ? (
            <p className="text-sm font-medium text-ok-800">This read already rolls at your best pace.</p>
          ) : (
            <div>
              <Button size="sm" variant="secondary" pending={updating} onClick={() => onApplyRollPast(best.rollPastM)}>
                Use my best pace ({formatShort(best.rollPastM, units)} past)
              </Button>
            </div>
          )}
        </div>
      ) : null}

      <div>
        <FinishesPicture
          finishes={shown.finishes}
          finishHoled={shown.finishHoled}
          distanceM={distanceM}
          line={line}
          units={units}
          className="mx-auto max-w-sm"
        />
        <p className="mt-2 text-sm text-ink-600">
          Each dot is where one of the first 100 of the {formatCount(liveOk ? liveOk.samples : data!.samples)} simulated putts stopped; a
          ring means it left more than 1 m, outside the dashed circle. Holed putts are counted below the picture.
        </p>
      </div>

      {data?.logged && data.logged.attempts > 0 && data.logged.rate !== null ? (
        <p
          className={data.logged.oddsOutside ? "rounded-xl bg-warn-50 px-3 py-2 text-sm text-ink-800" : "text-sm text-ink-700"}
          data-testid="odds-vs-log"
        >
          Your log: {percentWords(data.logged.rate)} holed from {formatShort(data.logged.fromM, units)}–
          {formatShort(data.logged.toM, units)} ({data.logged.attempts} putts).
          {data.logged.oddsOutside ? ` Why these odds differ: ${data.logged.why}` : null}
        </p>
      ) : null}

      {used ? (
        <div className="border-t border-ink-900/10 pt-3 text-sm text-ink-700">
          <h3 className="font-semibold text-ink-900">The spread used</h3>
          <dl className="mt-1 grid gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
            <dt className="text-ink-600">Start line</dt>
            <dd>
              {angleWords(used.angleDeg)} either way (one standard deviation)
              {spread.data ? `, likely ${rangeWords(spread.data.angleDeg.lo, spread.data.angleDeg.hi, angleWords)}` : null}
            </dd>
            <dt className="text-ink-600">Pace</dt>
            <dd>
              {paceSpreadWords(used.pace)} of the roll long or short
              {spread.data ? `, likely ${rangeWords(spread.data.pace.lo, spread.data.pace.hi, paceSpreadWords)}` : null}
            </dd>
          </dl>
          <p className="mt-2 font-medium text-ink-900" data-testid="odds-basis">
            {data
              ? basisWords(data.dispersion.putts, data.dispersion.usedPrior)
              : spread.data
                ? basisWords(spread.data.putts, spread.data.usedPrior)
                : null}
          </p>
          <p className="mt-1 text-ink-500">
            The “likely” ranges hold 95 % of what your putts allow. The odds add a misread of the slope and the green’s bumps to your
            stroke.
          </p>
        </div>
      ) : null}
    </section>
  );
}
