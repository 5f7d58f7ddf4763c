// "Measure on the green": the phone laid flat at the ball, its top edge toward the hole, read twice (the second time
// turned half a turn on the same spot) → slope % and fall line in the putt frame. Shared by the read page and read
// training, so it lives in components (a feature may not import another).
import { useRef, useState } from "react";
import { HALF_TURN_SUSPECT_PCT, gradientFromUp, halfTurn, slopeAndFallLine, type StillReading } from "../../../shared/phone-level";
import { READ_LIMITS } from "../../../shared/read-limits";
import { TILT_PROBLEM_WORDS, isTiltProblem, type TiltProblem } from "../../lib/tilt-sensor";
import { fallLineWords } from "../green-3d/words";
import { Alert, Button, Spinner } from "../ui";
import { useLiveSlope, useTiltSensor } from "./use-tilt-sensor";

export type Measured = {
  slopePct: number;
  fallLineDeg: number;
  /** Spread of the single samples (%), the steadier of the readings' worst. */
  spreadPct: number;
  /** With the half turn: how far the two readings disagreed (%) and the phone's own tilt taken out (°). */
  disagreementPct: number | null;
  sensorTiltDeg: number | null;
};

type Phase =
  | { kind: "closed" }
  | { kind: "starting" }
  | { kind: "problem"; problem: TiltProblem }
  | { kind: "first" }
  | { kind: "second"; first: StillReading }
  | { kind: "done"; result: Measured };

const pct = (v: number, d = 1) => `${v.toFixed(d)} %`;

export function MeasureOnGreen({
  onMeasured,
  target = "the hole",
  compact = false,
}: {
  /** Called with every finished measurement (the read form fills itself in). */
  onMeasured: (m: Measured) => void;
  /** What the phone's top edge points at. */
  target?: string;
  compact?: boolean;
}) {
  const sensor = useTiltSensor();
  const [phase, setPhase] = useState<Phase>({ kind: "closed" });
  const [live, onSample] = useLiveSlope();
  const abort = useRef<AbortController | null>(null);

  const fail = (r: TiltProblem | "cancelled") => {
    if (r === "cancelled") return;
    setPhase({ kind: "problem", problem: r });
  };

  const finish = (m: Measured) => {
    setPhase({ kind: "done", result: m });
    if (m.slopePct <= READ_LIMITS.slopePct.max) onMeasured(m);
  };

  const takeSecond = async (first: StillReading, ctl: AbortController) => {
    setPhase({ kind: "second", first });
    const second = await sensor.waitForStill({ afterMove: first.up, signal: ctl.signal, onSample });
    if (isTiltProblem(second) || second === "cancelled") return fail(second);
    const r = halfTurn(first.up, second.up);
    finish({
      slopePct: r.slopePct,
      fallLineDeg: r.fallLineDeg,
      spreadPct: Math.max(first.spreadPct, second.spreadPct),
      disagreementPct: r.disagreementPct,
      sensorTiltDeg: r.sensorTiltDeg,
    });
  };

  const begin = async () => {
    abort.current?.abort();
    const ctl = new AbortController();
    abort.current = ctl;
    setPhase({ kind: "starting" });
    const problem = await sensor.start();
    if (problem) return fail(problem);
    setPhase({ kind: "first" });
    const first = await sensor.waitForStill({ signal: ctl.signal, onSample });
    if (isTiltProblem(first) || first === "cancelled") return fail(first);
    await takeSecond(first, ctl);
  };

  const takeFirstAlone = (first: StillReading) => {
    abort.current?.abort();
    const r = slopeAndFallLine(gradientFromUp(first.up));
    finish({ ...r, spreadPct: first.spreadPct, disagreementPct: null, sensorTiltDeg: null });
  };

  const close = () => {
    abort.current?.abort();
    sensor.stop();
    setPhase({ kind: "closed" });
  };

  if (phase.kind === "closed") {
    return (
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <Button type="button" variant="secondary" size="sm" onClick={() => void begin()}>
          Measure on the green
        </Button>
        {compact ? null : <span className="text-sm text-ink-500">With a phone: lay it at the ball, top edge toward {target}.</span>}
      </div>
    );
  }

  return (
    <section aria-label="Measure on the green" className="flex flex-col gap-3 rounded-xl border-2 border-ink-900/10 bg-white/70 px-4 py-3">
      <div aria-live="polite" className="flex flex-col gap-2 text-sm text-ink-800">
        {phase.kind === "starting" ? <p>Asking for the phone&apos;s tilt sensor…</p> : null}
        {phase.kind === "problem" ? (
          <Alert tone={phase.problem === "kept-moving" ? "warning" : "info"} title="No measurement">
            {TILT_PROBLEM_WORDS[phase.problem]}
          </Alert>
        ) : null}
        {phase.kind === "first" ? (
          <>
            <p className="font-semibold">Step 1 of 2</p>
            <p>Lay the phone flat on the green at the ball, its top edge pointing at {target}, and take your hand away.</p>
            <Holding live={live} />
          </>
        ) : null}
        {phase.kind === "second" ? (
          <>
            <p className="font-semibold">Step 2 of 2</p>
            <p>
              First reading {pct(slopeAndFallLine(gradientFromUp(phase.first.up)).slopePct)}. Now turn the phone half a turn on the same
              spot (top edge toward you) and let go: the two readings cancel the phone&apos;s own tilt.
            </p>
            <Holding live={live} />
          </>
        ) : null}
        {phase.kind === "done" ? <Result m={phase.result} /> : null}
      </div>
      <div className="flex flex-wrap gap-2">
        {phase.kind === "second" ? (
          <>
            <Button type="button" size="sm" variant="secondary" onClick={() => sensor.markMoved()}>
              It is turned: read it
            </Button>
            <Button type="button" size="sm" variant="ghost" onClick={() => takeFirstAlone(phase.first)}>
              Use the first reading alone
            </Button>
          </>
        ) : null}
        {phase.kind === "done" || phase.kind === "problem" ? (
          <Button type="button" size="sm" variant="secondary" onClick={() => void begin()}>
            Measure again
          </Button>
        ) : null}
        <Button type="button" size="sm" variant="ghost" onClick={close}>
          {phase.kind === "done" || phase.kind === "problem" ? "Close" : "Cancel"}
        </Button>
      </div>
    </section>
  );
}

