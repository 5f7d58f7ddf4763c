// Forward roll: launch speed and start line on a green → path, rest point, pass at the hole, capture outcome.
import { captureAtRim, captureOutcome, type Capture, type RimCrossing } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { rollToRest, type RollState } from "./roll";
import { stopsInPractice, describeModel, resolveGreen, requireFinite, type GreenInput, type ModelSummary } from "./roll-model";
import { cannotStop, toPath, type CannotStop } from "./read-types";

/** Inputs of a forward roll. Angles in degrees (+ = right of the line to the hole), speed m/s, distance m. */
export interface RollInput extends GreenInput {
  readonly distanceM: number;
  readonly launchSpeedMps: number;
  readonly startLineDeg: number;
}

/** The ball's closest pass at the hole centre. `offsetM` is signed: + = the ball passes to the right of the centre. */
export interface HolePass {
  readonly distanceM: number;
  readonly offsetM: number;
  readonly speedMps: number;
  readonly alongPathM: number;
  readonly timeS: number;
  readonly pointM: [number, number];
  /** True when the ball came to rest before (or at) its closest point. */
  readonly atRest: boolean;
}

/** A forward roll. Path points are [x, y] in m; `pathSpeedsMps`/`pathTimesS` run beside them. */
export interface Roll {
  readonly path: [number, number][];
  readonly restM: [number, number];
  readonly rollLengthM: number;
  readonly rollTimeS: number;
  readonly closestApproach: HolePass;
  readonly capture: Capture;
  /** Where the ball's centre crossed the hole's edge before its closest pass (null if it never did). */
  readonly rim: RimCrossing | null;
  readonly samples: { readonly timeS: number[]; readonly speedMps: number[]; readonly xM: number[]; readonly yM: number[] };
  readonly model: ModelSummary;
  readonly diagnostics: { readonly steps: number; readonly evaluations: number; readonly eventIterations: number };
}

/** `{ ok: true, roll }`, or the cannot-stop value when a_g ≥ a_r. */
export type RollResult = { readonly ok: true; readonly roll: Roll } | CannotStop;

/**
 * Roll a true-rolling ball from (0, 0) towards a hole at (0, D) and report its path to rest, its closest approach
 * to the hole centre (event d/dt|p − h|² = 0 from − to +, located on odex's dense output) and the capture
 * outcome at the hole's edge before it (Holmes 1991's criterion at the rim; docs/sources.md). The hole is treated as covered for the path.
 * @example simulateRoll({ distanceM: 3, slopePct: 0, fallLineDeg: 0, stimpFt: 10, launchSpeedMps: 1.8288, startLineDeg: 0 }) // rests 3.048 m out
 */
export function simulateRoll(input: RollInput): RollResult {
  requireFinite("launchSpeedMps", input.launchSpeedMps);
  requireFinite("startLineDeg", input.startLineDeg);
  if (!(input.distanceM > 0) || !Number.isFinite(input.distanceM)) throw new RangeError(`distanceM must be > 0 (got ${input.distanceM})`);
  if (input.launchSpeedMps < 0) throw new RangeError(`launchSpeedMps must be ≥ 0 (got ${input.launchSpeedMps})`);
  const green = resolveGreen(input);
  const model = describeModel(green);
  if (!stopsInPractice(green)) return cannotStop(model);
  const hole: [number, number] = [0, input.distanceM];
  if (input.launchSpeedMps === 0) return { ok: true, roll: restingBall(hole, model) };
  const s = (input.startLineDeg * Math.PI) / 180;
  const trace = rollToRest(green, input.launchSpeedMps, [Math.sin(s), Math.cos(s)], {
    target: hole,
    rimRadiusM: HOLE_RADIUS_M,
    samplesPerStep: 9,
  });
  const dist = (p: RollState) => Math.hypot(p.xM - hole[0], p.yM - hole[1]);
  let closest = trace.rest;
  for (const p of trace.approaches) if (dist(p) < dist(closest)) closest = p;
  const atRest = closest === trace.rest;
  const pass = holePass(closest, hole, atRest ? trace.samples[trace.samples.length - 2] : undefined);
  let rim: RimCrossing | null = null;
  if (pass.distanceM < HOLE_RADIUS_M && !atRest) {
    for (const e of trace.rimEntries) {
      if (e.timeS > closest.timeS) break;
      const sp = Math.hypot(e.vxMps, e.vyMps);
      rim = { offsetM: Math.abs((e.vyMps * (e.xM - hole[0]) - e.vxMps * (e.yM - hole[1])) / sp), speedMps: sp };
    }
  }
  const restsOverHole = Math.hypot(trace.rest.xM - hole[0], trace.rest.yM - hole[1]) < HOLE_RADIUS_M;
  const samples = { timeS: [] as number[], speedMps: [] as number[], xM: [] as number[], yM: [] as number[] };
  for (const p of [...trace.samples, trace.rest]) {
    samples.timeS.push(p.timeS);
    samples.speedMps.push(Math.hypot(p.vxMps, p.vyMps));
    samples.xM.push(p.xM);
    samples.yM.push(p.yM);
  }
  return {
    ok: true,
    roll: {
      path: toPath(trace.samples, trace.rest, 1, 1),
      restM: [trace.rest.xM, trace.rest.yM],
      rollLengthM: trace.rest.alongPathM,
      rollTimeS: trace.rest.timeS,
      closestApproach: pass,
      capture: captureAtRim(pass.distanceM, rim, pass.speedMps, restsOverHole),
      rim,
      samples,
      model,
      diagnostics: { steps: trace.stats.steps, evaluations: trace.stats.evaluations, eventIterations: trace.stats.eventIterations },
    },
  };
}

function holePass(p: RollState, hole: readonly [number, number], before: RollState | undefined): HolePass {
  const dx = p.xM - hole[0];
  const dy = p.yM - hole[1];
  const distanceM = Math.hypot(dx, dy);
  let vx = p.vxMps;
  let vy = p.vyMps;
  if (vx === 0 && vy === 0 && before !== undefined) {
    vx = p.xM - before.xM;
    vy = p.yM - before.yM;
  }
  const sp = Math.hypot(vx, vy);
  // Signed by the side of the travel direction the centre lies on (+ = ball to the right of the hole centre).
  const side = sp > 0 ? (vy * dx - vx * dy) / sp : dx;
  return {
    distanceM,
    offsetM: side >= 0 ? distanceM : -distanceM,
    speedMps: Math.hypot(p.vxMps, p.vyMps),
    alongPathM: p.alongPathM,
    timeS: p.timeS,
    pointM: [p.xM, p.yM],
    atRest: p.vxMps === 0 && p.vyMps === 0,
  };
}

function restingBall(hole: readonly [number, number], model: ModelSummary): Roll {
  const d = Math.hypot(hole[0], hole[1]);
  return {
    path: [[0, 0]],
    restM: [0, 0],
    rollLengthM: 0,
    rollTimeS: 0,
    closestApproach: { distanceM: d, offsetM: d, speedMps: 0, alongPathM: 0, timeS: 0, pointM: [0, 0], atRest: true },
    capture: captureOutcome(d, 0),
    rim: null,
    samples: { timeS: [0], speedMps: [0], xM: [0], yM: [0] },
    model,
    diagnostics: { steps: 0, evaluations: 0, eventIterations: 0 },
  };
}
