// One putt of a training round (train-page.tsx): the green in 3D, the player's read, and how it compares.
import { useMemo, useState, type KeyboardEvent } from "react";
import { TRAINING_LEVELS, evaluateAttempt, type Evaluation, type TrainingLevelId } from "#shared/training";
import { formatLength, fromShortUnit, type UnitSystem } from "#shared/units";
import { CameraButtons } from "../../../components/green-3d/camera-buttons";
import { contourIntervalM, greenShape, heightRange } from "../../../components/green-3d/frame";
import { GreenView } from "../../../components/green-3d/green-view";
import { useWebGL } from "../../../components/green-3d/webgl";
import type { CameraView, Replay, SceneAim, SceneLine } from "../../../components/green-3d/scene-types";
import { SlopeLegend } from "../../../components/green-3d/slope-legend";
import { aimWords, fallLineWords } from "../../../components/green-3d/words";
import { Alert, Button, Card } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { useCreateAttempt } from "../api/create-attempt";
import { roundPutt } from "../utils/putt-generator";
import { AimControl, FlatPuttControl, aimRangeM } from "./read-controls";
import { ResultPanel } from "./result-panel";

type RoundProps = {
  level: TrainingLevelId;
  seed: number;
  n: number;
  units: UnitSystem;
  signedIn: boolean;
  onNext: () => void;
  onNewRound: () => void;
};

