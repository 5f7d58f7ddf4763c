// The Monte Carlo behind makeProbability, bestPace and simulatePuttOutcomes: checking the inputs, the nominal read,
// and rolling simulated putts with the stroke's, the green's and the read's errors, tallied per pace.
import { HOLE_RADIUS_M } from "./constants";
import {
  DEFAULT_GREEN_LATERAL_M,
  DEFAULT_READ_ERROR_SLOPE_PCT,
  MAX_MONTE_CARLO_SAMPLES,
  greenLateralSigmaM,
  type MakeProbability,
  type MakeProbabilityInput,
  type PaceOutcome,
  type PaceRead,
  type PuttDispersion,
} from "./make-probability-types";
import { planarRollField, type PlanarRollField } from "./planar-path";
import { newPlanarRollOut, rollPlanarInto } from "./planar-roll";
import { readSensitivity, type ReadSensitivity } from "./read-sensitivity";
import { describeModel, resolveGreen, stopsInPractice } from "./roll-model";
import { cannotStop, validateReadInput, type CannotStop, type ReadInput } from "./read-types";
import { solveRead } from "./solve-read";

/** Standard normal deviates per simulated putt: start line, pace, green, read error across and along. */
export const NORMALS_PER_PUTT = 5;

export interface Sim {
  readonly field: PlanarRollField;
  readonly distanceM: number;
  readonly dispersion: Required<PuttDispersion>;
  readonly holeRadiusM: number;
  readonly secondPuttM: number;
}

export interface SimRead extends PaceRead {
  readonly startLineRad: number;
  readonly sensitivity: ReadSensitivity;
}

export function prepare(
  input: MakeProbabilityInput,
): { ok: true; field: PlanarRollField; sim: Sim; keep: number; readError: boolean } | CannotStop {
  validateReadInput(input);
  const { angleDeg, pace } = input.dispersion;
  const readSlopePct = input.dispersion.readSlopePct ?? DEFAULT_READ_ERROR_SLOPE_PCT;
  const greenLateralM = input.dispersion.greenLateralM ?? DEFAULT_GREEN_LATERAL_M;
  if (!(readSlopePct >= 0) || !Number.isFinite(readSlopePct))
    throw new RangeError(`dispersion.readSlopePct must be finite and ≥ 0 (got ${readSlopePct})`);
  if (!(greenLateralM >= 0) || !Number.isFinite(greenLateralM))
    throw new RangeError(`dispersion.greenLateralM must be finite and ≥ 0 (got ${greenLateralM})`);
  if (!(angleDeg >= 0) || !Number.isFinite(angleDeg)) throw new RangeError(`dispersion.angleDeg must be finite and ≥ 0 (got ${angleDeg})`);
  if (!(pace >= 0) || !Number.isFinite(pace)) throw new RangeError(`dispersion.pace must be finite and ≥ 0 (got ${pace})`);
  if (!Number.isInteger(input.samples) || input.samples < 1 || input.samples > MAX_MONTE_CARLO_SAMPLES) {
    throw new RangeError(`samples must be an integer in 1…${MAX_MONTE_CARLO_SAMPLES} (got ${input.samples})`);
  }
  const holeRadiusM = input.holeRadiusM ?? HOLE_RADIUS_M;
  if (!(holeRadiusM > 0) || !Number.isFinite(holeRadiusM)) throw new RangeError(`holeRadiusM must be > 0 (got ${holeRadiusM})`);
  const secondPuttM = input.secondPuttM ?? 1;
  if (!(secondPuttM >= 0) || !Number.isFinite(secondPuttM)) throw new RangeError(`secondPuttM must be ≥ 0 (got ${secondPuttM})`);
  const green = resolveGreen(input);
  if (!stopsInPractice(green)) return cannotStop(describeModel(green));
  // The Monte Carlo rolls in closed form: only the forces the closed form models exactly (physics/forces/).
  if (!green.closedForm) throw new RangeError("makeProbability needs the constant-resistance model (closed-form rolls)");
  const field = planarRollField(green);
  const keep = Math.min(input.samples, Math.max(0, Math.floor(input.finishesKept ?? 100)));
  const dispersion = { angleDeg, pace, readSlopePct, greenLateralM };
  return {
    ok: true,
    field,
    keep,
    readError: readSlopePct > 0,
    sim: { field, distanceM: input.distanceM, dispersion, holeRadiusM, secondPuttM },
  };
}

export function solvedRead(input: ReadInput, withReadError: boolean): { ok: true; read: SimRead; rollPastM: number } | CannotStop {
  const r = solveRead(input);
  if (!r.ok) return r;
  const { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps, rollPastM } = r.read;
  const sensitivity = withReadError ? readSensitivity(input) : { lineX: 0, lineY: 0, lnSpeedX: 0, lnSpeedY: 0 };
  return {
    ok: true,
    rollPastM,
    read: { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps, startLineRad: (startLineDeg * Math.PI) / 180, sensitivity },
  };
}

export interface Tally {
  readonly rollPastM: number;
  readonly read: SimRead;
  holed: number;
  lipOut: number;
  over: number;
  short: number;
  left: number;
  right: number;
  leaves: Float64Array;
  misses: number;
  finishes: [number, number][];
  finishHoled: boolean[];
}

