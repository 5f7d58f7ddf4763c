// The forces defined once (physics/forces/) and the closed form as a fast path of the same model.
// Sources: docs/sources.md, "Stimpmeter" and "Rolling on a slope".
import fc from "fast-check";
import { expect, test } from "vitest";
import { FOOT_M, GRAVITY_MPS2, STIMP_EXIT_SPEED_MPS } from "../constants";
import { integrateWithEvents } from "../integrate";
import { newPlanarRollOut, rollPlanarInto } from "../planar-roll";
import { planarRollField } from "../planar-path";
import { resolveGreen, stopsInPractice } from "../roll-model";
import { surfaceFromGrid } from "../height-surface";
import { accelerationInto, closedFormApplies, DEFAULT_ROLL_MODEL, forceRhs, forcesFor, newBallState, planeGround } from "./index";

const ONE_MM = 1e-3;
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 1_000_000 }).map((k) => min + ((max - min) * k) / 1_000_000);

function accelerationOn(slopePct: number, fallLine: [number, number], stimpFt: number, v: [number, number]): [number, number] {
  return accelerationInto(planeGround(slopePct, fallLine), forcesFor({ stimpFt }), newBallState(), [0, 0], 0, 0, v[0], v[1], [0, 0]);
}

test("gravity along a plane is (5/7)·g·sinθ down the fall line (textbook rigid-body mechanics; Penner, Can. J. Phys. 2002)", () => {
  // A ball rolling across a 4 % slope that falls toward +x: resistance acts along −y, gravity along +x only.
  const a = accelerationOn(4, [1, 0], 10, [0, 1]);
  expect(a[0]).toBeCloseTo((5 / 7) * GRAVITY_MPS2 * Math.sin(Math.atan(0.04)), 12);
});

test("rolling resistance is v0²/(2S) against the motion, so a ball leaving the Stimpmeter rolls S on the flat (Stimpmeter definition; derived)", () => {
  const stimpFt = 11;
  const a = accelerationOn(0, [0, 1], stimpFt, [0.3, -0.4]);
  const ar = (STIMP_EXIT_SPEED_MPS * STIMP_EXIT_SPEED_MPS) / (2 * stimpFt * FOOT_M);
  expect(a[0]).toBeCloseTo(-ar * 0.6, 12);
  expect(a[1]).toBeCloseTo(ar * 0.8, 12);
  // Integrating the force model from v0 on the flat: the ball stops S feet away.
  const green = resolveGreen({ slopePct: 0, fallLineDeg: 0, stimpFt });
  const rhs = forceRhs(green.ground, green.forces, STIMP_EXIT_SPEED_MPS);
  const run = integrateWithEvents(rhs, 0, [0, 0, 0, STIMP_EXIT_SPEED_MPS, 0, 0], 100, [
    { value: (_t, y) => Math.hypot(y[2]!, y[3]!) - 1e-9, direction: -1, terminal: true },
  ]);
  expect(run.y[1]! / FOOT_M).toBeCloseTo(stimpFt, 5);
});

test("the default forces are the closed form's; a speed-dependent resistance is not (the solvers then integrate)", () => {
  expect(forcesFor({ stimpFt: 10 }).map((f) => f.name)).toEqual(["gravity", "rolling resistance"]);
  expect(closedFormApplies(forcesFor({ stimpFt: 10 }))).toBe(true);
  const model = { ...DEFAULT_ROLL_MODEL, resistanceSpeedFactor: (v: number) => 1 + 0.1 * v };
  expect(closedFormApplies(forcesFor({ stimpFt: 10, model }))).toBe(false);
  expect(() => planarRollField(resolveGreen({ slopePct: 1, fallLineDeg: 90, stimpFt: 10, model }))).toThrow(RangeError);
});

test("the surface integrator's ground feels the same force as the plane's: a height map of a plane gives the plane's acceleration (derived)", () => {
  // A plane rising 3 % toward +x (so it falls toward −x) on a 3 × 3 grid.
  const surface = surfaceFromGrid({ spacingM: 1, originM: [0, 0], heightsM: [0, 1, 2].map(() => [0, 0.03, 0.06]) });
  const forces = forcesFor({ stimpFt: 10 });
  const onMap = accelerationInto(surface, forces, newBallState(), [0, 0], 1.3, 0.7, 0.5, 1, [0, 0]);
  const onPlane = accelerationOn(3, [-1, 0], 10, [0.5, 1]);
  expect(onMap[0]).toBeCloseTo(onPlane[0], 12);
  expect(onMap[1]).toBeCloseTo(onPlane[1], 12);
});

test("the closed-form planar roll equals integrating the shared force model, within 1 mm, over random reads (derived)", () => {
  const out = newPlanarRollOut();
  fc.assert(
    fc.property(
      fc.record({
        slopePct: uniform(0, 6),
        fallLineDeg: uniform(0, 360),
        stimpFt: uniform(6, 14),
        launchSpeedMps: uniform(0.3, 3.5),
        startLineDeg: uniform(-40, 40),
      }),
      (input) => {
        const green = resolveGreen(input);
        fc.pre(stopsInPractice(green));
        const s = (input.startLineDeg * Math.PI) / 180;
        const v = input.launchSpeedMps;
        rollPlanarInto(planarRollField(green), v, s, 0, 100, out);
        // The force model itself, integrated with odex to a stop at 1e-7 of the launch speed (a few nanometres short).
        const run = integrateWithEvents(
          forceRhs(green.ground, green.forces, v),
          0,
          [0, 0, v * Math.sin(s), v * Math.cos(s), 0, 0],
          1e4,
          [{ value: (_t, y) => Math.hypot(y[2]!, y[3]!) - 1e-7 * v, direction: -1, terminal: true }],
          { relTol: 1e-10, absTol: 1e-12, maxSteps: 20000 },
        );
        expect(run.terminalEvent).toBe(0);
        expect(Math.hypot(run.y[0]! - out.restX, run.y[1]! - out.restY)).toBeLessThan(ONE_MM);
        expect(Math.abs(run.y[5]! - out.rollLengthM)).toBeLessThan(ONE_MM);
      },
    ),
    { numRuns: 150, seed: 16 },
  );
});