function Holding({ live }: { live: number | null }) {
  return (
    <p className="flex items-center gap-2 text-ink-600">
      <Spinner size="sm" label="Waiting for two seconds of stillness" />
      Hold still for two seconds{live !== null ? ` · now reading ${pct(live)}` : ""}
    </p>
  );
}

function Result({ m }: { m: Measured }) {
  const tooSteep = m.slopePct > READ_LIMITS.slopePct.max;
  return (
    <div className="flex flex-col gap-2" data-testid="measured">
      <p className="text-base font-semibold text-ink-900">
        Measured {pct(m.slopePct)}, {Math.round(m.fallLineDeg) % 360}°: the green {fallLineWords(m.fallLineDeg)}.
      </p>
      <p>
        Steady to ±{pct(m.spreadPct, 2)} over two seconds.
        {m.disagreementPct !== null && m.sensorTiltDeg !== null
          ? ` The two readings differed by ${pct(m.disagreementPct, 2)}; the phone's own tilt (${m.sensorTiltDeg.toFixed(2)}°) is taken out.`
          : " One reading only: the phone's own tilt is still in it."}
      </p>
      {tooSteep ? (
        <Alert tone="warning" title="Too steep to read">
          Over {READ_LIMITS.slopePct.max} %: is the phone flat on the green? Nothing was filled in.
        </Alert>
      ) : m.disagreementPct !== null && m.disagreementPct > HALF_TURN_SUSPECT_PCT ? (
        <Alert tone="warning" title="The two readings disagree">
          More than {HALF_TURN_SUSPECT_PCT} % apart: was the phone turned exactly half a turn on the same spot? Measure again to be sure.
        </Alert>
      ) : null}
      <p className="text-ink-500">The phone reads the ground under it; the read assumes that slope holds all the way to the hole.</p>
    </div>
  );
}
