// The one seeded uniform generator of the app (server and a client Web Worker give the same draws for a seed).
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";

/**
 * A uniform generator on [0, 1) from an integer seed: pure-rand's xoroshiro128+ with 53-bit doubles. Pass it to the
 * physics Monte Carlo (`makeProbability`, `bestPace`), which has no randomness of its own.
 */
export function seededUniform(seed: number): () => number {
  if (!Number.isSafeInteger(seed)) throw new RangeError(`seed must be a safe integer (got ${seed})`);
  const rng = xoroshiro128plus(seed);
  return () => uniformFloat64(rng);
}
