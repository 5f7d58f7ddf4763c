// The timing helpers every benchmark shares: medians of repeated runs after a warm-up.
export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}

/** Median wall time of `fn` in ms over `runs` runs, after `warmup` unmeasured ones. */
export function timeMs(fn: () => void, runs: number, warmup: number): number {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  return median(times);
}

/** The same for an async `fn`. */
export async function timeMsAsync(fn: () => Promise<unknown>, runs: number, warmup: number): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  return median(times);
}
