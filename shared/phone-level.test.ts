import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  correctedGradient,
  gradientFromUp,
  halfTurn,
  headingFromOrientation,
  meanHeadingDeg,
  phoneToNorthGradient,
  slopeAndFallLine,
  stillReading,
  upFromMotion,
  upFromOrientation,
  type Vec3,
} from "./phone-level";

// Hand-computed tilts (derived: docs/sources.md, "Measuring on the green with a phone"). A 2.0 % slope is a tilt of
// atan(0.02) = 1.14576°; sin = 0.0199960, cos = 0.9998001.
const DEG = Math.PI / 180;
const rotX = (e: number, [x, y, z]: Vec3): Vec3 => [x, y * Math.cos(e) - z * Math.sin(e), y * Math.sin(e) + z * Math.cos(e)];
const rotY = (e: number, [x, y, z]: Vec3): Vec3 => [x * Math.cos(e) + z * Math.sin(e), y, -x * Math.sin(e) + z * Math.cos(e)];

describe("gravity → slope and fall line", () => {
  it("a phone flat on level ground reads 0 %", () => {
    const up = upFromMotion({ x: 0, y: 0, z: 9.81 })!;
    expect(slopeAndFallLine(gradientFromUp(up)).slopePct).toBe(0);
  });

  it("2.0 % falling to the golfer's right: accelerationIncludingGravity (−0.19608, 0, 9.80468) m/s² → 2.0 %, 90°", () => {
    // Hand-computed: up = (−sin θ, 0, cos θ) at θ = atan 0.02, times 9.80665 m/s².
    const up = upFromMotion({ x: -0.19608, y: 0, z: 9.80469 })!;
    const r = slopeAndFallLine(gradientFromUp(up));
    expect(r.slopePct).toBeCloseTo(2.0, 3);
    expect(r.fallLineDeg).toBeCloseTo(90, 2);
  });

  it("falls to the left → 270°, toward the hole (downhill putt) → 0°, toward the golfer (uphill) → 180°", () => {
    expect(slopeAndFallLine(gradientFromUp(upFromMotion({ x: 0.19608, y: 0, z: 9.80469 })!)).fallLineDeg).toBeCloseTo(270, 2);
    // Top edge (toward the hole) lower: up leans toward the phone's bottom, y < 0.
    expect(slopeAndFallLine(gradientFromUp(upFromMotion({ x: 0, y: -0.29407, z: 9.80224 })!)).fallLineDeg).toBeCloseTo(0, 2);
    expect(slopeAndFallLine(gradientFromUp(upFromMotion({ x: 0, y: 0.29407, z: 9.80224 })!)).fallLineDeg).toBeCloseTo(180, 2);
    // 0.29407 / 9.80224 = 0.0300: a 3.0 % slope (hand-computed).
    expect(slopeAndFallLine(gradientFromUp(upFromMotion({ x: 0, y: 0.29407, z: 9.80224 })!)).slopePct).toBeCloseTo(3.0, 3);
  });

  it("a browser that reports gravity with the opposite sign reads the same", () => {
    const a = upFromMotion({ x: -0.19608, y: 0.1, z: 9.80469 })!;
    const b = upFromMotion({ x: 0.19608, y: -0.1, z: -9.80469 })!;
    a.forEach((v, i) => expect(b[i]).toBeCloseTo(v, 12));
  });

  it("no reading, a phone being shaken, or one on its edge gives nothing", () => {
    expect(upFromMotion(null)).toBeNull();
    expect(upFromMotion({ x: null, y: 0, z: 9.8 })).toBeNull();
    expect(upFromMotion({ x: 0, y: 0, z: 25 })).toBeNull();
    expect(upFromMotion({ x: 9.8, y: 0, z: 0.5 })).toBeNull();
  });

  it("DeviceOrientation: gamma +1.14576° (right edge down) is 2.0 % falling right; beta −1.71836° is 3.0 % toward the hole", () => {
    // Spec rotation R = Rz(α)·Rx(β)·Ry(γ): up in the phone's frame = (−cos β sin γ, sin β, cos β cos γ).
    const right = slopeAndFallLine(gradientFromUp(upFromOrientation(0, 1.14576)!));
    expect(right.slopePct).toBeCloseTo(2.0, 3);
    expect(right.fallLineDeg).toBeCloseTo(90, 2);
    const away = slopeAndFallLine(gradientFromUp(upFromOrientation(-1.71836, 0)!)); // atan 0.03 = 1.71836°
    expect(away.slopePct).toBeCloseTo(3.0, 3);
    expect(away.fallLineDeg).toBeCloseTo(0, 2);
    expect(upFromOrientation(null, 0)).toBeNull();
    expect(upFromOrientation(60, 0)).toBeNull();
  });
});

