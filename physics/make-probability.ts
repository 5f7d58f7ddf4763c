// A player's make probability for a read (Monte Carlo over their start-line and pace dispersion), and the simulated
// putts themselves as a practice log records them. The model's types are in make-probability-types.ts, the
// simulation in monte-carlo.ts, "your best pace" in best-pace.ts.
import type { MakeProbabilityInput, MakeProbabilityResult } from "./make-probability-types";
import { describe, NORMALS_PER_PUTT, perturb, prepare, simulatePace, solvedRead } from "./monte-carlo";
import { greenLateralSigmaM } from "./make-probability-types";
import { standardNormals } from "./normal-deviates";
import { newPlanarRollOut, rollPlanarInto } from "./planar-roll";
import type { CannotStop } from "./read-types";

/**
 * Make probability of a read for a player with the given dispersion, by Monte Carlo: each simulated putt starts on
 * the read's start line + N(0, σ_angle²) with launch speed v·exp(ε/2), ε ~ N(0, σ_pace²) (see {@link PuttDispersion}),
 * rolls to rest on the planar green in closed form ({@link rollPlanarInto}; the same model as simulateRoll) and is
 * holed by Holmes's capture criterion at its closest pass (Am. J. Phys. 59(2), 1991; the ball stopping within a
 * hole radius of the centre counts as holed, as in simulateRoll). Deviates come from Box–Muller on the caller's
 * seeded generator, two per sample, in order (common random numbers across calls with the same seed).
 * @example makeProbability({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, dispersion: { angleDeg: 1.2, pace: 0.12 }, samples: 10000, random })
 */
export function makeProbability(input: MakeProbabilityInput): MakeProbabilityResult {
  const setup = prepare(input);
  if (!setup.ok) return setup;
  const normals = standardNormals(input.random, NORMALS_PER_PUTT * input.samples);
  const read = solvedRead(input, setup.readError);
  if (!read.ok) return read;
  const tally = simulatePace(setup.sim, read.read, read.rollPastM, normals, 0, input.samples, setup.keep);
  return { ok: true, result: describe(setup.sim, tally, input.samples) };
}

/** One simulated putt as a practice log would record it (see {@link simulatePuttOutcomes}). */
export interface SimulatedPutt {
  readonly holed: boolean;
  readonly restM: [number, number];
  readonly missSide: "left" | "right" | null;
  /** Signed along the ball→hole line: − short, + past (null when holed). */
  readonly missLengthM: number | null;
}

/**
 * The individual simulated putts of {@link makeProbability} (same deviates, same capture rule), recorded as a
 * practice log records a putt: holed, or the side and signed length of the miss (rest point − hole along the line).
 * For synthetic logs (tests of the dispersion estimator) and demonstrations.
 * @example simulatePuttOutcomes({ ...read, dispersion, samples: 20, random }).putts[0] // { holed: false, missSide: "left", missLengthM: 0.31, … }
 */
export function simulatePuttOutcomes(input: MakeProbabilityInput): { readonly ok: true; readonly putts: SimulatedPutt[] } | CannotStop {
  const setup = prepare(input);
  if (!setup.ok) return setup;
  const normals = standardNormals(input.random, NORMALS_PER_PUTT * input.samples);
  const read = solvedRead(input, setup.readError);
  if (!read.ok) return read;
  const { field, distanceM: D, holeRadiusM: rh, dispersion } = setup.sim;
  const sigmaA = (dispersion.angleDeg * Math.PI) / 180;
  const sigmaG = greenLateralSigmaM(D, dispersion.greenLateralM) / D;
  const out = newPlanarRollOut();
  const putts: SimulatedPutt[] = [];
  for (let i = 0; i < input.samples; i++) {
    const { line, speed } = perturb(
      read.read,
      normals,
      i,
      sigmaA,
      dispersion.pace / 2,
      sigmaG,
      dispersion.readSlopePct,
      read.read.sensitivity,
    );
    rollPlanarInto(field, speed, line, 0, D, out, rh, rh);
    const holed = out.holed;
    putts.push(
      holed
        ? { holed, restM: [0, D], missSide: null, missLengthM: null }
        : { holed, restM: [out.restX, out.restY], missSide: out.restX < 0 ? "left" : "right", missLengthM: out.restY - D },
    );
  }
  return { ok: true, putts };
}
