// The quick estimate shown while the fall-line dial is dragged: physics' pure Monte Carlo on the shared seeded
// generator, run in a Web Worker (odds.worker.ts) so the page keeps its 60 fps. The committed answer always comes
// from POST /api/reads/make-probability.
import { makeProbability } from "#physics";
import type { Dispersion } from "#shared/schemas/make-probability";
import type { ReadRequest } from "#shared/schemas/reads";
import { seededUniform } from "#shared/seeded-random";

import { LIVE_SAMPLES } from "./live-samples";

export { LIVE_SAMPLES };

export type LiveOddsRequest = { id: number; read: ReadRequest; dispersion: Dispersion; seed: number; samples?: number };

export type LiveOdds =
  | {
      id: number;
      ok: true;
      makeProbability: number;
      makeProbabilityStandardError: number;
      secondPuttOver1mProbability: number;
      finishes: [number, number][];
      finishHoled: boolean[];
      samples: number;
    }
  | { id: number; ok: false; message: string };

/** The make probability of a read for a dispersion, with the first 100 finishes, as the worker answers it. */
export function simulateLiveOdds({ id, read, dispersion, seed, samples = LIVE_SAMPLES }: LiveOddsRequest): LiveOdds {
  const result = makeProbability({ ...read, dispersion, samples, random: seededUniform(seed), secondPuttM: 1, finishesKept: 100 });
  if (!result.ok) return { id, ok: false, message: result.message };
  const r = result.result;
  return {
    id,
    ok: true,
    makeProbability: r.makeProbability,
    makeProbabilityStandardError: r.makeProbabilityStandardError,
    secondPuttOver1mProbability: r.secondPuttOverProbability,
    finishes: r.finishes,
    finishHoled: r.finishHoled,
    samples,
  };
}
