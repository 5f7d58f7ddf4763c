// Random putts for read training, from a seeded generator passed in: the same seed gives the same round, so a
// round can be replayed from its link (/train?level=club&seed=12345&n=3). The generator is the app's one seeded
// generator (shared/seeded-random.ts, pure-rand).
import { seededUniform } from "#shared/seeded-random";
import { TRAINING_LEVELS, type Range, type TrainingLevelId, type TrainingPutt } from "#shared/training";

/** A random number source in [0, 1). */
export type Rng = () => number;

function pick(rng: Rng, [min, max]: Range, step: number): number {
  const steps = Math.round((max - min) / step);
  const k = Math.min(steps, Math.floor(rng() * (steps + 1)));
  return Number((min + k * step).toFixed(6));
}

/**
 * One putt for a level from the generator: distance to 0.1 m, slope to 0.1 %, fall line to 5°, Stimp to 0.5 ft,
 * each inside the level's ranges (inclusive).
 */
export function generatePutt(level: TrainingLevelId, rng: Rng): TrainingPutt {
  const l = TRAINING_LEVELS[level];
  const distanceM = pick(rng, l.distanceM, 0.1);
  const slopePct = pick(rng, l.slopePct, 0.1);
  const fallLineDeg = pick(rng, [0, 355], 5);
  const stimpFt = pick(rng, l.stimpFt, 0.5);
  return { distanceM, slopePct, fallLineDeg, stimpFt };
}

/** Putt number `index` (0-based) of the round with this seed: each putt has its own stream, so any can be reopened. */
export function roundPutt(level: TrainingLevelId, seed: number, index: number): TrainingPutt {
  const mixed = Math.imul((seed >>> 0) ^ 0x9e3779b9, 0x85ebca6b) ^ Math.imul(index + 1, 0xc2b2ae35);
  return generatePutt(level, seededUniform(mixed));
}

/** A fresh seed for a new round (the one impure step, kept out of the generator). */
export function newSeed(): number {
  return Math.floor(Math.random() * 1_000_000_000);
}