export function TrainingRound({ level, seed, n, units, signedIn, onNext, onNewRound }: RoundProps) {
  const putt = useMemo(() => roundPutt(level, seed, n), [level, seed, n]);
  const [aimOffsetM, setAim] = useState(0);
  const [flatPuttLengthM, setFlatPutt] = useState(() => Math.round(putt.distanceM * 20) / 20);
  const [result, setResult] = useState<Evaluation | null>(null);
  // Once the line has been revealed, further reads of this putt are practice: shown, never scored or kept.
  const [practice, setPractice] = useState(false);
  const [replay, setReplay] = useState<Replay | null>(null);
  const [view, setView] = useState<{ view: CameraView; key: number }>({ view: "behind", key: 0 });
  const [exaggerate, setExaggerate] = useState(false);
  const save = useCreateAttempt();
  const webgl = useWebGL();
  const revealed = result !== null;
  const range = aimRangeM(putt.distanceM);
  const clampAim = (m: number) => Math.max(-range, Math.min(range, Math.round(m * 1000) / 1000));

  const shape = greenShape(putt.distanceM);
  const hr = heightRange(shape, putt);
  const interval = contourIntervalM(hr.maxM - hr.minM, units);

  const reveal = () => {
    const guess = { aimOffsetM, flatPuttLengthM };
    // The same code the server runs (shared/training.ts); a signed-in player's attempt is scored again there.
    const ev = evaluateAttempt(putt, guess);
    setResult(ev);
    if (ev.ok) setReplay({ key: Date.now(), rate: 1, ...ev.yours.samples, holeTimeS: ev.yours.holeTimeS });
    if (ev.ok && signedIn && !practice) save.mutate({ level, putt, guess });
  };
  const watchAgain = (rate: number) => {
    if (result?.ok) setReplay({ key: Date.now(), rate, ...result.yours.samples, holeTimeS: result.yours.holeTimeS });
  };
  const tryAgain = () => {
    setPractice(true);
    setResult(null);
    setReplay(null);
    save.reset();
  };

  const onGreenKey = (e: KeyboardEvent) => {
    if (revealed || (e.key !== "ArrowLeft" && e.key !== "ArrowRight")) return;
    e.preventDefault();
    const step = fromShortUnit(e.shiftKey ? 5 : 1, units);
    setAim((a) => clampAim(a + (e.key === "ArrowLeft" ? -step : step)));
  };

  const ok = result?.ok ? result : null;
  // The server keeps one scored read per putt: a putt scored before (a reopened round link) is practice too.
  const scoredBefore = save.error !== null && isApiError(save.error) && save.error.status === 409;
  const notScored = practice || scoredBefore;
  // "By eye": slope and fall line are read from the picture; numbers and words about them wait for the reveal.
  const slopeShown = TRAINING_LEVELS[level].slopeGiven || revealed;
  const lines: SceneLine[] = [];
  const aims: SceneAim[] = [];
  if (ok) {
    const youLeft = aimOffsetM < ok.truth.aimOffsetM;
    lines.push({ id: "truth", path: ok.truth.path, style: "truth" }, { id: "yours", path: ok.yours.path, style: "yours" });
    aims.push({ id: "truth", xM: ok.truth.aimOffsetM, style: "truth", label: "True aim", labelSide: youLeft ? "right" : "left" });
    aims.push({ id: "yours", xM: aimOffsetM, style: "yours", label: "Your aim", labelSide: youLeft ? "left" : "right" });
  } else {
    aims.push({ id: "yours", xM: aimOffsetM, style: "yours", label: "Your aim", labelSide: "up" });
  }
  const restMarkers = ok && !ok.yours.holed ? [{ id: "rest", xM: ok.yours.restM[0], yM: ok.yours.restM[1], style: "yours" as const }] : [];

  return (
    // Phone: the putt, the green, the read controls and result, then the key. Desktop: green left, controls right.
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_22rem] lg:grid-rows-[auto_auto_1fr] lg:items-start lg:gap-5">
      <Card padded={false} className="p-4 lg:col-start-1 lg:row-start-1">
        <h2 className="text-sm font-semibold tracking-wide text-ink-500 uppercase">
          Putt {n + 1} · {TRAINING_LEVELS[level].label}
        </h2>
        <dl className="mt-2 grid grid-cols-2 gap-x-3 gap-y-1 sm:grid-cols-4">
          <Fact term="Distance" value={formatLength(putt.distanceM, units)} />
          <Fact term="Stimp" value={`${putt.stimpFt} ft`} />
          {slopeShown ? (
            <>
              <Fact term="Slope" value={`${putt.slopePct} %`} />
              <Fact term="Fall line" value={`${putt.fallLineDeg}°`} />
            </>
          ) : null}
        </dl>
        {slopeShown ? (
          <p className="mt-2 text-ink-700">The green {fallLineWords(putt.fallLineDeg)}.</p>
        ) : (
          <p className="mt-2 text-ink-700">
            Read the slope from the green itself: its shading, its contour lines and how it tilts as you turn the camera. The numbers come
            with the line.
          </p>
        )}
      </Card>
      <div
        tabIndex={0}
        onKeyDown={onGreenKey}
        aria-label="The green. Drag your aim spot or tap the green to move it; the left and right arrow keys move it too."
        className="overflow-hidden rounded-(--radius-card) bg-[#dce6df] shadow-(--shadow-card) ring-1 ring-ink-900/10 focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500 lg:col-start-1 lg:row-start-2"
      >
        <GreenView
          className="h-[21rem] sm:h-[30rem] lg:h-[32rem]"
          webgl={webgl}
          putt={putt}
          units={units}
          lines={lines}
          aims={aims}
          restMarkers={restMarkers}
          contourIntervalM={interval}
          exaggeration={exaggerate ? 5 : 1}
          view={view.view}
          viewKey={view.key}
          replay={replay}
          onAimChange={revealed ? undefined : (x) => setAim(clampAim(x))}
          label={`Training putt: ${formatLength(putt.distanceM, units)}, ${slopeShown ? `the green ${fallLineWords(putt.fallLineDeg)}` : "the slope to be read from the picture"}; your aim ${aimWords(aimOffsetM, units)}.`}
          toolbar={<CameraButtons view={view.view} onView={(v) => setView((s) => ({ view: v, key: s.key + 1 }))} />}
        />
      </div>

      <div className="flex flex-col gap-4 lg:col-start-2 lg:row-span-3 lg:row-start-1">
        <Card padded={false} className="flex flex-col gap-5 p-4 sm:p-5">
          <AimControl
            aimOffsetM={aimOffsetM}
            distanceM={putt.distanceM}
            units={units}
            disabled={revealed}
            onChange={(m) => setAim(clampAim(m))}
          />
          <FlatPuttControl
            flatPuttLengthM={flatPuttLengthM}
            distanceM={putt.distanceM}
            units={units}
            disabled={revealed}
            onChange={setFlatPutt}
          />
          {!revealed ? (
            <Button variant="accent" size="lg" onClick={reveal}>
              {practice ? "Reveal the line (not scored)" : "Reveal the line"}
            </Button>
          ) : null}
        </Card>
        {result && !result.ok ? <Alert tone="warning">{result.message}</Alert> : null}
        {ok ? (
          <>
            <ResultPanel result={ok} distanceM={putt.distanceM} units={units} scored={!notScored} />
            {notScored ? (
              <p role="status" className="text-sm text-ink-600">
                {practice
                  ? "A second read of a putt whose line you have seen is practice: it is not scored or kept."
                  : "You were scored on this putt before and have seen its line, so this read is practice: it is not scored or kept."}
              </p>
            ) : signedIn ? (
              <p role="status" className="text-sm text-ink-600">
                {save.isPending
                  ? "Keeping this read in your history…"
                  : save.isSuccess
                    ? "Kept in your history."
                    : save.isError
                      ? "This read could not be kept."
                      : null}
              </p>
            ) : null}
            <div className="flex flex-wrap gap-2">
              <Button onClick={onNext}>Next putt</Button>
              {webgl ? (
                <Button variant="secondary" onClick={() => watchAgain(0.25)}>
                  Watch your ball slowly
                </Button>
              ) : null}
              <Button variant="ghost" onClick={tryAgain}>
                Read it again (practice, not scored)
              </Button>
            </div>
          </>
        ) : null}
        <p className="text-sm text-ink-500">
          Round {seed}: the same link gives the same putts.{" "}
          <button
            type="button"
            onClick={onNewRound}
            className="font-medium text-ink-900 underline decoration-coral-500 decoration-2 underline-offset-4"
          >
            Start a new round
          </button>
        </p>
        <p className="text-sm text-ink-500">
          The true line assumes an even, planar slope and a true-rolling ball; grain, wind and local contours are left out.
        </p>
      </div>

      <Card padded={false} className="p-4 lg:col-start-1 lg:row-start-3">
        <SlopeLegend
          slopeHidden={!slopeShown}
          slopePct={putt.slopePct}
          fallLineDeg={putt.fallLineDeg}
          contourIntervalM={interval}
          units={units}
          exaggeration={exaggerate ? 5 : 1}
          shaded={webgl}
        >
          {webgl ? (
            <label className="flex min-h-11 items-center gap-2 font-medium text-ink-800">
              <input
                type="checkbox"
                checked={exaggerate}
                onChange={(e) => setExaggerate(e.target.checked)}
                className="size-5 accent-coral-500"
              />
              Draw the tilt 5× steeper
            </label>
          ) : null}
        </SlopeLegend>
      </Card>
    </div>
  );
}

function Fact({ term, value }: { term: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-ink-500">{term}</dt>
      <dd className="text-lg font-semibold text-ink-900 tabular-nums">{value}</dd>
    </div>
  );
}