describe("half-turn correction (common practice for digital levels; derived in docs/sources.md)", () => {
  const theta = Math.atan(0.02);
  const trueUp: Vec3 = [-Math.sin(theta), 0, Math.cos(theta)]; // 2.0 % falling right
  const turned: Vec3 = [Math.sin(theta), 0, Math.cos(theta)]; // the same ground, phone turned half a turn
  const eps = 0.3 * DEG; // the sensor's own tilt against the case, about the phone's x axis

  it("one reading with a 0.3° sensor tilt is off: 2.07 % at 75.3° (hand-computed)", () => {
    // Sensor reading = Rx(ε)·up: gradient (−0.02/cos ε, −tan ε) = (−0.020000, −0.005236): |g| = 2.0674 %,
    // fall line atan2(0.02, 0.005236) = 75.33°.
    const r = slopeAndFallLine(gradientFromUp(rotX(eps, trueUp)));
    expect(r.slopePct).toBeCloseTo(2.0674, 3);
    expect(r.fallLineDeg).toBeCloseTo(75.33, 1);
  });

  it("the half turn takes it out: 2.0 %, 90°, sensor tilt 0.3°, readings 1.05 % apart", () => {
    const r = halfTurn(rotX(eps, trueUp), rotX(eps, turned));
    // Hand-computed: half-difference (−sin θ, 0), mean z cos θ·cos ε → slope 2 %/cos ε = 2.00003 %, exactly 90°;
    // half-sum (0, −cos θ sin ε) → sensor tilt tan ε = 0.5236 %, i.e. 0.3°; g1 + g2 = (0, −2 tan ε) → 1.047 %.
    expect(r.slopePct).toBeCloseTo(2.0, 4);
    expect(r.fallLineDeg).toBeCloseTo(90, 6);
    expect(r.sensorTiltDeg).toBeCloseTo(0.3, 6);
    expect(r.disagreementPct).toBeCloseTo(1.0472, 3);
  });

  it("any slope up to 5 % and any sensor tilt up to 1°: corrected to 0.005 % and 0.2° (derived: error of order ε²)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 359.9, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        (slopePct, fallDeg, ex, ey) => {
          // Ground falling toward fallDeg (clockwise from the top edge): ∇h = −s·(sin φ, cos φ).
          const s = slopePct / 100;
          const f = fallDeg * DEG;
          const g: [number, number] = [-s * Math.sin(f), -s * Math.cos(f)];
          const n = Math.hypot(g[0], g[1], 1);
          const up1: Vec3 = [g[0] / n, g[1] / n, 1 / n];
          const up2: Vec3 = [-up1[0], -up1[1], up1[2]];
          const sensor = (u: Vec3) => rotY(ey * DEG, rotX(ex * DEG, u));
          const r = halfTurn(sensor(up1), sensor(up2));
          expect(Math.abs(r.slopePct - slopePct)).toBeLessThan(0.005);
          const dAngle = Math.abs(((r.fallLineDeg - fallDeg + 540) % 360) - 180);
          expect(dAngle).toBeLessThan(0.2);
          // A later single reading with the learned sensor tilt taken out agrees with the half-turn result.
          const single = slopeAndFallLine(correctedGradient(sensor(up1), r.sensorTilt));
          expect(Math.abs(single.slopePct - slopePct)).toBeLessThan(0.01);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("holding still for two seconds", () => {
  const up = upFromMotion({ x: -0.19608, y: 0, z: 9.80469 })!;
  const steady = (n: number, dt: number) => Array.from({ length: n }, (_, i) => ({ t: i * dt, up }));

  it("a full, steady window gives the mean and zero spread", () => {
    const r = stillReading(steady(121, 1 / 60))!;
    expect(r).not.toBeNull();
    expect(r.samples).toBe(121);
    expect(r.spanS).toBeCloseTo(2, 9);
    expect(r.spreadPct).toBeCloseTo(0, 9);
    expect(slopeAndFallLine(gradientFromUp(r.up)).slopePct).toBeCloseTo(2.0, 3);
  });

  it("under two seconds, or too few samples, is not yet a reading", () => {
    expect(stillReading(steady(100, 1 / 60))).toBeNull();
    expect(stillReading(steady(5, 1))).toBeNull();
  });

  it("a phone rocking by ±1 % is not still; only the last two seconds count", () => {
    const rocking = Array.from({ length: 121 }, (_, i) => ({ t: i / 60, up: upFromMotion({ x: i % 2 ? 0.098 : -0.098, y: 0, z: 9.8 })! }));
    expect(stillReading(rocking)).toBeNull();
    // Rocking first, then two seconds still: the reading is the still part's.
    const later = [...rocking, ...steady(121, 1 / 60).map((s) => ({ ...s, t: s.t + 2.1 }))];
    const r = stillReading(later)!;
    expect(r.spreadPct).toBeLessThan(0.01);
    expect(r.samples).toBe(121);
  });
});

describe("the compass: heading and the turn into the green's frame (derived in docs/sources.md)", () => {
  it("reads the heading clockwise from north: W3C alpha turns counter-clockwise, so heading = 360 − alpha; iOS's heading is taken as it is", () => {
    // alpha 0: top edge north. Turned a quarter turn to the left (alpha 90) the top edge points west, 270°.
    expect(headingFromOrientation({ alpha: 0, absolute: true })).toBe(0);
    expect(headingFromOrientation({ alpha: 90, absolute: true })).toBeCloseTo(270, 9);
    expect(headingFromOrientation({ alpha: 270, absolute: true })).toBeCloseTo(90, 9);
    expect(headingFromOrientation({ alpha: 330, absolute: true })).toBeCloseTo(30, 9);
    // A relative alpha (the plain deviceorientation event of most Android browsers) is no compass.
    expect(headingFromOrientation({ alpha: 330, absolute: false })).toBeNull();
    expect(headingFromOrientation({ alpha: null, absolute: true })).toBeNull();
    expect(headingFromOrientation(null)).toBeNull();
    // iOS: webkitCompassHeading is already clockwise from north, whatever its relative alpha says.
    expect(headingFromOrientation({ alpha: 10, absolute: false, webkitCompassHeading: 45 })).toBe(45);
    expect(headingFromOrientation({ alpha: 10, absolute: false, webkitCompassHeading: -1 })).toBeNull();
  });

  it("the heading from alpha is that of the top edge for any tilt: against R = Rz(α)·Rx(β)·Ry(γ) applied to (0, 1, 0)", () => {
    // The W3C rotation written out as matrices (earth frame x east, y north, z up), independent of the code's shortcut.
    const Rz = (a: number) => [
      [Math.cos(a), -Math.sin(a), 0],
      [Math.sin(a), Math.cos(a), 0],
      [0, 0, 1],
    ];
    const Rx = (b: number) => [
      [1, 0, 0],
      [0, Math.cos(b), -Math.sin(b)],
      [0, Math.sin(b), Math.cos(b)],
    ];
    const Ry = (g: number) => [
      [Math.cos(g), 0, Math.sin(g)],
      [0, 1, 0],
      [-Math.sin(g), 0, Math.cos(g)],
    ];
    const mul = (A: number[][], B: number[][]) => A.map((row) => B[0]!.map((_, j) => row.reduce((s, v, k) => s + v * B[k]![j]!, 0)));
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 359.9, noNaN: true }),
        fc.double({ min: -60, max: 60, noNaN: true }),
        fc.double({ min: -60, max: 60, noNaN: true }),
        (a, b, g) => {
          const R = mul(mul(Rz(a * DEG), Rx(b * DEG)), Ry(g * DEG));
          const top = [R[0]![1]!, R[1]![1]!]; // R·(0, 1, 0): (east, north) parts
          const expected = (((Math.atan2(top[0]!, top[1]!) / DEG) % 360) + 360) % 360;
          const got = headingFromOrientation({ alpha: a, beta: b, absolute: true })!;
          const gap = Math.abs(((got - expected + 540) % 360) - 180);
          expect(gap).toBeLessThan(1e-6);
        },
      ),
    );
  });

  it("turns a phone-frame gradient into east/north: hand-computed cases", () => {
    const close = (v: readonly number[], e: readonly number[]) => v.forEach((x, i) => expect(x).toBeCloseTo(e[i]!, 9));
    close(phoneToNorthGradient([0.01, -0.02], 0), [0.01, -0.02]); // top edge north: nothing turns
    // Top edge east, so the right edge points south: rising toward the right edge is rising southward, ∂h/∂north = −0.01.
    close(phoneToNorthGradient([0.01, 0], 90), [0, -0.01]);
    close(phoneToNorthGradient([0, 0.02], 90), [0.02, 0]);
    close(phoneToNorthGradient([0.01, -0.02], 180), [-0.01, 0.02]); // half a turn flips both
    // Top edge north-east, 2 % rising toward it: 0.02·(sin 45°, cos 45°) = (0.0141421, 0.0141421).
    close(phoneToNorthGradient([0, 0.02], 45), [0.0141421356, 0.0141421356]);
    // Top edge at 30°, so the right edge at 120°: 1 % toward it is 0.01·(cos 30°, −sin 30°) = (0.0086603, −0.005).
    close(phoneToNorthGradient([0.01, 0], 30), [0.008660254, -0.005]);
    // 270°: top edge west, right edge north.
    close(phoneToNorthGradient([0.01, 0], 270), [0, 0.01]);
  });

  it("a plane read by a phone turned any way comes back the same: slope kept, fall line clockwise from north", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        (gE, gN, H) => {
          // What the phone sees: the plane's gradient along its right edge (cos H, −sin H) and top edge (sin H, cos H).
          const h = H * DEG;
          const phone: [number, number] = [gE * Math.cos(h) - gN * Math.sin(h), gE * Math.sin(h) + gN * Math.cos(h)];
          const back = phoneToNorthGradient(phone, H);
          expect(back[0]).toBeCloseTo(gE, 12);
          expect(back[1]).toBeCloseTo(gN, 12);
        },
      ),
    );
    // Falling to the east (h = −0.02·east): fall line 90° from north whichever way the phone lay.
    expect(slopeAndFallLine(phoneToNorthGradient([0, 0.02], 270)).fallLineDeg).toBeCloseTo(90, 9);
    expect(slopeAndFallLine(phoneToNorthGradient([0, 0.02], 270)).slopePct).toBeCloseTo(2, 9);
  });

  it("averages headings on the circle", () => {
    expect(meanHeadingDeg([359, 1])).toBeCloseTo(0, 9);
    // sin-sum 0.34202, cos-sum 2.90931 (by hand) → atan2 = 6.705°.
    expect(meanHeadingDeg([350, 10, 20])).toBeCloseTo(6.705, 3);
    expect(meanHeadingDeg([0, 180])).toBeNull(); // no mean direction
    expect(meanHeadingDeg([])).toBeNull();
  });
});
