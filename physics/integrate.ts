// The one adapter around odex (E. Hairer & G. Wanner's ODEX extrapolation integrator, ported by C. Smith):
// adaptive steps with dense output, plus exact event location, which odex itself does not offer.
import { Solver } from "#odex";

/** Right-hand side y' = f(t, y) of a first-order system. */
export type Rhs = (t: number, y: number[]) => number[];

/**
 * An event: a zero crossing of `value(t, y)` in the given `direction` (+1: from negative to positive; −1: from
 * positive to negative). A terminal event ends the integration at the crossing.
 */
export interface OdeEvent {
  readonly value: (t: number, y: readonly number[]) => number;
  readonly direction: 1 | -1;
  readonly terminal: boolean;
  /**
   * How many interior points of a step (given the states at its ends) to check the sign at as well (default none:
   * the step's ends only). For an event whose value can cross and come back inside one step, such as entering and
   * leaving a small circle.
   */
  readonly scan?: (yOld: readonly number[], yNew: readonly number[]) => number;
}

/** A located event: which one (index into the events array), when, and the state there. */
export interface EventHit {
  readonly event: number;
  readonly t: number;
  readonly y: number[];
}

/** Work done by the integrator, reported beside every result. */
export interface IntegrationStats {
  steps: number;
  accepted: number;
  rejected: number;
  evaluations: number;
  eventIterations: number;
}

/** Integrator settings. `samplesPerStep` > 0 records that many dense points inside each accepted step. */
export interface IntegrateOptions {
  readonly relTol?: number;
  readonly absTol?: number | number[];
  readonly maxSteps?: number;
  readonly initialStep?: number;
  readonly samplesPerStep?: number;
}

/** Outcome of {@link integrateWithEvents}. `samples` holds (t, y) pairs in order when sampling was requested. */
export interface Integration {
  readonly t: number;
  readonly y: number[];
  readonly hits: EventHit[];
  readonly terminalEvent: number | null;
  readonly samples: { t: number[]; y: number[][] };
  readonly stats: IntegrationStats;
}

type Dense = (c: number, x: number) => number;

/**
 * Integrate y' = f(t, y) from t0 towards tEnd with odex and locate events exactly on its dense interpolator
 * (sign change detected at step ends, then the Illinois variant of regula falsi, Dowell & Jarratt, BIT 11, 1971).
 * Throws (with the state) if odex exceeds `maxSteps` or produces non-finite values; reaching tEnd with no
 * terminal event is returned normally (`terminalEvent: null`).
 * @example integrateWithEvents((t, y) => [-y[0]!], 0, [1], 10, [{ value: (t, y) => y[0]! - 0.5, direction: -1, terminal: true }]).t // ≈ ln 2
 */
