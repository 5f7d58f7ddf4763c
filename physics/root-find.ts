// A bracketed scalar root finder used by the inverse read.

/** Outcome of {@link brentRoot}: the best abscissa, its value and the evaluations spent. */
export interface RootResult {
  readonly x: number;
  readonly fx: number;
  readonly evaluations: number;
  readonly converged: boolean;
}

/**
 * Brent's method (R. P. Brent, "Algorithms for Minimization without Derivatives", 1973, ch. 4): inverse
 * quadratic interpolation and secant steps safeguarded by bisection, on a bracket with f(a)·f(b) ≤ 0.
 * Stops when `done(x, fx)` accepts a point, when the bracket is narrower than `xTol`, or after `maxIter`.
 * @example brentRoot((x) => x * x - 2, 0, 2, -2, 2, (_x, f) => Math.abs(f) < 1e-12).x // ≈ 1.41421356
 */
export function brentRoot(
  f: (x: number) => number,
  a0: number,
  b0: number,
  fa0: number,
  fb0: number,
  done: (x: number, fx: number) => boolean,
  xTol = 1e-14,
  maxIter = 60,
): RootResult {
  let a = a0;
  let b = b0;
  let fa = fa0;
  let fb = fb0;
  if (fa * fb > 0) throw new Error(`brentRoot: not a bracket: f(${a})=${fa}, f(${b})=${fb}`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  let evaluations = 0;
  for (let iter = 0; iter < maxIter; iter++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (done(b, fb) || Math.abs(m) <= tol || fb === 0) return { x: b, fx: fb, evaluations, converged: true };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    evaluations++;
  }
  return { x: b, fx: fb, evaluations, converged: false };
}
