import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { buildPracticePlan, MIN_PLAN_PUTTS, weeklyVolume, publishedFirstPuttShareBelow, type PlanPutt } from "./practice-plan";
import { weeklyCheck, weekMove } from "./practice-plan-weekly";
import { ladderInputSchema } from "./schemas/ladders";
import { planProposalSchema, type PlanReady } from "./schemas/practice-plan";
import { DEFAULT_BAND_EDGES_M } from "./stats/bands";
import { METRES_PER_FOOT } from "./units";

const ft = (x: number) => x * METRES_PER_FOOT;
const EDGES = DEFAULT_BAND_EDGES_M.imperial; // 0-3, 3-6, 6-10, 10-15, 15-20, 20-30, 30+ ft
const BAND_6_10 = 2;
const BAND_3_6 = 1;
const BAND_20_30 = 5;

/** n putts from `lengthFt`, the first `made` of them holed. */
function putts(lengthFt: number, n: number, made: number): PlanPutt[] {
  return Array.from({ length: n }, (_, i) => ({ distanceM: ft(lengthFt), holed: i < made }));
}

/**
 * Tour one-putt rates as listed in docs/sources.md ("Make rates", Broadie, Every Shot Counts 2014 [secondary]):
 * 2 ft 99 %, 4 ft 88 %, 8 ft ≈ 50 %, 15 ft 23 %, 20 ft 15 %, 40 ft 4 %. A player who makes exactly those at every
 * length but one loses nothing there.
 */
function tourLevelPlayer(except: { lengthFt: number; n: number; made: number }): PlanPutt[] {
  const at = (lengthFt: number, rate: number, n = 40) =>
    lengthFt === except.lengthFt ? putts(except.lengthFt, except.n, except.made) : putts(lengthFt, n, Math.round(rate * n));
  return [...at(2, 0.99), ...at(4, 0.88), ...at(8, 0.5), ...at(15, 0.23), ...at(20, 0.15), ...at(40, 0.04)];
}

const noRounds = { rounds: 0, facedM: [] as number[] };

test("a player weak only at 6–10 ft gets a plan for 6–10 ft alone", () => {
  // 8 ft: 8 of 40 holed (20 %) where the tour holes 50 % (Broadie 2014 [secondary]); tour level everywhere else.
  const p = buildPracticePlan({
    putts: tourLevelPlayer({ lengthFt: 8, n: 40, made: 8 }),
    course: noRounds,
    edgesM: EDGES,
    units: "imperial",
  });
  expect(p.status).toBe("plan");
  const plan = p as PlanReady;
  expect(plan.targets).toEqual([BAND_6_10]);
  expect(plan.bands.filter((b) => b.clearLoss).map((b) => b.fromM)).toEqual([ft(6)]);
  // Loss per putt 0.5 − 0.2 = 0.3; the Wilson interval of 8/40 is about 0.105–0.35 (Wilson 1927), so the loss is clear.
  expect(plan.bands[BAND_6_10]!.lossPerPutt).toBeCloseTo(0.3, 6);
  expect(plan.bands[BAND_6_10]!.lossCi95![0]).toBeGreaterThan(0.14);
  // Every rung lies in 6–10 ft, short to long, and the ladder is one the builder would accept.
  for (const r of plan.ladder.rungs) {
    expect(r.distanceM).toBeGreaterThanOrEqual(ft(6) - 1e-9);
    expect(r.distanceM).toBeLessThan(ft(10));
  }
  expect(plan.ladder.rungs.map((r) => Math.round(r.distanceM / METRES_PER_FOOT))).toEqual([7, 8, 9]);
  expect(ladderInputSchema.safeParse(plan.ladder).success).toBe(true);
  expect(planProposalSchema.safeParse(plan).success).toBe(true);
  // The pass rule sits between the player's 20 % and the tour's 50 % at 8 ft: 3 of 8 (35 %).
  const eight = plan.ladder.rungs[1]!;
  expect(eight.passRule).toEqual({ kind: "make", made: 3 });
  // 6–10 ft (1.83–3.05 m) lies wholly inside the gentle level's 1–4 m (shared/training.ts), the gentlest that covers it.
  expect(plan.trainingLevel).toBe("gentle");
  // Three rungs of 10 balls (lengths under 3 m): 30 putts a session; two sessions give 60 ≥ 40 at 6–10 ft.
  expect(plan.weekly).toEqual({ sessions: 2, puttsPerSession: 30, puttsPerWeek: 60, puttsPerTargetBand: 60 });
});

