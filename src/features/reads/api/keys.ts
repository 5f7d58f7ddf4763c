// Query keys for reads. Mutations invalidate `readsKeys.saved()`; everything here sits under `readsKeys.all`.
import type { ChartRequest, ReadRequest } from "#shared/schemas/reads";

export const readsKeys = {
  all: ["reads"] as const,
  solves: () => [...readsKeys.all, "solve"] as const,
  solve: (input: ReadRequest | null) => [...readsKeys.solves(), input] as const,
  chart: (input: ChartRequest | null) => [...readsKeys.all, "chart", input] as const,
  saved: () => [...readsKeys.all, "saved"] as const,
  greens: () => [...readsKeys.all, "greens"] as const,
};
