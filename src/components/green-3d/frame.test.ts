import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  contourIntervalM,
  contourSegments,
  ellipsePoints,
  greenShape,
  heightAtM,
  heightRange,
  puttToScene,
  sampleAtTime,
  sceneToPutt,
  surfaceNormal,
  surfacePoint,
} from "./frame";

const TOL = 1e-12;

test("a downhill putt (fall line 0) has the hole below the ball: 2 % over 3 m is 6 cm", () => {
  expect(heightAtM(0, 3, { slopePct: 2, fallLineDeg: 0 })).toBeCloseTo(-0.06, 12);
});

test("an uphill putt (fall line 180) has the hole above the ball", () => {
  expect(heightAtM(0, 3, { slopePct: 2, fallLineDeg: 180 })).toBeCloseTo(0.06, 12);
});

test("a green falling to the golfer's right (90) is lower on the right and level along the line to the hole", () => {
  const plane = { slopePct: 2, fallLineDeg: 90 };
  expect(heightAtM(1, 0, plane)).toBeCloseTo(-0.02, 12);
  expect(heightAtM(-1, 0, plane)).toBeCloseTo(0.02, 12);
  expect(Math.abs(heightAtM(0, 5, plane))).toBeLessThan(TOL);
});

test("falling to the left (270) mirrors falling to the right", () => {
  expect(heightAtM(1, 2, { slopePct: 3, fallLineDeg: 270 })).toBeCloseTo(heightAtM(-1, 2, { slopePct: 3, fallLineDeg: 90 }), 12);
});

test("exaggeration scales heights and nothing else", () => {
  expect(heightAtM(1, 2, { slopePct: 2, fallLineDeg: 40, exaggeration: 5 })).toBeCloseTo(
    5 * heightAtM(1, 2, { slopePct: 2, fallLineDeg: 40 }),
    12,
  );
});

test("the scene mapping: putt x → scene x, height → scene y, putt y → scene −z", () => {
  expect(puttToScene(0.5, 3, -0.06)).toEqual([0.5, -0.06, -3]);
  expect(puttToScene(0, 0, 0)).toEqual([0, 0, 0]);
  expect(sceneToPutt(0.5, -0.06, -3)).toEqual([0.5, 3]);
});

test("the hole lies straight ahead of a camera behind the ball looking down −z, and the golfer's right is +x", () => {
  const hole = puttToScene(0, 4, 0);
  const right = puttToScene(1, 0, 0);
  expect(hole[2]).toBeLessThan(0);
  expect(hole[0]).toBe(0);
  expect(right[0]).toBeGreaterThan(0);
});

describe("mapping properties", () => {
  const coord = fc.double({ min: -20, max: 20, noNaN: true });
  test("sceneToPutt undoes puttToScene", () => {
    fc.assert(
      fc.property(coord, coord, coord, (x, y, h) => {
        const [px, py] = sceneToPutt(...puttToScene(x, y, h));
        return Math.abs(px - x) < TOL && Math.abs(py - y) < TOL;
      }),
    );
  });
  test("surface points lie in the plane whose normal surfaceNormal gives", () => {
    fc.assert(
      fc.property(coord, coord, fc.double({ min: 0, max: 8, noNaN: true }), fc.double({ min: 0, max: 360, noNaN: true }), (x, y, s, f) => {
        const plane = { slopePct: s, fallLineDeg: f };
        const p = surfacePoint(x, y, plane);
        const n = surfaceNormal(plane);
        return Math.abs(p[0] * n[0] + p[1] * n[1] + p[2] * n[2]) < 1e-9;
      }),
    );
  });
  test("the height falls fastest along the fall line, by slopePct/100 per metre", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 8, noNaN: true }), fc.double({ min: 0, max: 360, noNaN: true }), (s, f) => {
        const plane = { slopePct: s, fallLineDeg: f };
        const r = (f * Math.PI) / 180;
        return Math.abs(heightAtM(Math.sin(r), Math.cos(r), plane) + s / 100) < 1e-12;
      }),
    );
  });
});

