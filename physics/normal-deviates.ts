// Standard normal deviates from a caller's seeded uniform generator (physics has no randomness of its own).

/** A uniform generator on [0, 1), seeded by the caller (e.g. pure-rand's xoroshiro128+ via shared/seeded-random). */
export type UniformRandom = () => number;

/**
 * `count` independent standard normal deviates by the Box–Muller transform (G. E. P. Box & M. E. Muller, "A Note
 * on the Generation of Random Normal Deviates", Ann. Math. Statist. 29(2), 1958): from uniforms u1 ∈ (0, 1] and u2,
 * z1 = √(−2 ln u1)·cos(2πu2), z2 = √(−2 ln u1)·sin(2πu2). Consumes ⌈count/2⌉ pairs of uniforms in order, so the same
 * seed gives the same deviates (common random numbers across calls).
 * @example standardNormals(seededUniform(1), 4) // Float64Array(4) of N(0, 1) values
 */
export function standardNormals(random: UniformRandom, count: number): Float64Array {
  if (!Number.isInteger(count) || count < 0) throw new RangeError(`count must be an integer ≥ 0 (got ${count})`);
  const out = new Float64Array(count);
  for (let i = 0; i < count; i += 2) {
    const u1 = 1 - random();
    const u2 = random();
    if (!(u1 > 0 && u1 <= 1) || !(u2 >= 0 && u2 < 1)) throw new RangeError(`random() must return values in [0, 1) (got ${1 - u1}, ${u2})`);
    const r = Math.sqrt(-2 * Math.log(u1));
    out[i] = r * Math.cos(2 * Math.PI * u2);
    if (i + 1 < count) out[i + 1] = r * Math.sin(2 * Math.PI * u2);
  }
  return out;
}
