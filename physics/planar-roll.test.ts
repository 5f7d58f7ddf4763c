import { expect, test } from "vitest";
import fc from "fast-check";
import { rollClosedForm, simulateRoll, stopsInPractice, resolveGreen } from "./index";

const ONE_MM = 1e-3;
/** Uniform on [min, max] in 10⁶ steps (fc.double is log-biased toward tiny values). */
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 1_000_000 }).map((k) => min + ((max - min) * k) / 1_000_000);

const rollCase = fc.record({
  distanceM: uniform(0.3, 15),
  slopePct: fc.oneof(fc.constant(0), uniform(0, 6)),
  fallLineDeg: fc.oneof(fc.constantFrom(0, 90, 180, 270), uniform(0, 360)),
  stimpFt: uniform(6, 14),
  launchSpeedMps: uniform(0.2, 3.5),
  startLineDeg: uniform(-25, 25),
});

test("the closed-form roll agrees with simulateRoll (odex) to 1 mm: rest point, closest pass and capture (derived)", () => {
  fc.assert(
    fc.property(rollCase, (input) => {
      fc.pre(stopsInPractice(resolveGreen(input)));
      const ode = simulateRoll(input);
      const fast = rollClosedForm(input);
      if (!ode.ok || !fast.ok) return false;
      const a = ode.roll;
      const b = fast.roll;
      expect(Math.hypot(a.restM[0] - b.restM[0], a.restM[1] - b.restM[1])).toBeLessThan(ONE_MM);
      expect(Math.abs(a.rollLengthM - b.rollLengthM)).toBeLessThan(ONE_MM);
      expect(Math.abs(a.closestApproach.distanceM - b.closestApproach.distanceM)).toBeLessThan(ONE_MM);
      const pa = a.closestApproach.pointM;
      const pb = b.closestApproach.pointM;
      expect(Math.hypot(pa[0] - pb[0], pa[1] - pb[1])).toBeLessThan(ONE_MM);
      // odex stops at 1e-3 of the launch speed, so a pass in the last millimetres may be "at rest" in one and
      // creeping (≤ 1e-3·v) in the other; the speed agrees to that.
      expect(Math.abs(a.closestApproach.speedMps - b.closestApproach.speedMps)).toBeLessThan(2e-3 * input.launchSpeedMps);
      // Near the hole the side is well defined (a ball at rest metres away is signed by its last motion: skip).
      if (a.closestApproach.distanceM < 0.3 && !a.closestApproach.atRest) {
        expect(Math.sign(a.closestApproach.offsetM)).toBe(Math.sign(b.closestApproach.offsetM));
      }
      if (Math.abs(a.capture.marginMps) > 1e-3) expect(b.capture.outcome).toBe(a.capture.outcome);
      return true;
    }),
    { numRuns: 150, seed: 20260 },
  );
});

test("the closed-form roll holes the solved read's line: a centred straight putt at a dying pace drops", () => {
  // Flat green, Stimp 10: a_r = v0²/(2S) (derived from the Stimpmeter), straight 3 m putt rolling 0.3 m past.
  const ar = 1.8288 ** 2 / (2 * 10 * 0.3048);
  const v = Math.sqrt(2 * ar * 3.3);
  const r = rollClosedForm({ distanceM: 3, slopePct: 0, fallLineDeg: 0, stimpFt: 10, launchSpeedMps: v, startLineDeg: 0 });
  if (!r.ok) throw new Error("must stop");
  expect(r.roll.restM[1]).toBeCloseTo(3.3, 9);
  expect(r.roll.closestApproach.distanceM).toBeLessThan(1e-9);
  expect(r.roll.closestApproach.speedMps).toBeCloseTo(Math.sqrt(2 * ar * 0.3), 9);
  expect(r.roll.capture.holed).toBe(true);
});

test("the closed-form roll reports a cannot-stop green as a value", () => {
  const r = rollClosedForm({ distanceM: 3, slopePct: 8, fallLineDeg: 0, stimpFt: 10, launchSpeedMps: 1, startLineDeg: 0 });
  expect(r.ok).toBe(false);
});
