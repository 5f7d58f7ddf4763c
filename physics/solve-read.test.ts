import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { GOLFER_SANITY, GOOD_PACE_ROLL_PAST_M } from "../tests/fixtures/physics-references";
import {
  HOLE_DIAMETER_M,
  aimOf,
  resolveGreen,
  simulateRoll,
  solveRead,
  solveReadDirect,
  stopsInPractice,
  type Read,
  type ReadInput,
} from "./index";

/** Uniform on [min, max] in 10⁶ steps, both ends included (fc.double is log-biased toward tiny values). */
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 1_000_000 }).map((k) => min + ((max - min) * k) / 1_000_000);

const ONE_MM = 1e-3;

function read(input: ReadInput): Read {
  const r = solveRead(input);
  if (!r.ok) throw new Error(`expected a read for ${JSON.stringify(input)}: ${r.message}`);
  return r.read;
}

// The whole input range of the brief: distance 0.3–30 m, slope 0–8 %, fall line 0–360°, Stimp 4–16 ft,
// roll-past 0–3 m or entry speed 0–2.5 m/s.
const pace = fc.oneof(fc.record({ rollPastM: uniform(0, 3) }), fc.record({ entrySpeedMps: uniform(0, 2.5) }));
const putt = fc.record({
  distanceM: uniform(0.3, 30),
  slopePct: uniform(0, 8),
  fallLineDeg: uniform(0, 360),
  stimpFt: uniform(4, 16),
  pace,
});
const stops = (p: ReadInput) => stopsInPractice(resolveGreen(p));

test(`golfer's sanity check: a 3 m putt across a 2 % slope at Stimp 10 breaks a few hole widths, more when dying (${GOLFER_SANITY.firmness})`, () => {
  const base = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };
  const good = read({ ...base, pace: { rollPastM: GOOD_PACE_ROLL_PAST_M.value } });
  const dying = read({ ...base, pace: { rollPastM: 0 } });
  const firm = read({ ...base, pace: { rollPastM: 1.5 } });
  const cups = (r: Read) => Math.abs(r.aimOffsetM!) / HOLE_DIAMETER_M;
  console.log(
    `3 m, 2 %, falls right, Stimp 10: aim ${(100 * good.aimOffsetM!).toFixed(1)} cm (${cups(good).toFixed(1)} hole widths) left at 45 cm past; ` +
      `dying ${cups(dying).toFixed(1)}, firm (1.5 m past) ${cups(firm).toFixed(1)} hole widths; launch ${good.launchSpeedMps.toFixed(2)} m/s, ` +
      `entry ${good.entrySpeedMps.toFixed(2)} m/s, flat-putt length ${good.flatPuttLengthM.toFixed(2)} m`,
  );
  expect(good.aimOffsetM!).toBeLessThan(0); // falls right → aim left
  expect(good.breaks).toBe("left-to-right");
  expect(cups(good)).toBeGreaterThan(GOLFER_SANITY.holeWidthsRange[0]);
  expect(cups(good)).toBeLessThan(GOLFER_SANITY.holeWidthsRange[1]);
  expect(cups(dying)).toBeGreaterThan(cups(good));
  expect(cups(firm)).toBeLessThan(cups(good));
  expect(good.capture.holed).toBe(true);
  expect(good.path.length).toBeGreaterThanOrEqual(30);
  expect(good.path.length).toBeLessThanOrEqual(125);
});

test("straight putts use the closed form v = √(2·a_eff·(D + P)), a_eff = a_r ∓ a_g (derived)", () => {
  for (const [fallLineDeg, sign] of [
    [0, -1],
    [180, 1],
  ] as const) {
    const g = resolveGreen({ slopePct: 3, fallLineDeg, stimpFt: 11 });
    const aEff = g.rollingDecelMps2 + sign * g.gravityDecelMps2;
    const r = read({ distanceM: 5, slopePct: 3, fallLineDeg, stimpFt: 11, pace: { rollPastM: 0.5 } });
    expect(r.launchSpeedMps).toBeCloseTo(Math.sqrt(2 * aEff * 5.5), 9);
    expect(r.entrySpeedMps).toBeCloseTo(Math.sqrt(2 * aEff * 0.5), 9);
    expect(Math.abs(r.restM[1] - 5.5)).toBeLessThan(1e-6);
  }
});

