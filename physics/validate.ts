// Input checks shared by the physics entry points: a RangeError naming the value, never a NaN result.

/** Throws a RangeError unless `value` is a finite number. */
export function requireFinite(name: string, value: number): void {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number (got ${value})`);
}

/** Throws a RangeError unless `value` is finite and > 0. */
export function requirePositive(name: string, value: number): void {
  requireFinite(name, value);
  if (value <= 0) throw new RangeError(`${name} must be > 0 (got ${value})`);
}