test("a player with too few putts is told to log more first, not given a plan", () => {
  const few = [...putts(8, 20, 4), ...putts(4, 20, 10)];
  const p = buildPracticePlan({ putts: few, course: noRounds, edgesM: EDGES, units: "imperial" });
  expect(p.status).toBe("log-more");
  expect(p).not.toHaveProperty("ladder");
  expect(p.message).toMatch(/^Log more first/);
  expect(p.status === "log-more" && p.puttsNeeded).toBe(MIN_PLAN_PUTTS - 40);
});

test("a player at tour level everywhere gets no plan: no loss is clear of its interval", () => {
  const p = buildPracticePlan({
    putts: tourLevelPlayer({ lengthFt: -1, n: 0, made: 0 }),
    course: noRounds,
    edgesM: EDGES,
    units: "imperial",
  });
  expect(p.status).toBe("no-clear-loss");
});

test("a loss inside its interval is not targeted, however large it looks", () => {
  // 8 ft: 3 of 15 (20 %): Wilson 95 % ≈ 0.07–0.45 reaches the tour's 50 %? No — but 6 of 15 (40 %) spans 0.20–0.64, which does.
  const p = buildPracticePlan({
    putts: tourLevelPlayer({ lengthFt: 8, n: 15, made: 6 }),
    course: noRounds,
    edgesM: EDGES,
    units: "imperial",
  });
  expect(p.status).toBe("no-clear-loss");
  expect(p.bands[BAND_6_10]!.lossPerPutt).toBeGreaterThan(0);
});

describe("weighting by how often a length is faced on the course", () => {
  // Weak at 4 ft (36/60 = 60 % against the tour's 88 %) and at 25 ft (0/60 against ≈ 10.6 %, tour 20 ft 15 % and 30 ft 7 %,
  // log-distance interpolation as docs/sources.md says). Per putt 4 ft costs more (≈ 0.28 against ≈ 0.11).
  const log = [...putts(2, 40, 40), ...putts(4, 60, 36), ...putts(8, 40, 20), ...putts(25, 60, 0)];

  test("with the published first-putt lengths, 3–6 ft comes first", () => {
    const p = buildPracticePlan({ putts: log, course: noRounds, edgesM: EDGES, units: "imperial" }) as PlanReady;
    expect(p.frequency.source).toBe("published");
    // 3–6 ft: (0.20 − 0.08) × 18 ≈ 2.2 faced a round × 0.28 ≈ 0.60; 20–30 ft: (0.79 − 0.61) × 18 ≈ 3.2 × 0.106 ≈ 0.34.
    expect(p.targets).toEqual([BAND_3_6, BAND_20_30]);
    expect(p.bands[BAND_3_6]!.facedPerRound).toBeCloseTo(2.16, 6);
    // 3–30 ft is 0.91–9.14 m: the testing level's 3–12 m covers 6.1 m of it, the club level's 2–8 m only 6.0 m.
    expect(p.trainingLevel).toBe("testing");
  });

  test("a player whose rounds leave mostly 25 ft first putts gets 20–30 ft first", () => {
    // Two rounds: 30 putts faced from 25 ft, 6 from 4 ft → 15 and 3 a round; 15 × 0.106 ≈ 1.59 > 3 × 0.28 ≈ 0.84.
    const facedM = [...Array(30).fill(ft(25)), ...Array(6).fill(ft(4))];
    const p = buildPracticePlan({ putts: log, course: { rounds: 2, facedM }, edgesM: EDGES, units: "imperial" }) as PlanReady;
    expect(p.frequency.source).toBe("rounds");
    expect(p.targets).toEqual([BAND_20_30, BAND_3_6]);
    expect(p.bands[BAND_20_30]!.facedPerRound).toBe(15);
    expect(p.bands[BAND_3_6]!.facedPerRound).toBe(3);
    // Same rates either way: only the weights moved.
    expect(p.bands[BAND_3_6]!.lossPerPutt).toBeCloseTo(0.88 - 0.6, 6);
  });

  test("a few rounds are not enough to replace the published lengths", () => {
    const p = buildPracticePlan({ putts: log, course: { rounds: 1, facedM: Array(18).fill(ft(25)) }, edgesM: EDGES, units: "imperial" });
    expect(p.frequency.source).toBe("published");
  });
});

test("the published first-putt shares (from memory, docs/sources.md) run from 0 to 1 and rise with length", () => {
  expect(publishedFirstPuttShareBelow(0)).toBe(0);
  expect(publishedFirstPuttShareBelow(ft(10))).toBeCloseTo(0.34, 12);
  expect(publishedFirstPuttShareBelow(ft(200))).toBe(1);
  fc.assert(
    fc.property(
      fc.double({ min: 0, max: 40, noNaN: true }),
      fc.double({ min: 0, max: 40, noNaN: true }),
      (a, b) => publishedFirstPuttShareBelow(Math.min(a, b)) <= publishedFirstPuttShareBelow(Math.max(a, b)),
    ),
  );
});

