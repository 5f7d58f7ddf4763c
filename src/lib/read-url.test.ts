import fc from "fast-check";
import { expect, test } from "vitest";
import { READ_LIMITS, readRequestSchema } from "#shared/schemas/reads";
import {
  decodeReadQuery,
  decodeReadQueryChecked,
  defaultReadValues,
  encodeReadQuery,
  fromReadRequest,
  isCompleteReadQuery,
  toReadRequest,
} from "./read-url";

test("a read's query is SI, in a fixed key order, and decodes back to the same values", () => {
  const v = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, paceMode: "rollPast" as const, rollPastM: 0.45, entrySpeedMps: 0.8 };
  const q = encodeReadQuery(v);
  expect(q).toBe("d=3&s=2&f=90&st=10&rp=0.45");
  expect(decodeReadQuery(new URLSearchParams(q), "metric")).toEqual(v);
});

test("the brief's example link reproduces its read", () => {
  const v = decodeReadQuery(new URLSearchParams("d=3&s=2&f=90&st=10&rp=0.45"), "imperial");
  expect(toReadRequest(v)).toEqual({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } });
});

test("an entry-speed link keeps its pace mode and writes es, not rp", () => {
  const v = decodeReadQuery(new URLSearchParams("d=4&s=1.5&f=270&st=11&es=0.9"), "imperial");
  expect(v.paceMode).toBe("entrySpeed");
  expect(v.entrySpeedMps).toBe(0.9);
  expect(encodeReadQuery(v)).toBe("d=4&s=1.5&f=270&st=11&es=0.9");
  expect(toReadRequest(v)?.pace).toEqual({ entrySpeedMps: 0.9 });
});

test("missing or garbled values take the defaults of the user's units", () => {
  const v = decodeReadQuery(new URLSearchParams("d=abc&s=&f=45"), "imperial");
  const base = defaultReadValues("imperial");
  expect(v.distanceM).toBeCloseTo(3.048, 12);
  expect(v.slopePct).toBe(base.slopePct);
  expect(v.fallLineDeg).toBe(45);
  expect(v.rollPastM).toBeCloseTo(0.4318, 12);
  expect(decodeReadQuery(new URLSearchParams(""), "metric").distanceM).toBe(3);
  expect(decodeReadQuery(new URLSearchParams(""), "metric").rollPastM).toBe(0.45);
});

test("a value outside the API's limits is kept (the form flags it) but gives no request", () => {
  const v = decodeReadQuery(new URLSearchParams("d=50&s=2&f=90&st=10&rp=0.45"), "metric");
  expect(v.distanceM).toBe(50);
  expect(toReadRequest(v)).toBeNull();
});

test("only a query naming every part of a read counts as complete", () => {
  expect(isCompleteReadQuery(new URLSearchParams("d=3&s=2&f=90&st=10&rp=0.45"))).toBe(true);
  expect(isCompleteReadQuery(new URLSearchParams("d=3&s=2&f=90&st=10&es=0.7"))).toBe(true);
  expect(isCompleteReadQuery(new URLSearchParams("d=3&s=2&f=90&st=10"))).toBe(false);
  expect(isCompleteReadQuery(new URLSearchParams("d=3&s=x&f=90&st=10&rp=0.4"))).toBe(false);
});

test("links stay short: floating-point dust is cut at six decimals without changing the putt", () => {
  const q = encodeReadQuery({ ...defaultReadValues("imperial"), distanceM: 11 * 0.3048 });
  expect(q).toContain("d=3.3528&");
  expect(q).toContain("rp=0.4318");
});

test("a saved read's request becomes the same link as the read it came from", () => {
  const request = { distanceM: 2.5, slopePct: 3, fallLineDeg: 135, stimpFt: 9.5, pace: { rollPastM: 0.3 } };
  expect(toReadRequest(fromReadRequest(request, "imperial"))).toEqual(request);
});

