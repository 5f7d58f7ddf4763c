// Query keys for the personal make probability. Everything sits under `makeProbabilityKeys.all`, so logging putts
// elsewhere can invalidate it by that prefix.
import type { ReadRequest } from "#shared/schemas/reads";

export const makeProbabilityKeys = {
  all: ["make-probability"] as const,
  odds: (read: ReadRequest | null, seed: number) => [...makeProbabilityKeys.all, "odds", read, seed] as const,
  dispersion: () => [...makeProbabilityKeys.all, "dispersion"] as const,
};
