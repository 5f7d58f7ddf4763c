import { expect, test } from "vitest";
import { EFFECTIVE_HOLE_WIDTH, HOLMES_1991 } from "../tests/fixtures/physics-references";
import { ballDropTimeS, captureOutcome, effectiveHoleWidthM, maxCaptureSpeedMps, simulateRoll } from "./index";

test("capture speeds match Holmes's values: 1.636 m/s centred, 1.52 at 20 mm, 1.10 at 40 mm, 0.62 at 50 mm (Holmes 1991)", () => {
  for (const p of HOLMES_1991.points) {
    expect(Math.abs(maxCaptureSpeedMps(p.offsetM) - p.speedMps)).toBeLessThan(HOLMES_1991.toleranceMps);
  }
  // The widely quoted "about 1.63 m/s" for a centred putt (secondary).
  expect(Math.abs(maxCaptureSpeedMps(0) - HOLMES_1991.centredQuotedMps)).toBeLessThan(0.01);
  expect(ballDropTimeS()).toBeCloseTo(0.066, 3);
});

test("effective hole width shrinks with speed: 105, 94, 73 mm at 0.4, 0.8, 1.2 m/s (derived from Holmes 1991)", () => {
  for (const p of EFFECTIVE_HOLE_WIDTH.points) {
    expect(Math.abs(effectiveHoleWidthM(p.speedMps) - p.widthM)).toBeLessThan(EFFECTIVE_HOLE_WIDTH.toleranceM);
  }
  expect(effectiveHoleWidthM(2)).toBe(0);
});

test("holed, lip-out and miss follow the centre criterion (Holmes 1991)", () => {
  expect(captureOutcome(0, 1).outcome).toBe("holed");
  expect(captureOutcome(0.04, 1.2).outcome).toBe("lip-out");
  expect(captureOutcome(0.06, 0.3).outcome).toBe("miss");
  expect(captureOutcome(-0.02, 1.0).marginMps).toBeCloseTo(maxCaptureSpeedMps(0.02) - 1.0, 12);
});

test("a flat 3 m putt rolled dead centre at a gentle pace drops; the same line far too firm lips out", () => {
  const base = { distanceM: 3, slopePct: 0, fallLineDeg: 0, stimpFt: 10, startLineDeg: 0 };
  const gentle = simulateRoll({ ...base, launchSpeedMps: 1.9 });
  const firm = simulateRoll({ ...base, launchSpeedMps: 3.5 });
  const wide = simulateRoll({ ...base, launchSpeedMps: 1.9, startLineDeg: 2 });
  if (!gentle.ok || !firm.ok || !wide.ok) throw new Error("flat green must stop");
  expect(gentle.roll.capture.outcome).toBe("holed");
  expect(gentle.roll.closestApproach.distanceM).toBeLessThan(1e-6);
  expect(firm.roll.closestApproach.speedMps).toBeGreaterThan(maxCaptureSpeedMps(0));
  expect(firm.roll.capture.outcome).toBe("lip-out");
  expect(wide.roll.capture.outcome).toBe("miss");
  expect(wide.roll.closestApproach.offsetM).toBeGreaterThan(0.054);
});
