// "Map this green": walk a grid, lay the phone at every spot with its top edge toward a fixed mark (or any way round,
// the phone's compass telling which way: each reading is then turned to north with the heading at its spot,
// shared/phone-level.ts phoneToNorthGradient), and the slopes measured there become the green's height map (shared/gradient-map.ts, least squares), saved through the same
// route as an uploaded grid. The first spot is read twice (half a turn) to learn the phone's own tilt.
// Over 300 lines on purpose (issue 16): one flow (setup, the half turn, the walk, the review) whose stages share the
// tilt sensor, the compass and the readings taken so far; the grid of spots is its own file (walk-grid.tsx).
import { useMemo, useRef, useState, type FormEvent } from "react";
import { SUSPECT_RESIDUAL_PCT, WALK_LIMITS, heightsFromGradients, walkedHeightMap } from "#shared/gradient-map";
import { correctedGradient, halfTurn, phoneToNorthGradient, type Gradient, type Vec3 } from "#shared/phone-level";
import { parseDecimal } from "#shared/units";
import { useTiltSensor } from "../../../components/measure/use-tilt-sensor";
import { Alert, Button, ChoiceGroup, InputField, Spinner } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { NO_HEADING_WORDS, TILT_PROBLEM_WORDS, compassUnavailableReason, isTiltProblem, type TiltProblem } from "../../../lib/tilt-sensor";
import { useSaveWalkedMap } from "../api/save-walked-map";
import { spotWords, WalkGrid, type Facing, type Grid } from "./walk-grid";

type Stage = "setup" | "turn" | "walking" | "review";
type WalkProblem = TiltProblem | "no-heading";

const problemWords = (p: WalkProblem) => (p === "no-heading" ? NO_HEADING_WORDS : TILT_PROBLEM_WORDS[p]);

/** 0° north, clockwise: the nearest of eight compass points, for "the top edge points 40° (north-east)". */
function compassPoint(deg: number): string {
  const names = ["north", "north-east", "east", "south-east", "south", "south-west", "west", "north-west"];
  return names[Math.round(deg / 45) % 8]!;
}

function nextStepWords(k: number, grid: Grid): string {
  const north = grid.facing === "north";
  if (k === 0) return north ? "Start at the south-west corner, facing north." : "Start at the near left corner.";
  const m = `${grid.spacingM.toFixed(1)} m`;
  if (north) return k % grid.nx === 0 ? `Go back to the west edge and ${m} further north.` : `Walk ${m} east.`;
  return k % grid.nx === 0 ? `Go back to the left edge and ${m} further toward the mark.` : `Walk ${m} to the right.`;
}

