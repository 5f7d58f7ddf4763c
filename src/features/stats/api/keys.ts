// Query keys for the make-rate statistics; everything sits under `statsKeys.all`.
import type { CompareParams, StatsParams, TrendParams } from "./types";

export const statsKeys = {
  all: ["stats"] as const,
  makeRates: (p: StatsParams) => [...statsKeys.all, "make-rates", p] as const,
  trend: (p: TrendParams) => [...statsKeys.all, "trend", p] as const,
  compare: (p: CompareParams) => [...statsKeys.all, "compare", p] as const,
  baseline: () => [...statsKeys.all, "baseline"] as const,
  sessions: (p: { from?: string; to?: string; playerId?: string }) => [...statsKeys.all, "sessions", p] as const,
  misses: (p: { from?: string; to?: string; bands?: string; playerId?: string }) => [...statsKeys.all, "misses", p] as const,
  rounds: (p: { from?: string; to?: string; playerId?: string }) => [...statsKeys.all, "rounds", p] as const,
};