test("the surface normal tilts away from the uphill side", () => {
  // Falls to the right (+x): the normal leans toward +x.
  const n = surfaceNormal({ slopePct: 2, fallLineDeg: 90 });
  expect(n[0]).toBeGreaterThan(0);
  expect(n[1]).toBeCloseTo(1, 3);
  expect(Math.hypot(...n)).toBeCloseTo(1, 12);
});

test("the green's height range is found on its rim, highest on the uphill side", () => {
  const shape = greenShape(4);
  const plane = { slopePct: 2, fallLineDeg: 90 };
  const r = heightRange(shape, plane);
  expect(r.maxM).toBeCloseTo(0.02 * shape.a, 12);
  expect(r.minM).toBeCloseTo(-0.02 * shape.a, 12);
  expect(r.highPoint[0]).toBeLessThan(0);
  for (const [x, y] of ellipsePoints(shape, 64)) {
    const h = heightAtM(x, y, plane);
    expect(h).toBeLessThanOrEqual(r.maxM + 1e-12);
    expect(h).toBeGreaterThanOrEqual(r.minM - 1e-12);
  }
});

test("contour interval: a round step drawing at most 12 lines, in cm or inches", () => {
  expect(contourIntervalM(0.18, "metric")).toBe(0.02);
  expect(contourIntervalM(0.05, "metric")).toBe(0.005);
  expect(contourIntervalM(0.18, "imperial")).toBeCloseTo(0.0254, 12);
  expect(contourIntervalM(0, "metric")).toBeNull();
});

test("contour lines run across the fall line, at equal height along each, inside the green", () => {
  const shape = greenShape(5);
  const plane = { slopePct: 2.5, fallLineDeg: 60 };
  const segs = contourSegments(shape, plane, 0.02);
  expect(segs.length).toBeGreaterThan(3);
  for (const s of segs) {
    expect(heightAtM(...s.from, plane)).toBeCloseTo(s.heightM, 9);
    expect(heightAtM(...s.to, plane)).toBeCloseTo(s.heightM, 9);
    for (const [x, y] of [s.from, s.to]) expect(((x - shape.cx) / shape.a) ** 2 + ((y - shape.cy) / shape.b) ** 2).toBeCloseTo(1, 9);
  }
  expect(contourSegments(shape, { slopePct: 0, fallLineDeg: 0 }, 0.02)).toEqual([]);
});

test("sampleAtTime interpolates a timed path and clamps at its ends", () => {
  const times = [0, 1, 2];
  const xs = [0, 1, 1];
  const ys = [0, 2, 4];
  expect(sampleAtTime(times, xs, ys, 0.5)).toMatchObject({ x: 0.5, y: 1 });
  expect(sampleAtTime(times, xs, ys, 1.5, 1)).toMatchObject({ x: 1, y: 3 });
  expect(sampleAtTime(times, xs, ys, -1)).toMatchObject({ x: 0, y: 0 });
  expect(sampleAtTime(times, xs, ys, 9)).toMatchObject({ x: 1, y: 4 });
  // A stale hint ahead of t is not trusted.
  expect(sampleAtTime(times, xs, ys, 0.25, 1)).toMatchObject({ x: 0.25, y: 0.5 });
});

test("sampleAtTime writes into the replay's one object, frame after frame, and its index is the next hint", () => {
  const times = [0, 1, 2, 3];
  const xs = [0, 1, 2, 3];
  const ys = [0, 10, 20, 30];
  const out = { x: 0, y: 0, index: 0 };
  let hint = 0;
  for (const [t, y, index] of [
    [0.5, 5, 0],
    [1.5, 15, 1],
    [2.75, 27.5, 2],
    [4, 30, 3],
  ] as const) {
    const s = sampleAtTime(times, xs, ys, t, hint, out);
    expect(s).toBe(out);
    expect(s).toEqual({ x: y / 10, y, index });
    hint = s.index;
  }
});
