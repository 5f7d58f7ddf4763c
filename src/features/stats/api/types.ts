// The stats API's answers (server/routes/stats/stats.handlers.ts) and the parameters the page sends.
import type { BandRate, MakeRates, MissBand, Misses, StatSource } from "../../../../shared/schemas/stats";
import type { Rate } from "../../../../shared/stats/wilson";

export type { BandRate, MakeRates, MissBand, Misses, Rate, StatSource };
/** The sessions and rounds lists take a date range and, for a coach, the player's id. */
export type PlayerRange = { from?: string; to?: string; playerId?: string };
export type RoundSummary = { id: string; date: string; course: string | null; totals: { holes: number; putts: number; expectedPutts: number; strokesGained: number; onePutts: number; threePutts: number } };
export type RoundList = { items: RoundSummary[]; total: number };

/** `bands` is the comma-separated edge list in metres, or absent for the unit's defaults. */
export type StatsParams = { from?: string; to?: string; bands?: string; source: StatSource; playerId?: string };
export type TrendParams = StatsParams & { window: "week" | "rolling"; windowWeeks?: number };
export type CompareParams = { aFrom: string; aTo: string; bFrom: string; bTo: string; bands?: string; source: StatSource; playerId?: string };

export type Trend = {
  window: "week" | "rolling";
  windowWeeks: number;
  bands: { fromM: number; toM: number | null }[];
  weeks: { weekStart: string; bands: Rate[] }[];
};

export type CompareSide = { a: Rate; b: Rate; difference: number | null; z: number | null; pValue: number | null };
export type Compare = {
  a: { from: string; to: string };
  b: { from: string; to: string };
  overlap: boolean;
  bands: (CompareSide & { fromM: number; toM: number | null })[];
  overall: CompareSide;
};

export type BaselineSeriesOut = { label: string; source: string; firmness: string; points: { distanceFt: number; distanceM: number; value: number }[] };
export type Baseline = {
  onePuttRate: BaselineSeriesOut;
  expectedPutts: BaselineSeriesOut;
  interpolation: string;
  strokesGained: { definition: string; unknownLeave: string; longPuttM: number; threePuttRangeM: number };
};

export type SessionStat = {
  sessionId: string;
  date: string;
  greenName: string | null;
  stimpFt: number | null;
  putts: number;
  holed: number;
  expectedPutts: number;
  puttsTaken: number;
  strokesGained: number;
  leavesAssumed: number;
  longPutts: number;
  longPuttsKnown: number;
  longLagsOutside1m: number;
  longLagOutsideShare: number | null;
};
export type SessionStats = { items: SessionStat[]; total: number; page: number; pageSize: number };
