// Random putts for read training, from a seeded generator passed in: the same seed gives the same round, so a
// round can be replayed from its link (/train?level=club&seed=12345&n=3).
import { TRAINING_LEVELS, type Range, type TrainingLevelId, type TrainingPutt } from "../../../../shared/training";

/** A random number source in [0, 1). */
export type Rng = () => number;

/** mulberry32: a small, fast 32-bit seeded generator (Tommy Ettinger's public-domain design). */
export function mulberry32(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

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
  return generatePutt(level, mulberry32(mixed));
}

/** A fresh seed for a new round (the one impure step, kept out of the generator). */
export function newSeed(): number {
  return Math.floor(Math.random() * 1_000_000_000);
}
