// A make-probability answer shaped exactly as POST /api/reads/make-probability sends it (see
// server/routes/make-probability/make-probability.handlers.ts), for component tests.
import type { DispersionResponse, MakeProbabilityResponse } from "#shared/schemas/make-probability";

/** 100 finishes: the first `holed` in the hole at (0, 3), then misses spread round it, every fifth beyond 1 m. */
export function fakeFinishes(holed: number, distanceM = 3): { finishes: [number, number][]; finishHoled: boolean[] } {
  const finishes: [number, number][] = [];
  const finishHoled: boolean[] = [];
  for (let i = 0; i < 100; i++) {
    if (i < holed) {
      finishes.push([0, distanceM]);
      finishHoled.push(true);
    } else {
      const r = (i - holed) % 5 === 0 ? 1.3 : 0.4;
      const a = i * 0.7;
      finishes.push([r * Math.cos(a), distanceM + r * Math.sin(a)]);
      finishHoled.push(false);
    }
  }
  return { finishes, finishHoled };
}

const paceRead = { aimOffsetM: -0.27, startLineDeg: -5.2, launchSpeedMps: 1.94, entrySpeedMps: 0.67 };

export function fakeOdds(overrides: Partial<MakeProbabilityResponse> = {}): MakeProbabilityResponse {
  const { finishes, finishHoled } = fakeFinishes(34);
  return {
    makeProbability: 0.3412,
    makeProbabilityStandardError: 0.0047,
    logged: null,
    secondPuttOver1mProbability: 0.081,
    finishes,
    finishHoled,
    misses: {
      missProbability: 0.6588,
      shortProbability: 0.21,
      longProbability: 0.4488,
      leftProbability: 0.3,
      rightProbability: 0.3588,
      lipOutProbability: 0.04,
      meanLeaveM: 0.52,
      medianLeaveM: 0.44,
      p90LeaveM: 1.02,
    },
    bestPace: {
      rollPastM: 0.35,
      makeProbability: 0.3811,
      makeProbabilityStandardError: 0.0049,
      secondPuttOver1mProbability: 0.062,
      read: paceRead,
      meetsRiskLimit: true,
    },
    defaultPace: {
      rollPastM: 0.4318,
      makeProbability: 0.3412,
      makeProbabilityStandardError: 0.0047,
      secondPuttOver1mProbability: 0.081,
      read: paceRead,
    },
    paceCurve: [{ rollPastM: 0.35, makeProbability: 0.38, secondPuttOver1mProbability: 0.06 }],
    dispersion: { angleDeg: 1.43, pace: 0.11, source: "my-putts", putts: 212, usedPrior: false, readSlopePct: 0.5, greenLateralM: 0.02 },
    seed: 20_240_801,
    samples: 10_000,
    secondPuttRiskMax: 0.1,
    ...overrides,
  };
}

export function fakeDispersion(overrides: Partial<DispersionResponse> = {}): DispersionResponse {
  return {
    angleDeg: { estimate: 1.43, lo: 1.1, hi: 1.86 },
    pace: { estimate: 0.11, lo: 0.085, hi: 0.14 },
    rollPastM: { estimate: 0.41, lo: 0.3, hi: 0.52 },
    putts: 212,
    prior: { angleDeg: 1.2, pace: 0.12, angleDegRange: [0.45, 3.2], paceRange: [0.045, 0.32], why: "club golfer" },
    priorWeight: { angleDeg: 0.08, pace: 0.1 },
    usedPrior: false,
    ...overrides,
  };
}
