import { expect, test } from "vitest";
import { EFFECTIVE_HOLE_WIDTH, HOLMES_1991 } from "../tests/fixtures/physics-references";
import {
  ballDropTimeS,
  captureOutcome,
  effectiveHoleWidthM,
  maxCaptureSpeedMps,
  rollClosedForm,
  rollingDecelFromStimp,
  simulateRoll,
} from "./index";

test("capture speeds of Holmes's criterion: 1.636 m/s centred, 1.52 at 20 mm, 1.10 at 40 mm, 0.62 at 50 mm (derived from Holmes 1991; docs/sources.md)", () => {
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

test("capture is judged where the ball's centre crosses the hole's edge, not at the centre (docs/sources.md, Capture at the hole)", () => {
  // A straight flat putt at Stimp 10 reaching the centre at 1.62 m/s crossed the edge at √(1.62² + 2·a_r·r_h) ≈
  // 1.638 m/s (derived), above v_c(0) = 1.636 m/s: a lip-out, though the centre speed is under v_c(0).
  const ar = rollingDecelFromStimp(10);
  const D = 3;
  const centre = 1.62;
  const v = Math.sqrt(centre * centre + 2 * ar * D);
  const input = { distanceM: D, slopePct: 0, fallLineDeg: 0, stimpFt: 10, launchSpeedMps: v, startLineDeg: 0 };
  const ode = simulateRoll(input);
  const fast = rollClosedForm(input);
  if (!ode.ok || !fast.ok) throw new Error("must stop");
  // r_h = 4¼ in ÷ 2 = 0.053975 m (Rules of Golf, Definitions, "Hole"; docs/sources.md).
  const rimSpeed = Math.sqrt(centre * centre + 2 * ar * ((4.25 * 0.0254) / 2));
  expect(rimSpeed).toBeGreaterThan(maxCaptureSpeedMps(0));
  expect(ode.roll.closestApproach.speedMps).toBeLessThan(maxCaptureSpeedMps(0));
  expect(ode.roll.rim!.speedMps).toBeCloseTo(rimSpeed, 4);
  expect(fast.roll.rim!.speedMps).toBeCloseTo(rimSpeed, 6);
  expect(ode.roll.capture.outcome).toBe("lip-out");
  expect(fast.roll.capture.outcome).toBe("lip-out");
  // 3 cm/s slower it drops in both.
  const slower = { ...input, launchSpeedMps: Math.sqrt((centre - 0.03) ** 2 + 2 * ar * D) };
  const a = simulateRoll(slower);
  const b = rollClosedForm(slower);
  expect(a.ok && a.roll.capture.holed).toBe(true);
  expect(b.ok && b.roll.capture.holed).toBe(true);
});
