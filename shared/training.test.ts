import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { HOLE_DIAMETER_M } from "./units";
import {
  HOLED_MIN_SCORE,
  TRAINING_LEVELS,
  TRAINING_LEVEL_IDS,
  evaluateAttempt,
  launchSpeedForFlatPutt,
  puttFitsLevel,
  readScore,
  startLineFromAimDeg,
} from "./training";

const sideHill = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };
const error = fc.double({ min: -5, max: 5, noNaN: true });
const distance = fc.double({ min: 0.5, max: 15, noNaN: true });

test("a perfect read scores 100", () => {
  expect(readScore({ aimErrorM: 0, paceErrorM: 0, distanceM: 3, holed: false })).toBe(100);
});

test("one hole width off with a perfect pace scores 80; two score 50; four score 20", () => {
  const at = (widths: number) => readScore({ aimErrorM: widths * HOLE_DIAMETER_M, paceErrorM: 0, distanceM: 4, holed: false });
  expect(at(1)).toBe(80);
  expect(at(2)).toBe(50);
  expect(at(4)).toBe(20);
  expect(at(-2)).toBe(50);
});

test("a pace 10 % of the putt's length off scores 80 and 20 % scores 50", () => {
  expect(readScore({ aimErrorM: 0, paceErrorM: 0.5, distanceM: 5, holed: false })).toBe(80);
  expect(readScore({ aimErrorM: 0, paceErrorM: -1, distanceM: 5, holed: false })).toBe(50);
});

describe("readScore properties", () => {
  test("is an integer from 0 to 100", () => {
    fc.assert(
      fc.property(error, error, distance, fc.boolean(), (a, p, d, holed) => {
        const s = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed });
        return Number.isInteger(s) && s >= 0 && s <= 100;
      }),
    );
  });

  test("never rises as the aim error grows", () => {
    fc.assert(
      fc.property(error, fc.double({ min: 0, max: 2, noNaN: true }), error, distance, fc.boolean(), (a, more, p, d, holed) => {
        const s1 = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed });
        const s2 = readScore({ aimErrorM: Math.sign(a || 1) * (Math.abs(a) + more), paceErrorM: p, distanceM: d, holed });
        return s2 <= s1;
      }),
    );
  });

  test("never rises as the pace error grows", () => {
    fc.assert(
      fc.property(error, error, fc.double({ min: 0, max: 2, noNaN: true }), distance, fc.boolean(), (a, p, more, d, holed) => {
        const s1 = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed });
        const s2 = readScore({ aimErrorM: a, paceErrorM: Math.sign(p || 1) * (Math.abs(p) + more), distanceM: d, holed });
        return s2 <= s1;
      }),
    );
  });

  test("the same pace error costs less on a longer putt", () => {
    fc.assert(
      fc.property(
        error,
        fc.double({ min: 0.05, max: 2, noNaN: true }),
        distance,
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (a, p, d, longer) => {
          const short = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed: false });
          const long = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d + longer, holed: false });
          return long >= short;
        },
      ),
    );
  });

  test(`a holed read scores at least ${HOLED_MIN_SCORE}, and never less than the same read missed`, () => {
    fc.assert(
      fc.property(error, error, distance, (a, p, d) => {
        const holed = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed: true });
        const missed = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed: false });
        return holed >= HOLED_MIN_SCORE && holed >= missed;
      }),
    );
  });

  test("falls smoothly: a millimetre more aim error costs at most one point", () => {
    fc.assert(
      fc.property(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), distance, (a, p, d) => {
        const s1 = readScore({ aimErrorM: a, paceErrorM: p, distanceM: d, holed: false });
        const s2 = readScore({ aimErrorM: a + 0.001, paceErrorM: p, distanceM: d, holed: false });
        return Math.abs(s1 - s2) <= 1;
      }),
    );
  });
});

test("the start line through an aim offset at the hole's distance", () => {
  expect(startLineFromAimDeg(0, 3)).toBe(0);
  expect(startLineFromAimDeg(3, 3)).toBeCloseTo(45, 9);
  expect(startLineFromAimDeg(-0.3, 3)).toBeCloseTo(-5.7106, 3);
});

