// The stats API's answers (server/routes/stats/stats.handlers.ts) and the parameters the page sends.
// The answers' types are the routes' response schemas (shared/schemas/stats.ts, rounds.ts): none is declared here.
import type { Page } from "#shared/schemas/sessions";
import type { RoundSummary } from "#shared/schemas/rounds";
import type {
  BandRate,
  Baseline,
  BaselineSeriesOut,
  Compare,
  CompareSide,
  MakeRates,
  MissBand,
  Misses,
  SessionStat,
  SessionStats,
  StatSource,
  Trend,
} from "#shared/schemas/stats";
import type { Rate } from "#shared/stats/wilson";

export type {
  BandRate,
  Baseline,
  BaselineSeriesOut,
  Compare,
  CompareSide,
  MakeRates,
  MissBand,
  Misses,
  Rate,
  RoundSummary,
  SessionStat,
  SessionStats,
  StatSource,
  Trend,
};
/** The sessions and rounds lists take a date range and, for a coach, the player's id. */
export type PlayerRange = { from?: string; to?: string; playerId?: string };
export type RoundList = Page<RoundSummary>;

/** `bands` is the comma-separated edge list in metres, or absent for the unit's defaults. */
export type StatsParams = { from?: string; to?: string; bands?: string; source: StatSource; playerId?: string };
export type TrendParams = StatsParams & { window: "week" | "rolling"; windowWeeks?: number };
export type CompareParams = {
  aFrom: string;
  aTo: string;
  bFrom: string;
  bTo: string;
  bands?: string;
  source: StatSource;
  playerId?: string;
};
