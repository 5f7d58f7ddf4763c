import { useEffect, useMemo, useState } from "react";
import { useSearchParams } from "react-router";
import { formatLength, formatSlope, formatSpeed, stimpText } from "#shared/format";
import { formatShort, type UnitSystem } from "#shared/units";
import { CameraButtons } from "../../../components/green-3d/camera-buttons";
import { contourIntervalM, greenShape, heightRange } from "../../../components/green-3d/frame";
import { GreenView } from "../../../components/green-3d/green-view";
import { useWebGL } from "../../../components/green-3d/webgl";
import type { CameraView, Replay, SceneAim, SceneLine } from "../../../components/green-3d/scene-types";
import { SlopeLegend } from "../../../components/green-3d/slope-legend";
import { aimWords, fallLineWords, holeWidthsWords } from "../../../components/green-3d/words";
import { Alert, Button, Card, PageHeader, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import type { ReadKey } from "../../../lib/read-url";
import { useUnits } from "../../auth/hooks/use-units";
import { greenOf, replayOf, useRehearseReads } from "../hooks/use-rehearse-reads";
import { decodeRehearse, encodeRehearse, type RehearsePutt } from "../utils/rehearse-putt";
import { PaceControl } from "./pace-control";
import { PuttEditor } from "./putt-editor";
import { ReadNumbers } from "./read-numbers";

const READ_WORDS: Record<ReadKey, string> = {
  distanceM: "distance",
  slopePct: "slope",
  fallLineDeg: "fall line",
  stimpFt: "Stimp",
  rollPastM: "roll-past",
  entrySpeedMps: "entry speed",
};

const EXAGGERATION = 5;

export function RehearsePage() {
  const [params, setParams] = useSearchParams();
  const { units } = useUnits();
  const { putt, replaced, fromEntrySpeedMps, clampedRollPastM } = useMemo(() => decodeRehearse(params, units), [params, units]);
  const greenKey = `${putt.distanceM}|${putt.slopePct}|${putt.fallLineDeg}|${putt.stimpFt}`;
  return (
    <>
      <title>Rehearse the putt · Borrowline</title>
      <PageHeader
        eyebrow="Rehearse"
        title="See the putt roll"
        description="The same putt curves more when the ball is dying at the hole than when it is still rolling firmly. Move the pace and watch the line and the aim move."
      />
      {replaced.length > 0 ? (
        <Alert tone="warning" className="mb-4">
          Some numbers in the link could not be used ({replaced.map((k) => READ_WORDS[k]).join(", ")}), so the usual values stand in for
          them.
        </Alert>
      ) : null}
      {fromEntrySpeedMps !== null ? (
        <Alert tone="info" className="mb-4">
          The read gave its pace as reaching the hole at {formatSpeed(fromEntrySpeedMps, units)}: here that is a ball finishing{" "}
          {formatShort(putt.rollPastM, units)} past if it misses.
        </Alert>
      ) : null}
      {clampedRollPastM !== null ? (
        <Alert tone="info" className="mb-4">
          The read finishes {formatShort(clampedRollPastM, units)} past; the pace control stops at {formatShort(putt.rollPastM, units)}, so
          the firmest pace here is shown.
        </Alert>
      ) : null}
      <RehearseView
        key={greenKey}
        putt={putt}
        units={units}
        onPuttChange={(next) => setParams(encodeRehearse(next))}
        onPaceSettled={(rollPastM) => setParams(encodeRehearse({ ...putt, rollPastM }), { replace: true, preventScrollReset: true })}
      />
    </>
  );
}

type ViewProps = {
  putt: RehearsePutt;
  units: UnitSystem;
  onPuttChange: (p: RehearsePutt) => void;
  onPaceSettled: (rollPastM: number) => void;
};

function RehearseView({ putt, units, onPuttChange, onPaceSettled }: ViewProps) {
  const [rollPastM, setRollPastM] = useState(putt.rollPastM);
  const [compare, setCompare] = useState(false);
  const [exaggerate, setExaggerate] = useState(false);
  // Behind the ball at eye height first: the way a golfer sees the putt.
  const [view, setView] = useState<{ view: CameraView; key: number }>({ view: "behind", key: 0 });
  const [replay, setReplay] = useState<Replay | null>(null);
  // The read input passed on whole (to the physics and the 3D view): a field added to the read schema reaches both.
  const green = useMemo(() => greenOf(putt), [putt]);
  const { current, dying, firm } = useRehearseReads(green, rollPastM);
  const webgl = useWebGL();

  // The URL follows the pace once the control rests, not on every step of a drag.
  useEffect(() => {
    if (rollPastM === putt.rollPastM) return;
    const timer = window.setTimeout(() => onPaceSettled(rollPastM), 400);
    return () => window.clearTimeout(timer);
  }, [rollPastM, putt.rollPastM, onPaceSettled]);

  const shape = greenShape(putt.distanceM);
  const range = heightRange(shape, putt);
  const interval = contourIntervalM(range.maxM - range.minM, units);

  const changePace = (m: number) => {
    setRollPastM(m);
    setReplay(null);
  };
  const play = (rate: number) => {
    if (current.ok) setReplay(replayOf(green, current.read, rate, Date.now()));
  };

  const lines: SceneLine[] = [];
  const aims: SceneAim[] = [];
  if (current.ok) {
    const dyingAim = dying.ok ? dying.read.aimOffsetM : null;
    const firmAim = firm.ok ? firm.read.aimOffsetM : null;
    if (compare && dying.ok && firm.ok && dyingAim !== null && firmAim !== null) {
      const outside = dyingAim < 0 ? "left" : "right";
      lines.push({ id: "dying", path: dying.read.path, style: "dying" }, { id: "firm", path: firm.read.path, style: "firm" });
      aims.push(
        {
          id: "dying",
          xM: dyingAim,
          style: "dying",
          label: `Dying: ${formatShort(dyingAim, units)} ${dyingAim < 0 ? "left" : "right"}`,
          labelSide: outside,
        },
        {
          id: "firm",
          xM: firmAim,
          style: "firm",
          label: `Firm: ${formatShort(firmAim, units)} ${firmAim < 0 ? "left" : "right"}`,
          labelSide: outside === "left" ? "right" : "left",
        },
      );
    }
    lines.push({ id: "chosen", path: current.read.path, style: "chosen" });
    if (current.read.aimOffsetM !== null) {
      aims.push({
        id: "chosen",
        xM: current.read.aimOffsetM,
        style: "chosen",
        label: compare ? "Your pace" : `Aim: ${aimWords(current.read.aimOffsetM, units)}`,
        labelSide: "up",
      });
    }
  }

  const sceneLabel = current.ok
    ? `A ${formatLength(putt.distanceM, units)} putt on a green that ${fallLineWords(putt.fallLineDeg)}; aim ${aimWords(current.read.aimOffsetM, units, current.read.startLineDeg)}.`
    : "The putt on the green.";

  return (
    // Phone: scene, then pace and numbers (so the line can be watched while scrubbing), then the key to the slope.
    // Desktop: scene and key on the left, the controls beside them.
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_22rem] lg:grid-rows-[auto_1fr] lg:items-start lg:gap-5">
      <div className="overflow-hidden rounded-(--radius-card) bg-[#dce6df] shadow-(--shadow-card) ring-1 ring-ink-900/10 lg:col-start-1 lg:row-start-1">
        <GreenView
          className="h-[21rem] sm:h-[30rem] lg:h-[34rem]"
          webgl={webgl}
          putt={green}
          units={units}
          lines={lines}
          aims={aims}
          contourIntervalM={interval}
          exaggeration={exaggerate ? EXAGGERATION : 1}
          view={view.view}
          viewKey={view.key}
          replay={replay}
          label={sceneLabel}
          toolbar={<CameraButtons view={view.view} onView={(v) => setView((s) => ({ view: v, key: s.key + 1 }))} />}
        />
      </div>

      <div className="flex flex-col gap-4 lg:col-start-2 lg:row-span-2 lg:row-start-1">
        <Card padded={false} className="flex flex-col gap-4 p-4 sm:p-5">
          <PaceControl rollPastM={rollPastM} units={units} onChange={changePace} />
          {current.ok ? (
            <ReadNumbers read={current.read} units={units} />
          ) : (
            <Alert tone="warning" title="No read on this green">
              {current.message}
            </Alert>
          )}
          <label className="flex min-h-11 items-center gap-2 text-sm font-medium text-ink-800">
            <input
              type="checkbox"
              checked={compare}
              onChange={(e) => {
                setCompare(e.target.checked);
                // The two lines part most clearly seen from above.
                if (e.target.checked) setView((v) => ({ view: "above", key: v.key + 1 }));
              }}
              className="size-5 accent-coral-500"
            />
            Compare the dying and the firm line
          </label>
          {compare && dying.ok && firm.ok && dying.read.aimOffsetM !== null && firm.read.aimOffsetM !== null ? (
            <p className="rounded-xl bg-ink-50 px-3 py-2 text-sm text-ink-800" aria-live="polite">
              Dying ({aimWords(dying.read.aimOffsetM, units)}) against firm ({aimWords(firm.read.aimOffsetM, units)}): a dying ball needs{" "}
              <strong>{formatShort(Math.abs(dying.read.aimOffsetM) - Math.abs(firm.read.aimOffsetM), units)}</strong> more borrow,{" "}
              {holeWidthsWords(Math.abs(dying.read.aimOffsetM) - Math.abs(firm.read.aimOffsetM))}.
            </p>
          ) : null}
          {webgl ? (
            <div className="flex flex-wrap gap-2">
              <Button onClick={() => play(1)} disabled={!current.ok}>
                Replay the roll
              </Button>
              <Button variant="secondary" onClick={() => play(0.25)} disabled={!current.ok}>
                Slow motion (×0.25)
              </Button>
            </div>
          ) : null}
        </Card>
        <details className="rounded-(--radius-card) bg-sand-50 p-4 ring-1 ring-ink-900/5">
          <summary className="cursor-pointer font-medium text-ink-900">
            Change the putt <span className="font-normal text-ink-500">({puttWords(putt, units)})</span>
          </summary>
          <div className="mt-3">
            <PuttEditor putt={{ ...putt, rollPastM }} units={units} onSubmit={onPuttChange} />
          </div>
        </details>
        <p className="text-sm text-ink-500">
          The read assumes an even, planar slope and a true-rolling ball. Grain, wind and the green&apos;s own contours change real putts:
          use it as a starting point for your own judgement.
        </p>
        <p className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
          <TextLink to={paths.read.href(encodeRehearse({ ...putt, rollPastM }))}>Open in the read calculator</TextLink>
          <TextLink to={paths.breakChart.href(encodeRehearse({ ...putt, rollPastM }))}>Break chart for this green</TextLink>
          <TextLink to={paths.train.href()}>Practise reading putts</TextLink>
        </p>
      </div>

      <Card padded={false} className="p-4 lg:col-start-1 lg:row-start-2">
        <SlopeLegend
          slopePct={putt.slopePct}
          fallLineDeg={putt.fallLineDeg}
          contourIntervalM={interval}
          units={units}
          exaggeration={exaggerate ? EXAGGERATION : 1}
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
              Draw the tilt {EXAGGERATION}× steeper
            </label>
          ) : null}
        </SlopeLegend>
      </Card>
    </div>
  );
}

function puttWords(p: RehearsePutt, units: UnitSystem): string {
  return `${formatLength(p.distanceM, units)}, ${formatSlope(p.slopePct)}, ${stimpText(p.stimpFt)}, the green ${fallLineWords(p.fallLineDeg)}`;
}