describe("properties of the read over the whole input range", () => {
  test("every closed-form read re-integrated with odex (simulateRoll) passes within 1 mm of the hole at the asked pace (500 reads)", () => {
    fc.assert(
      fc.property(putt, (p) => {
        fc.pre(stops(p));
        const r = read(p);
        const s = simulateRoll({ ...p, launchSpeedMps: r.launchSpeedMps, startLineDeg: r.startLineDeg });
        if (!s.ok) return false;
        const pass = s.roll.closestApproach;
        const paceOk =
          "rollPastM" in p.pace
            ? Math.abs(s.roll.rollLengthM - pass.alongPathM - p.pace.rollPastM) < ONE_MM
            : Math.abs(pass.speedMps - p.pace.entrySpeedMps) < 1e-3 || p.pace.entrySpeedMps < 0.02;
        // The stated capture agrees with odex's, judged at the rim, except on a knife edge.
        const captureOk = Math.abs(s.roll.capture.marginMps) < 1e-3 || s.roll.capture.holed === r.capture.holed;
        return pass.distanceM < ONE_MM && paceOk && captureOk;
      }),
      { numRuns: 500, seed: 2024 },
    );
  });

  test("mirror symmetry: fall line φ and 360 − φ give equal and opposite aims", () => {
    fc.assert(
      fc.property(putt, (p) => {
        fc.pre(stops(p));
        const a = read(p);
        const b = read({ ...p, fallLineDeg: 360 - p.fallLineDeg });
        return (
          Math.abs(a.aimOffsetM! + b.aimOffsetM!) < 1e-9 * (1 + Math.abs(a.aimOffsetM!)) &&
          Math.abs(a.launchSpeedMps - b.launchSpeedMps) < 1e-9
        );
      }),
      { numRuns: 30, seed: 90 },
    );
  });

  test("no break on the fall line (0° and 180°): start line 0, breaks none (derived)", () => {
    fc.assert(
      fc.property(putt, fc.constantFrom(0, 180, 360), (p, fallLineDeg) => {
        const q = { ...p, fallLineDeg };
        fc.pre(stops(q));
        const r = read(q);
        return r.startLineDeg === 0 && r.aimOffsetM! === 0 && r.breaks === "none" && Math.abs(r.restM[0]) < 1e-9;
      }),
      { numRuns: 20, seed: 5 },
    );
  });

  test("break (start line angle) grows with slope", () => {
    fc.assert(
      fc.property(putt, uniform(1.05, 2), (p, factor) => {
        const steeper = { ...p, slopePct: p.slopePct * factor };
        fc.pre(p.slopePct > 0.1 && Math.abs(Math.sin((p.fallLineDeg * Math.PI) / 180)) > 0.05 && stops(steeper));
        return Math.abs(read(steeper).startLineDeg) > Math.abs(read(p).startLineDeg);
      }),
      { numRuns: 25, seed: 17 },
    );
  });

  test("break (start line angle) grows with green speed", () => {
    fc.assert(
      fc.property(putt, uniform(0.5, 3), (p, extraFt) => {
        const faster = { ...p, stimpFt: Math.min(16, p.stimpFt + extraFt) };
        fc.pre(
          p.slopePct > 0.1 &&
            faster.stimpFt > p.stimpFt + 0.1 &&
            Math.abs(Math.sin((p.fallLineDeg * Math.PI) / 180)) > 0.05 &&
            stops(faster),
        );
        return Math.abs(read(faster).startLineDeg) > Math.abs(read(p).startLineDeg);
      }),
      { numRuns: 25, seed: 23 },
    );
  });

  test("a dying pace needs more borrow (a wider start line) than a firmer one", () => {
    fc.assert(
      fc.property(putt, uniform(0, 2.5), uniform(0.1, 1.5), (p, slowM, extraM) => {
        fc.pre(p.slopePct > 0.1 && Math.abs(Math.sin((p.fallLineDeg * Math.PI) / 180)) > 0.05 && stops(p));
        const dying = read({ ...p, pace: { rollPastM: slowM } });
        const firm = read({ ...p, pace: { rollPastM: slowM + extraM } });
        // Only the aim is monotone: on a steep, fast downhill a dying putt aimed far up the slope can need about
        // the same launch speed as a slightly firmer one (seen in this model), so speed is not asserted.
        // Compared by start line: near the cannot-stop threshold a dying start line can pass 90° (launched up the
        // slope, sideways), where the aim offset D·tan(start line) stops being meaningful.
        return Math.abs(dying.startLineDeg) > Math.abs(firm.startLineDeg);
      }),
      { numRuns: 25, seed: 31 },
    );
  });

  test("the homogeneous 1-D method agrees with the direct 2-D Newton solve (aim and pace to 1 mm)", () => {
    fc.assert(
      fc.property(putt, (p) => {
        fc.pre(stops(p) && p.distanceM < 15);
        const a = read(p);
        const d = solveReadDirect(p);
        if (!d.ok) return false;
        expect(a.diagnostics.method).not.toBe("direct-2d");
        expect(d.read.diagnostics.method).toBe("direct-2d");
        return (
          Math.abs(a.aimOffsetM! - d.read.aimOffsetM!) < ONE_MM &&
          Math.abs(a.rollPastM - d.read.rollPastM) < ONE_MM &&
          Math.abs(a.launchSpeedMps - d.read.launchSpeedMps) < 1e-3
        );
      }),
      { numRuns: 12, seed: 42 },
    );
  });

  test("cannot-stop is detected up front and returned as a value", () => {
    fc.assert(
      fc.property(putt, (p) => {
        const r = solveRead(p);
        return stops(p) ? r.ok : !r.ok && r.reason === "cannot-stop" && r.message.length > 0;
      }),
      { numRuns: 40, seed: 8 },
    );
  });
});