test("metric bands give rungs in tenths of a metre inside the band", () => {
  const p = buildPracticePlan({
    putts: tourLevelPlayer({ lengthFt: 8, n: 40, made: 8 }),
    course: noRounds,
    edgesM: DEFAULT_BAND_EDGES_M.metric,
    units: "metric",
  }) as PlanReady;
  expect(p.status).toBe("plan");
  // 8 ft = 2.44 m lies in the 2–3 m band.
  expect(p.targets).toEqual([2]);
  expect(p.ladder.rungs.map((r) => r.distanceM)).toEqual([2.2, 2.5, 2.8]);
});

test("the weekly volume gives each target length about 40 putts a week, in at least two sessions", () => {
  const rungs = (n: number, balls: number) =>
    Array.from({ length: n }, (_, i) => ({ distanceM: 1 + i, balls, passRule: { kind: "make" as const, made: 1 } }));
  // Two bands, 3 rungs of 4 balls each: 12 putts a band a session → 4 sessions (48 putts a band; 3 would give 36).
  expect(weeklyVolume({ name: "x", failRule: "repeat", rungs: rungs(6, 4) }, 2)).toEqual({
    sessions: 4,
    puttsPerSession: 24,
    puttsPerWeek: 96,
    puttsPerTargetBand: 48,
  });
  expect(weeklyVolume({ name: "x", failRule: "repeat", rungs: rungs(6, 10) }, 2).sessions).toBe(2);
});

describe("plan properties", () => {
  const logArb = fc.array(fc.record({ distanceM: fc.double({ min: 0.3, max: 20, noNaN: true }), holed: fc.boolean() }), {
    minLength: 0,
    maxLength: 300,
  });
  test("a plan targets at most two bands, each with a clear loss, and its ladder is valid", () => {
    fc.assert(
      fc.property(logArb, (log) => {
        const p = buildPracticePlan({ putts: log, course: noRounds, edgesM: EDGES, units: "imperial" });
        if (log.length < MIN_PLAN_PUTTS) return p.status === "log-more";
        if (p.status !== "plan") return true;
        return (
          p.targets.length <= 2 &&
          p.targets.every((i) => p.bands[i]!.clearLoss && p.bands[i]!.target) &&
          ladderInputSchema.safeParse(p.ladder).success
        );
      }),
      { numRuns: 60 },
    );
  });
});

describe("weekly check", () => {
  test("a week clearly better than before says so; a small change is not clear; no putts says so", () => {
    // Two-proportion z-test (textbook): 10/40 → 30/40 gives z ≈ 4.5, p < 0.001; 10/40 → 12/40 p ≈ 0.6.
    expect(weekMove({ attempts: 40, made: 10 }, { attempts: 40, made: 30 }).move).toBe("better");
    expect(weekMove({ attempts: 40, made: 30 }, { attempts: 40, made: 10 }).move).toBe("worse");
    expect(weekMove({ attempts: 40, made: 10 }, { attempts: 40, made: 12 }).move).toBe("not-clear");
    const none = weekMove({ attempts: 40, made: 10 }, { attempts: 0, made: 0 });
    expect(none).toMatchObject({ move: "no-putts", rate: null, ci95: null });
  });

  test("weeks run seven days from the start, the last one up to today", () => {
    const plan = buildPracticePlan({
      putts: tourLevelPlayer({ lengthFt: 8, n: 40, made: 8 }),
      course: noRounds,
      edgesM: EDGES,
      units: "imperial",
    }) as PlanReady;
    const log = [
      ...putts(8, 20, 4).map((p) => ({ ...p, day: "2026-11-20" })),
      ...putts(8, 20, 15).map((p) => ({ ...p, day: "2026-11-25" })),
      ...putts(8, 10, 5).map((p) => ({ ...p, day: "2026-12-02" })),
      ...putts(20, 10, 5).map((p) => ({ ...p, day: "2026-12-02" })),
    ];
    const c = weeklyCheck(plan, "2026-11-24", "2026-12-02", log);
    expect(c.before).toEqual([expect.objectContaining({ attempts: 20, made: 4 })]);
    expect(c.weeks.map((w) => [w.from, w.to])).toEqual([
      ["2026-11-24", "2026-11-30"],
      ["2026-12-01", "2026-12-02"],
    ]);
    expect(c.weeks[0]!.bands[0]).toMatchObject({ attempts: 20, made: 15, move: "better" });
    // The 20 ft putts are outside the target band and do not count.
    expect(c.weeks[1]!.bands[0]).toMatchObject({ attempts: 10, made: 5 });
  });
});
