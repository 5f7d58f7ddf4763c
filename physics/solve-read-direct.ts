// The inverse read solved directly on two unknowns (launch speed, start line): slower than the homogeneous
// 1-D method but valid for any rolling model, and an independent check of it.
import { captureAtRim, type RimCrossing } from "./capture";
import { HOLE_RADIUS_M } from "./constants";
import { rollToRest, type RollState, type RollTrace } from "./roll";
import { stopsInPractice, describeModel, rollingDecelAt, resolveGreen } from "./roll-model";
import { aimOf, cannotStop, flatPuttLengthM, toPath, validateReadInput, type Read, type ReadInput, type ReadResult } from "./read-types";

const MAX_ITERATIONS = 40;
const MISS_TOL_M = 1e-4;
const ROLL_PAST_TOL_M = 2e-4;
const ENTRY_SPEED_TOL_MPS = 1e-4;

/**
 * Solve a read by Newton's method on (launch speed, start line) with a finite-difference Jacobian and step
 * halving; residuals are the signed miss at the closest approach to the hole (m, + = ball passes to the right of
 * the centre) and the pace error. Starts from the straight-putt closed form v = √(2·a_eff·(D + P)) (derived) and a
 * small-angle estimate of the start line. Throws with its state if it does not converge.
 * @example solveReadDirect({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }) // same read as solveRead
 */
export function solveReadDirect(input: ReadInput): ReadResult {
  const pace = validateReadInput(input);
  const green = resolveGreen(input);
  const model = describeModel(green);
  if (!stopsInPractice(green)) return cannotStop(model);
  const D = input.distanceM;
  const hole: [number, number] = [0, D];
  const phi = (input.fallLineDeg * Math.PI) / 180;
  const ar = rollingDecelAt(green, 1);
  const ag = green.gravityDecelMps2;
  const aLine = ar - ag * Math.cos(phi);
  const P = "rollPastM" in pace ? pace.rollPastM : (pace.entrySpeedMps * pace.entrySpeedMps) / (2 * aLine);
  let v = Math.sqrt(2 * aLine * (D + P));
  const tHole = (v - Math.sqrt(2 * aLine * P)) / aLine;
  let s = -Math.asin(Math.max(-0.95, Math.min(0.95, (ag * Math.sin(phi) * tHole) / (2 * v))));
  const stats = { iterations: 0, integrations: 0, steps: 0, evaluations: 0 };

  const evaluate = (speed: number, line: number) => {
    const trace = rollToRest(green, speed, [Math.sin(line), Math.cos(line)], {
      target: hole,
      rimRadiusM: HOLE_RADIUS_M,
      samplesPerStep: 7,
    });
    stats.integrations++;
    stats.steps += trace.stats.steps;
    stats.evaluations += trace.stats.evaluations;
    return residuals(trace, hole, pace);
  };
  const scaled = (r: Residuals) => [r.miss / MISS_TOL_M, r.pace / ("rollPastM" in pace ? ROLL_PAST_TOL_M : ENTRY_SPEED_TOL_MPS)] as const;
  const norm = (r: Residuals) => Math.hypot(...scaled(r));
  let r = evaluate(v, s);
  for (; stats.iterations < MAX_ITERATIONS; stats.iterations++) {
    const [e1, e2] = scaled(r);
    if (Math.abs(e1) < 1 && Math.abs(e2) < 1) return finishDirect(input, r, v, s, stats);
    const hv = 1e-6 * v;
    const hs = 1e-6;
    const rv = evaluate(v + hv, s);
    const rs = evaluate(v, s + hs);
    const j11 = (rv.miss - r.miss) / hv;
    const j12 = (rs.miss - r.miss) / hs;
    const j21 = (rv.pace - r.pace) / hv;
    const j22 = (rs.pace - r.pace) / hs;
    const det = j11 * j22 - j12 * j21;
    if (!Number.isFinite(det) || det === 0) break;
    let dv = -(j22 * r.miss - j12 * r.pace) / det;
    let ds = -(-j21 * r.miss + j11 * r.pace) / det;
    // Keep a step inside a sane range, then halve it until the scaled residual falls.
    const limit = Math.max(Math.abs(dv) / (0.5 * v), Math.abs(ds) / 0.3, 1);
    dv /= limit;
    ds /= limit;
    let accepted = false;
    for (let h = 0; h < 12 && !accepted; h++) {
      const rTry = evaluate(v + dv, s + ds);
      if (v + dv > 0 && norm(rTry) < norm(r)) {
        v += dv;
        s += ds;
        r = rTry;
        accepted = true;
      } else {
        dv /= 2;
        ds /= 2;
      }
    }
    if (!accepted) break;
  }
  throw new Error(
    `solveReadDirect: Newton did not converge after ${stats.iterations} iterations at v=${v} m/s, start line ${s} rad ` +
      `(miss ${r.miss} m, pace error ${r.pace}); input ${JSON.stringify(input)}`,
  );
}