export function integrateWithEvents(
  rhs: Rhs,
  t0: number,
  y0: readonly number[],
  tEnd: number,
  events: readonly OdeEvent[],
  options: IntegrateOptions = {},
): Integration {
  const n = y0.length;
  const solver = new Solver(n);
  solver.denseOutput = true;
  solver.relativeTolerance = options.relTol ?? 1e-10;
  solver.absoluteTolerance = options.absTol ?? 1e-12;
  solver.maxSteps = options.maxSteps ?? 2000;
  solver.initialStepSize = options.initialStep ?? Math.abs(tEnd - t0) * 1e-3;
  const perStep = options.samplesPerStep ?? 0;
  const stats: IntegrationStats = { steps: 0, accepted: 0, rejected: 0, evaluations: 0, eventIterations: 0 };
  const hits: EventHit[] = [];
  const samples = { t: [t0], y: [y0.slice()] };
  let prev = events.map((e) => e.value(t0, y0));
  let prevY: readonly number[] = y0.slice();
  // Mutated from odex's callback; kept in an object so TypeScript does not narrow it away.
  const run: { terminalEvent: number | null; stopT: number; stopY: number[]; failure: string | null } = {
    terminalEvent: null,
    stopT: t0,
    stopY: y0.slice(),
    failure: null,
  };

  const stateAt = (dense: Dense, t: number): number[] => {
    const y = new Array<number>(n);
    for (let c = 0; c < n; c++) y[c] = dense(c, t);
    return y;
  };

  const onStep = (nr: number, tOld: number, t: number, y: number[], dense?: Dense): boolean => {
    if (nr === 1 || dense === undefined) return true;
    if (!y.every(Number.isFinite)) {
      run.failure = `non-finite state at t=${t}: [${y.join(", ")}]`;
      return false;
    }
    const now = events.map((e) => e.value(t, y));
    const found: EventHit[] = [];
    for (let i = 0; i < events.length; i++) {
      const ev = events[i]!;
      let a = tOld;
      let fa = ev.direction * prev[i]!;
      let fb = ev.direction * now[i]!;
      let b = t;
      const scan = ev.scan === undefined ? 0 : Math.min(4096, Math.max(0, Math.ceil(ev.scan(prevY, y))));
      if (scan > 0) {
        // The first − → + change on the interior points (the end value included), if any.
        let fPrev = fa;
        let tPrev = tOld;
        let hit = false;
        for (let k = 1; k <= scan + 1; k++) {
          const tk = k === scan + 1 ? t : tOld + ((t - tOld) * k) / (scan + 1);
          const fk = k === scan + 1 ? ev.direction * now[i]! : ev.direction * ev.value(tk, stateAt(dense, tk));
          if (fPrev < 0 && fk >= 0) {
            a = tPrev;
            fa = fPrev;
            b = tk;
            fb = fk;
            hit = true;
            break;
          }
          fPrev = fk;
          tPrev = tk;
        }
        if (!hit) continue;
        found.push(locate(ev, dense, a, fa, b, fb, i));
        continue;
      }
      if (!(fb >= 0)) continue;
      if (fa === 0) {
        // The step began exactly on the zero (e.g. at launch): look inside the step for the opposite sign.
        let inner = Number.NaN;
        for (let k = 1; k < 16 && !(inner < 0); k++) {
          a = tOld + ((t - tOld) * k) / 16;
          inner = ev.direction * ev.value(a, stateAt(dense, a));
        }
        if (!(inner < 0)) continue;
        fa = inner;
      } else if (!(fa < 0)) continue;
      found.push(locate(ev, dense, a, fa, b, fb, i));
    }
    found.sort((p, q) => p.t - q.t);
    for (const hit of found) {
      hits.push(hit);
      if (events[hit.event]!.terminal) {
        run.terminalEvent = hit.event;
        run.stopT = hit.t;
        run.stopY = hit.y;
        break;
      }
    }
    if (perStep > 0) {
      const tLast = run.terminalEvent === null ? t : run.stopT;
      for (let k = 1; k <= perStep; k++) {
        const tk = tOld + ((tLast - tOld) * k) / (perStep + 1);
        samples.t.push(tk);
        samples.y.push(stateAt(dense, tk));
      }
      samples.t.push(tLast);
      samples.y.push(run.terminalEvent === null ? y.slice() : run.stopY.slice());
    }
    prev = now;
    prevY = y.slice();
    return run.terminalEvent === null;
  };

  const locate = (ev: OdeEvent, dense: Dense, a: number, fa: number, b: number, fb: number, index: number): EventHit => {
    // Illinois regula falsi on g(t) = direction·value(t, y(t)), with g(a) < 0 ≤ g(b).
    let side = 0;
    let t = b;
    const tol = 1e-13 * Math.max(Math.abs(a), Math.abs(b), 1);
    for (let k = 0; k < 100 && b - a > tol; k++) {
      stats.eventIterations++;
      t = (a * fb - b * fa) / (fb - fa);
      if (!(t > a && t < b)) t = 0.5 * (a + b);
      const ft = ev.direction * ev.value(t, stateAt(dense, t));
      if (ft === 0) {
        a = t;
        b = t;
        break;
      }
      if (ft < 0) {
        a = t;
        fa = ft;
        if (side === -1) fb /= 2;
        side = -1;
      } else {
        b = t;
        fb = ft;
        if (side === 1) fa /= 2;
        side = 1;
      }
    }
    return { event: index, t: b, y: stateAt(dense, b) };
  };

  const result = solver.solve(rhs, t0, y0.slice(), tEnd, onStep);
  stats.steps = result.nStep;
  stats.accepted = result.nAccept;
  stats.rejected = result.nReject;
  stats.evaluations = result.nEval;
  if (run.failure !== null) throw new Error(`odex integration failed: ${run.failure}`);
  if (run.terminalEvent === null) {
    if (result.outcome !== 0) {
      throw new Error(
        `odex stopped without converging (outcome ${result.outcome}, ${result.nStep} steps) at state [${result.y.join(", ")}]`,
      );
    }
    run.stopT = tEnd;
    run.stopY = result.y;
  }
  return { t: run.stopT, y: run.stopY, hits, terminalEvent: run.terminalEvent, samples, stats };
}