test("a flat putt's launch speed: a Stimp-exit ball (1.8288 m/s) rolls the Stimp reading on the flat", () => {
  // Definition of the Stimpmeter reading (docs/sources.md, Stimpmeter): 6 ft/s leaves the bar and rolls S. A flat
  // putt of length S − 0.45 m played 0.45 m past needs exactly that speed.
  expect(launchSpeedForFlatPutt(10 * 0.3048 - 0.45, 10)).toBeCloseTo(1.8288, 6);
  expect(launchSpeedForFlatPutt(10 * 0.3048, 10, 0)).toBeCloseTo(1.8288, 6);
});

test("on a flat green the true flat-putt length is the putt's own length (derived)", () => {
  const flat = evaluateAttempt({ ...sideHill, slopePct: 0 }, { aimOffsetM: 0, flatPuttLengthM: 3 });
  if (!flat.ok) throw new Error("cannot stop");
  expect(flat.truth.flatPuttLengthM).toBeCloseTo(3, 4);
  expect(flat.yours.holed).toBe(true);
});

test("the true read of a putt scores 100 and drops", () => {
  const first = evaluateAttempt(sideHill, { aimOffsetM: 0, flatPuttLengthM: 3 });
  if (!first.ok) throw new Error("cannot stop");
  const truth = first.truth;
  // Falls to the right: the true aim is left of the hole.
  expect(truth.aimOffsetM).toBeLessThan(0);
  const exact = evaluateAttempt(sideHill, { aimOffsetM: truth.aimOffsetM, flatPuttLengthM: truth.flatPuttLengthM });
  if (!exact.ok) throw new Error("cannot stop");
  expect(exact.score).toBe(100);
  expect(exact.yours.holed).toBe(true);
  expect(Math.abs(exact.aimErrorM)).toBeLessThan(1e-9);
  expect(Math.abs(exact.paceErrorM)).toBeLessThan(1e-6);
});

test("aiming straight at a side-hill putt misses low (to the right) and scores under 50", () => {
  const r = evaluateAttempt(sideHill, { aimOffsetM: 0, flatPuttLengthM: 3 });
  if (!r.ok) throw new Error("cannot stop");
  expect(r.yours.holed).toBe(false);
  expect(r.yours.finishSideM).toBeGreaterThan(0);
  expect(r.aimErrorM).toBeGreaterThan(0);
  expect(r.score).toBeLessThan(50);
});

test("a roll-past guess stands for the stroke that rolls that far past on the true line", () => {
  const r = evaluateAttempt(sideHill, { aimOffsetM: -0.2, rollPastM: 0.45 });
  if (!r.ok) throw new Error("cannot stop");
  expect(r.paceErrorM).toBeCloseTo(0, 6);
  expect(r.yours.launchSpeedMps).toBeCloseTo(r.truth.launchSpeedMps, 9);
});

test("a downhill putt needs a shorter flat putt than its length, an uphill one a longer", () => {
  const down = evaluateAttempt({ ...sideHill, fallLineDeg: 0 }, { aimOffsetM: 0, flatPuttLengthM: 3 });
  const up = evaluateAttempt({ ...sideHill, fallLineDeg: 180 }, { aimOffsetM: 0, flatPuttLengthM: 3 });
  if (!down.ok || !up.ok) throw new Error("cannot stop");
  expect(down.truth.flatPuttLengthM).toBeLessThan(3);
  expect(up.truth.flatPuttLengthM).toBeGreaterThan(3);
});

test("a green the ball cannot stop on is a value, not a throw", () => {
  const r = evaluateAttempt({ ...sideHill, slopePct: 8, stimpFt: 13 }, { aimOffsetM: 0, flatPuttLengthM: 3 });
  expect(r).toMatchObject({ ok: false, reason: "cannot-stop" });
});

test("every level's steepest slope still stops a ball at its fastest Stimp", () => {
  for (const id of TRAINING_LEVEL_IDS) {
    const l = TRAINING_LEVELS[id];
    const r = evaluateAttempt(
      { distanceM: l.distanceM[1], slopePct: l.slopePct[1], fallLineDeg: 0, stimpFt: l.stimpFt[1] },
      { aimOffsetM: 0, flatPuttLengthM: 1 },
    );
    expect(r.ok).toBe(true);
  }
});

test("puttFitsLevel names the numbers outside a level's ranges", () => {
  expect(puttFitsLevel({ distanceM: 3, slopePct: 1.5, fallLineDeg: 10, stimpFt: 10 }, "gentle")).toEqual({});
  const out = puttFitsLevel({ distanceM: 9, slopePct: 3.5, fallLineDeg: 10, stimpFt: 10 }, "gentle");
  expect(Object.keys(out).sort()).toEqual(["distanceM", "slopePct"]);
});