interface Residuals {
  readonly miss: number;
  readonly pace: number;
  readonly trace: RollTrace;
  readonly closest: RollState;
}

function residuals(trace: RollTrace, hole: readonly [number, number], pace: ReadInput["pace"] & object): Residuals {
  const dist = (p: RollState) => Math.hypot(p.xM - hole[0], p.yM - hole[1]);
  let closest = trace.rest;
  for (const p of trace.approaches) if (dist(p) < dist(closest)) closest = p;
  const sp = Math.hypot(closest.vxMps, closest.vyMps);
  if (closest === trace.rest || sp === 0) {
    // Stopped short of its closest approach: the miss is where it lies, the pace is short by the gap.
    const gap = dist(trace.rest);
    const target = "rollPastM" in pace ? pace.rollPastM : pace.entrySpeedMps;
    return { miss: trace.rest.xM - hole[0], pace: -gap - target, trace, closest };
  }
  const ux = closest.vxMps / sp;
  const uy = closest.vyMps / sp;
  const miss = uy * (closest.xM - hole[0]) - ux * (closest.yM - hole[1]);
  const paceErr = "rollPastM" in pace ? trace.rest.alongPathM - closest.alongPathM - pace.rollPastM : sp - pace.entrySpeedMps;
  return { miss, pace: paceErr, trace, closest };
}

function finishDirect(
  input: ReadInput,
  r: Residuals,
  v: number,
  s: number,
  stats: { iterations: number; integrations: number; steps: number; evaluations: number },
): ReadResult {
  const green = resolveGreen(input);
  const entry = Math.hypot(r.closest.vxMps, r.closest.vyMps);
  const sinPhi = Math.sin((input.fallLineDeg * Math.PI) / 180);
  const rollPastM = r.trace.rest.alongPathM - r.closest.alongPathM;
  let rim: RimCrossing | null = null;
  for (const e of r.trace.rimEntries) {
    if (e.timeS > r.closest.timeS) break;
    const es = Math.hypot(e.vxMps, e.vyMps);
    rim = { offsetM: Math.abs((e.vyMps * e.xM - e.vxMps * (e.yM - input.distanceM)) / es), speedMps: es };
  }
  const read: Read = {
    launchSpeedMps: v,
    startLineDeg: (s * 180) / Math.PI,
    ...aimOf((s * 180) / Math.PI, input.distanceM),
    entrySpeedMps: entry,
    rollPastM,
    flatPuttLengthM: flatPuttLengthM(v, green.rollingDecelMps2, rollPastM),
    breaks: Math.abs(sinPhi) < 1e-9 || green.gravityDecelMps2 === 0 ? "none" : sinPhi > 0 ? "left-to-right" : "right-to-left",
    capture: captureAtRim(Math.abs(r.miss), rim, entry, rollPastM < HOLE_RADIUS_M),
    path: toPath(r.trace.samples, r.trace.rest, 1, 1),
    restM: [r.trace.rest.xM, r.trace.rest.yM],
    model: describeModel(green),
    diagnostics: { method: "direct-2d", ...stats },
  };
  return { ok: true, read };
}