export function WalkGreen({ greenId, replacing }: { greenId: string; replacing: boolean }) {
  const sensor = useTiltSensor();
  const save = useSaveWalkedMap(greenId);
  const [text, setText] = useState({ nx: "3", ny: "3", spacing: "1.5" });
  const [compassWhyNot] = useState(compassUnavailableReason);
  const [facing, setFacing] = useState<Facing>("mark");
  const [heading, setHeading] = useState<number | null>(null);
  const [setupErrors, setSetupErrors] = useState<Record<string, string>>({});
  const [grid, setGrid] = useState<Grid | null>(null);
  const [stage, setStage] = useState<Stage>("setup");
  const [current, setCurrent] = useState(0);
  const [readings, setReadings] = useState<(Gradient | null)[]>([]);
  const [problem, setProblem] = useState<WalkProblem | null>(null);
  const [waiting, setWaiting] = useState(false);
  const abort = useRef<AbortController | null>(null);
  const state = useRef<{ sensorTilt: Gradient; lastUp: Vec3 | null; readings: (Gradient | null)[] }>({
    sensorTilt: [0, 0],
    lastUp: null,
    readings: [],
  });

  const stopWaiting = () => {
    abort.current?.abort();
    abort.current = null;
  };

  const record = (k: number, g: Gradient) => {
    state.current.readings = state.current.readings.map((r, i) => (i === k ? g : r));
    setReadings(state.current.readings);
  };

  /** Walks from spot `from` to the end (or measures that one spot again when `only`), then shows the review. */
  const walkFrom = async (g: Grid, from: number, only = false) => {
    stopWaiting();
    const ctl = new AbortController();
    abort.current = ctl;
    setProblem(null);
    const total = g.nx * g.ny;
    let shown = 0;
    // The compass heading under the phone, at most five times a second (for "the top edge points 40°").
    const onSample = () => {
      const now = performance.now();
      if (g.facing !== "north" || now - shown < 200) return;
      shown = now;
      setHeading(sensor.latestHeading);
    };
    /** A reading's gradient in the map's frame: as read toward the mark, or turned to north by its own heading. */
    const toMap = (gr: Gradient, headingDeg: number | null): Gradient | "no-heading" =>
      g.facing === "mark" ? gr : headingDeg === null ? "no-heading" : phoneToNorthGradient(gr, headingDeg);
    for (let k = from; k < total; k++) {
      setCurrent(k);
      setStage("walking");
      setWaiting(true);
      const first = await sensor.waitForStill({ afterMove: state.current.lastUp ?? undefined, signal: ctl.signal, onSample });
      if (first === "cancelled") return;
      if (isTiltProblem(first)) {
        setWaiting(false);
        setProblem(first);
        return;
      }
      if (k === 0) {
        // The first spot twice: half a turn between, so the phone's own tilt is known for every later spot.
        setStage("turn");
        const second = await sensor.waitForStill({ afterMove: first.up, signal: ctl.signal, onSample });
        if (second === "cancelled") return;
        if (isTiltProblem(second)) {
          setWaiting(false);
          setProblem(second);
          return;
        }
        const r = halfTurn(first.up, second.up);
        state.current.sensorTilt = r.sensorTilt;
        state.current.lastUp = second.up;
        // The half turn's gradient is in the first reading's frame, so it turns with the first reading's heading.
        const mapped = toMap(r.gradient, first.headingDeg);
        if (mapped === "no-heading") {
          setWaiting(false);
          setProblem(mapped);
          return;
        }
        record(0, mapped);
      } else {
        state.current.lastUp = first.up;
        const mapped = toMap(correctedGradient(first.up, state.current.sensorTilt), first.headingDeg);
        if (mapped === "no-heading") {
          setWaiting(false);
          setProblem(mapped);
          return;
        }
        record(k, mapped);
      }
      if (only) break;
    }
    setWaiting(false);
    setStage("review");
  };

  const begin = async (e: FormEvent) => {
    e.preventDefault();
    const nx = parseDecimal(text.nx);
    const ny = parseDecimal(text.ny);
    const spacingM = parseDecimal(text.spacing);
    const L = WALK_LIMITS;
    const errors: Record<string, string> = {};
    const count = (v: number | null) => v !== null && Number.isInteger(v) && v >= L.minSpotsPerSide && v <= L.maxSpotsPerSide;
    if (!count(nx)) errors.nx = `Enter a whole number from ${L.minSpotsPerSide} to ${L.maxSpotsPerSide}.`;
    if (!count(ny)) errors.ny = `Enter a whole number from ${L.minSpotsPerSide} to ${L.maxSpotsPerSide}.`;
    if (spacingM === null || spacingM < L.spacingM.min || spacingM > L.spacingM.max)
      errors.spacing = `Enter ${L.spacingM.min}–${L.spacingM.max} m (a pace or two).`;
    setSetupErrors(errors);
    if (Object.keys(errors).length > 0) return;
    const problemNow = await sensor.start();
    if (problemNow) {
      setProblem(problemNow);
      return;
    }
    const g: Grid = { nx: nx!, ny: ny!, spacingM: spacingM!, facing: compassWhyNot ? "mark" : facing };
    setHeading(null);
    state.current = { sensorTilt: [0, 0], lastUp: null, readings: new Array<Gradient | null>(g.nx * g.ny).fill(null) };
    setReadings(state.current.readings);
    setGrid(g);
    save.reset();
    void walkFrom(g, 0);
  };

  const cancel = () => {
    stopWaiting();
    sensor.stop();
    setWaiting(false);
    setStage("setup");
    setGrid(null);
    setProblem(null);
  };

  const fit = useMemo(() => {
    if (!grid || stage !== "review" || readings.some((r) => r === null)) return null;
    return heightsFromGradients({ ...grid, gradients: readings as Gradient[] });
  }, [grid, stage, readings]);

  const saveMap = () => {
    if (!grid || !fit) return;
    save.mutate(walkedHeightMap(grid, fit));
  };

  if (!grid || stage === "setup") {
    return (
      <form className="flex flex-col gap-4" onSubmit={(e) => void begin(e)} noValidate aria-labelledby="walk-heading">
        <h2 id="walk-heading" className="text-lg font-semibold tracking-tight">
          {replacing ? "Map it again by walking" : "Map this green by walking it"}
        </h2>
        {facing === "north" && !compassWhyNot ? (
          <p className="text-sm text-ink-700">
            No survey needed: walk a grid of spots a pace or two apart, rows running east and each row further north, starting at the
            south-west corner. At every spot lay the phone flat any way round and let go; it reads the slope and the compass in two seconds
            and turns the slope to north. On the map, north is the compass&apos;s north.
          </p>
        ) : (
          <p className="text-sm text-ink-700">
            No survey needed: pick a fixed mark beyond the far side (the flag, a tree, a bunker&apos;s lip) and walk a grid of spots a pace
            or two apart, starting at the near left corner. At every spot lay the phone flat with its top edge toward the mark and let go;
            it reads the slope in two seconds. On the map, north is toward your mark.
          </p>
        )}
        <div className="grid grid-cols-3 gap-3">
          <InputField
            label="Across"
            hint="Spots a row"
            inputMode="numeric"
            value={text.nx}
            onChange={(e) => setText((t) => ({ ...t, nx: e.target.value }))}
            error={setupErrors.nx}
          />
          <InputField
            label="Rows"
            hint={facing === "north" && !compassWhyNot ? "Northward" : "Toward the mark"}
            inputMode="numeric"
            value={text.ny}
            onChange={(e) => setText((t) => ({ ...t, ny: e.target.value }))}
            error={setupErrors.ny}
          />
          <InputField
            label="Apart (m)"
            hint="A pace or two"
            inputMode="decimal"
            value={text.spacing}
            onChange={(e) => setText((t) => ({ ...t, spacing: e.target.value }))}
            error={setupErrors.spacing}
          />
        </div>
        <ChoiceGroup
          legend="Which way the phone lies"
          inputProps={{ name: "walk-facing" }}
          value={compassWhyNot ? "mark" : facing}
          onValueChange={(v) => setFacing(v as Facing)}
          choices={[
            {
              value: "mark",
              label: "Top edge toward a fixed mark",
              description: "Works on every phone: the flag, a tree, a bunker's lip.",
            },
            {
              value: "north",
              label: "Any way round, by the compass",
              disabled: compassWhyNot !== null,
              description: compassWhyNot
                ? `Not available here: ${compassWhyNot}`
                : "The phone's compass says which way it lay at each spot; rows run east, the grid grows north.",
            },
          ]}
          hint={
            !compassWhyNot && facing === "north"
              ? "Compass caution: near metal (a cart, a sprinkler head) or with a magnet in the phone's case the heading can be off by several degrees, and so can the fall line."
              : undefined
          }
        />
        {problem ? (
          <Alert tone="info" title="No measurement">
            {problemWords(problem)}
          </Alert>
        ) : null}
        <div>
          <Button type="submit" variant="secondary">
            Start walking
          </Button>
        </div>
      </form>
    );
  }

  const total = grid.nx * grid.ny;
  const done = readings.filter((r) => r !== null).length;
  const residual = fit?.residualPct;
  const saveError = save.error;

  return (
    <section className="flex flex-col gap-4" aria-labelledby="walk-heading">
      <h2 id="walk-heading" className="text-lg font-semibold tracking-tight">
        {stage === "review" ? "The walked map" : `Spot ${current + 1} of ${total}`}
      </h2>
      <div aria-live="polite" className="flex flex-col gap-2 text-sm text-ink-800">
        {problem ? (
          <Alert tone={problem === "kept-moving" ? "warning" : "info"} title="No reading">
            {problemWords(problem)}
          </Alert>
        ) : stage === "turn" ? (
          <p>
            <span className="font-semibold">Now turn the phone half a turn on the same spot</span> (top edge toward you) and let go: this
            teaches Borrowline the phone&apos;s own tilt, once for the whole walk.
          </p>
        ) : stage === "walking" ? (
          grid.facing === "north" ? (
            <>
              <p>
                {nextStepWords(current, grid)} Lay the phone flat at {spotWords(current, grid.nx, "north")}, any way round, and let go.
              </p>
              <p className="text-ink-600">
                {heading === null
                  ? "Waiting for the compass…"
                  : `The phone's top edge points ${heading.toFixed(0)}° (${compassPoint(heading)}).`}
              </p>
            </>
          ) : (
            <p>
              {nextStepWords(current, grid)} Lay the phone flat at {spotWords(current, grid.nx)}, top edge toward the mark, and let go.
            </p>
          )
        ) : fit ? (
          <p>
            {total} spots walked. The heights fit the slopes to {fit.rmsResidualPct.toFixed(2)} % on average
            {residual && residual.some((r) => r > SUSPECT_RESIDUAL_PCT)
              ? `; the spots marked below disagree with their neighbours by more than ${SUSPECT_RESIDUAL_PCT} %: measure them again (a tuft, a ball mark, or ${grid.facing === "north" ? "a compass pulled off by metal nearby" : "the phone not toward the mark"}).`
              : "; no spot disagrees with its neighbours."}
          </p>
        ) : null}
        {waiting && !problem ? (
          <p className="flex items-center gap-2 text-ink-600">
            <Spinner size="sm" label="Waiting for the phone to lie still" /> Waiting for the phone to lie still for two seconds ({done} of{" "}
            {total} done)
          </p>
        ) : null}
      </div>

      <WalkGrid
        grid={grid}
        readings={readings}
        current={stage === "review" ? null : current}
        residual={residual}
        onRedo={stage === "review" ? (k) => void walkFrom(grid, k, true) : undefined}
      />

      {stage === "review" && fit ? (
        saveError ? (
          <Alert tone="error" title="Could not save the map">
            {isApiError(saveError) && Object.keys(saveError.fields).length > 0
              ? Object.values(saveError.fields).join("; ")
              : saveError.message}
          </Alert>
        ) : null
      ) : null}

      <div className="flex flex-wrap gap-2">
        {stage === "review" && fit ? (
          <Button type="button" onClick={saveMap} loading={save.isPending} loadingText="Saving the map…">
            Save as this green&apos;s height map
          </Button>
        ) : null}
        {stage === "walking" || stage === "turn" ? (
          <Button type="button" size="sm" variant="secondary" onClick={() => sensor.markMoved()}>
            It is down: read it
          </Button>
        ) : null}
        {problem ? (
          <Button type="button" size="sm" variant="secondary" onClick={() => void walkFrom(grid, current)}>
            Try this spot again
          </Button>
        ) : null}
        {(stage === "walking" || stage === "turn") && current > 1 ? (
          <Button type="button" size="sm" variant="ghost" onClick={() => void walkFrom(grid, current - 1)}>
            Measure the last spot again
          </Button>
        ) : null}
        <Button type="button" size="sm" variant="ghost" onClick={cancel}>
          {stage === "review" ? "Start over" : "Stop walking"}
        </Button>
      </div>
      <p className="text-sm text-ink-500">
        Between the spots the map is smooth: a ridge or hollow smaller than the spacing is not in it. Grain and wind are not either.
        {grid.facing === "north" ? " North on this map is the compass's, which metal nearby can pull off by several degrees." : ""}
      </p>
    </section>
  );
}