test("a link's numbers are read as a person wrote them: hex, exponents and blanks are not numbers", () => {
  const v = decodeReadQuery(new URLSearchParams("d=0x1A&s=1e1&f=%2090%20&st=9,5&rp=0"), "metric");
  expect(v.distanceM).toBe(3); // "0x1A" is not 26 m: the default stands
  expect(v.slopePct).toBe(2); // nor is "1e1" 10 %
  expect(v.fallLineDeg).toBe(90);
  expect(v.stimpFt).toBe(9.5); // a comma decimal is a decimal
  expect(v.rollPastM).toBe(0); // a dying pace is a pace, not a missing value
  expect(v.paceMode).toBe("rollPast");
});

test("the checked decode (rehearse, chart) replaces out-of-range or garbled values by the defaults and names them", () => {
  const { values, replaced } = decodeReadQueryChecked(new URLSearchParams("d=abc&s=12&f=450&st=9&rp=0.45"), "imperial");
  expect(replaced.sort()).toEqual(["distanceM", "fallLineDeg", "slopePct"]);
  expect(values).toMatchObject({ slopePct: 2, fallLineDeg: 90, stimpFt: 9, rollPastM: 0.45 });
  expect(values.distanceM).toBeCloseTo(3.048, 12);
  const entry = decodeReadQueryChecked(new URLSearchParams("d=3&s=2&f=10&st=10&es=0.9"), "metric");
  expect(entry.replaced).toEqual([]);
  expect(entry.values).toMatchObject({ paceMode: "entrySpeed", entrySpeedMps: 0.9 });
});

test("toReadRequest gives a request exactly when the API's schema accepts the read, and the same request", () => {
  // The plain range check keeps zod off /read's first load; the API's schema (shared/schemas/reads.ts) is the judge.
  const near = (key: keyof typeof READ_LIMITS) => {
    const { min, max } = READ_LIMITS[key];
    const span = max - min;
    // Mostly in range, so that whole reads pass often; the limits themselves, just past them, and far off too.
    return fc.oneof(
      { arbitrary: fc.double({ min, max, noNaN: true }), weight: 6 },
      { arbitrary: fc.constantFrom(min, max), weight: 2 },
      { arbitrary: fc.constantFrom(min - 1e-9, max + 1e-9, Number.POSITIVE_INFINITY, Number.NaN), weight: 1 },
      { arbitrary: fc.double({ min: min - span, max: max + span }), weight: 1 },
    );
  };
  fc.assert(
    fc.property(
      fc.record({
        distanceM: near("distanceM"),
        slopePct: near("slopePct"),
        fallLineDeg: near("fallLineDeg"),
        stimpFt: near("stimpFt"),
        paceMode: fc.constantFrom("rollPast" as const, "entrySpeed" as const),
        rollPastM: near("rollPastM"),
        entrySpeedMps: near("entrySpeedMps"),
      }),
      (v) => {
        const api = readRequestSchema.safeParse({
          distanceM: v.distanceM,
          slopePct: v.slopePct,
          fallLineDeg: v.fallLineDeg,
          stimpFt: v.stimpFt,
          pace: v.paceMode === "entrySpeed" ? { entrySpeedMps: v.entrySpeedMps } : { rollPastM: v.rollPastM },
        });
        expect(toReadRequest(v)).toEqual(api.success ? api.data : null);
      },
    ),
    { numRuns: 2000 },
  );
});

test("the defaults are exactly what a link carries, so a bare /read and the link it writes ask for the same read", () => {
  for (const units of ["imperial", "metric"] as const) {
    const defaults = defaultReadValues(units);
    expect(decodeReadQuery(new URLSearchParams(encodeReadQuery(defaults)), units)).toEqual(defaults);
    expect(toReadRequest(decodeReadQuery(new URLSearchParams(encodeReadQuery(defaults)), units))).toEqual(toReadRequest(defaults));
  }
});