test("8 % at Stimp 10 cannot stop; 2 % can (derived threshold ~7.9 %)", () => {
  const r = solveRead({ distanceM: 3, slopePct: 8, fallLineDeg: 90, stimpFt: 10 });
  expect(r.ok).toBe(false);
  if (!r.ok) {
    expect(r.reason).toBe("cannot-stop");
    expect(r.nearThreshold).toBe(false);
  }
  expect(solveRead({ distanceM: 3, slopePct: 7.82, fallLineDeg: 90, stimpFt: 10 }).ok).toBe(false); // within the 1 % margin
  expect(solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }).ok).toBe(true);
});

test("entry-speed pace and roll-past pace describe the same putt", () => {
  const base = { distanceM: 6, slopePct: 2.5, fallLineDeg: 130, stimpFt: 11 };
  const byRollPast = read({ ...base, pace: { rollPastM: 0.6 } });
  const byEntry = read({ ...base, pace: { entrySpeedMps: byRollPast.entrySpeedMps } });
  expect(Math.abs(byEntry.aimOffsetM! - byRollPast.aimOffsetM!)).toBeLessThan(ONE_MM);
  expect(Math.abs(byEntry.rollPastM - 0.6)).toBeLessThan(ONE_MM);
});

test("the aim offset is where the start line passes at the hole's distance, D·tan(start line)", () => {
  const r = read({ distanceM: 4, slopePct: 1.5, fallLineDeg: 250, stimpFt: 9 });
  expect(r.aimOffsetM!).toBeCloseTo(4 * Math.tan((r.startLineDeg * Math.PI) / 180), 12);
  expect(r.aimOffsetM!).toBeGreaterThan(0); // falls left → aim right
  expect(r.breaks).toBe("right-to-left");
  expect(r.diagnostics.method).toBe("closed-form");
  expect(r.diagnostics.iterations).toBeGreaterThan(0);
  expect(r.model.gravityFactor).toBeCloseTo(5 / 7, 12);
});

test("bad inputs are refused with a RangeError", () => {
  expect(() => solveRead({ distanceM: -1, slopePct: 2, fallLineDeg: 0, stimpFt: 10 })).toThrow(RangeError);
  expect(() => solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: 0, stimpFt: 10, pace: { rollPastM: -0.1 } })).toThrow(RangeError);
  expect(() => solveRead({ distanceM: 3, slopePct: 2, fallLineDeg: Number.NaN, stimpFt: 10 })).toThrow(RangeError);
});

test("aim offsets only up to a 60° start line; at 89°, 91° and 120° the start line and a plain statement (issue 13)", () => {
  const at60 = aimOf(60, 3);
  expect(at60.aimGiven).toBe("offset");
  expect(at60.aimOffsetM!).toBeCloseTo(3 * Math.sqrt(3), 12); // D·tan 60° (derived)
  for (const deg of [89, -91, 120]) {
    const a = aimOf(deg, 3);
    expect(a.aimGiven).toBe("start-line");
    expect(a.aimOffsetM).toBeNull();
    expect(a.aimNote).toContain(`${Math.abs(deg)}° ${deg < 0 ? "left" : "right"}`);
  }
  // The chart cell: 3 m, 7.7 % falling at 30°, Stimp 10, dying pace needs a start line past square.
  const wide = read({ distanceM: 3, slopePct: 7.7, fallLineDeg: 30, stimpFt: 10, pace: { rollPastM: 0 } });
  expect(Math.abs(wide.startLineDeg)).toBeGreaterThan(90);
  expect(wide.aimGiven).toBe("start-line");
  expect(wide.aimOffsetM).toBeNull();
  expect(wide.aimNote).toMatch(/^Start the ball \d+° left/);
});