/** One run of a pace from two runs of it on consecutive samples (the first one's first). */
export function addTallies(a: Tally, b: Tally): Tally {
  const leaves = new Float64Array(a.misses + b.misses);
  leaves.set(a.leaves.subarray(0, a.misses));
  leaves.set(b.leaves.subarray(0, b.misses), a.misses);
  return {
    rollPastM: a.rollPastM,
    read: a.read,
    holed: a.holed + b.holed,
    lipOut: a.lipOut + b.lipOut,
    over: a.over + b.over,
    short: a.short + b.short,
    left: a.left + b.left,
    right: a.right + b.right,
    leaves,
    misses: a.misses + b.misses,
    finishes: [...a.finishes, ...b.finishes],
    finishHoled: [...a.finishHoled, ...b.finishHoled],
  };
}

/** Simulate samples [from, to) of one pace (deviates by sample index, so runs over consecutive ranges add up). */
export function simulatePace(
  sim: Sim,
  read: SimRead,
  rollPastM: number,
  normals: Float64Array,
  from: number,
  to: number,
  keep: number,
): Tally {
  const { field, distanceM: D, holeRadiusM: rh, secondPuttM } = sim;
  const sigmaA = (sim.dispersion.angleDeg * Math.PI) / 180;
  const halfSigmaP = sim.dispersion.pace / 2;
  const sigmaG = greenLateralSigmaM(D, sim.dispersion.greenLateralM) / D;
  const sr = sim.dispersion.readSlopePct;
  const sens = read.sensitivity;
  const out = newPlanarRollOut();
  const t: Tally = {
    rollPastM,
    read,
    holed: 0,
    lipOut: 0,
    over: 0,
    short: 0,
    left: 0,
    right: 0,
    leaves: new Float64Array(to - from),
    misses: 0,
    finishes: [],
    finishHoled: [],
  };
  for (let i = from; i < to; i++) {
    const { line, speed } = perturb(read, normals, i, sigmaA, halfSigmaP, sigmaG, sr, sens);
    rollPlanarInto(field, speed, line, 0, D, out, rh, rh);
    const b = out.passDistanceM;
    const holed = out.holed;
    if (i < keep) {
      t.finishes.push(holed ? [0, D] : [out.restX, out.restY]);
      t.finishHoled.push(holed);
    }
    if (holed) {
      t.holed++;
      continue;
    }
    if (b < rh) t.lipOut++;
    const leave = Math.sqrt(out.restX * out.restX + (out.restY - D) * (out.restY - D));
    t.leaves[t.misses++] = leave;
    if (leave > secondPuttM) t.over++;
    if (out.restY < D) t.short++;
    if (out.restX < 0) t.left++;
    else t.right++;
  }
  return t;
}

/**
 * One simulated putt's start line and launch speed: the read's, plus the stroke (N(0, σ_a²) on the line, e^(ε/2) on
 * the speed), the green (its sideways deviation at the hole as an angle) and the read error (the slope misjudged by
 * N(0, σ_r²) across and along, through the read's sensitivity).
 */
export function perturb(
  read: SimRead,
  normals: Float64Array,
  i: number,
  sigmaA: number,
  halfSigmaP: number,
  sigmaG: number,
  sr: number,
  sens: ReadSensitivity,
): { line: number; speed: number } {
  const k = NORMALS_PER_PUTT * i;
  const ex = sr * normals[k + 3]!;
  const ey = sr * normals[k + 4]!;
  return {
    line: read.startLineRad + sigmaA * normals[k]! + sigmaG * normals[k + 2]! + sens.lineX * ex + sens.lineY * ey,
    speed: read.launchSpeedMps * Math.exp(halfSigmaP * normals[k + 1]! + sens.lnSpeedX * ex + sens.lnSpeedY * ey),
  };
}

export function outcomeOf(t: Tally, samples: number): PaceOutcome {
  const p = t.holed / samples;
  const { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps } = t.read;
  return {
    rollPastM: t.rollPastM,
    makeProbability: p,
    makeProbabilityStandardError: Math.sqrt((p * (1 - p)) / samples),
    secondPuttOverProbability: t.over / samples,
    read: { aimOffsetM, startLineDeg, launchSpeedMps, entrySpeedMps },
  };
}

export function describe(sim: Sim, t: Tally, samples: number): MakeProbability {
  const leaves = t.leaves.subarray(0, t.misses).slice().sort();
  const quantile = (q: number) => (leaves.length === 0 ? 0 : leaves[Math.min(leaves.length - 1, Math.floor(q * leaves.length))]!);
  let sum = 0;
  for (const x of leaves) sum += x;
  return {
    ...outcomeOf(t, samples),
    finishes: t.finishes,
    finishHoled: t.finishHoled,
    misses: {
      missProbability: t.misses / samples,
      shortProbability: t.short / samples,
      longProbability: (t.misses - t.short) / samples,
      leftProbability: t.left / samples,
      rightProbability: t.right / samples,
      lipOutProbability: t.lipOut / samples,
      meanLeaveM: leaves.length === 0 ? 0 : sum / leaves.length,
      medianLeaveM: quantile(0.5),
      p90LeaveM: quantile(0.9),
    },
    samples,
    dispersion: sim.dispersion,
    holeRadiusM: sim.holeRadiusM,
    secondPuttM: sim.secondPuttM,
  };
}
