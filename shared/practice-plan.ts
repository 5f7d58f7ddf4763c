/**
 * The practice plan (issue 17): from a player's logged putts, the distance bands where they lose the most strokes
 * against the tour baseline, weighted by how often they face putts of that length on the course, and only where the
 * loss is clear of its interval; then a ladder built for those bands, a weekly volume and a read-training level.
 * Pure: no clock, no I/O. The server feeds it the log; `weeklyCheck` says whether the target bands moved.
 *
 * Strokes lost per putt in a band = the tour's one-putt rate over the same lengths − the player's make rate: a miss
 * costs one more putt than a make [derived from the strokes-gained definition, Broadie 2012, with the leave's own
 * cost left out — docs/sources.md, "Practice plan"]. Its interval comes from the Wilson interval of the make rate.
 */
import { bandsFromEdges, type Band } from "./stats/bands";
import { tourOnePuttRate } from "./stats/baseline";
import { wilsonInterval } from "./stats/wilson";
import type { LadderInput, Rung } from "./schemas/ladders";
import type { PlanBand, PlanProposal, PlanReady, WeeklyVolume } from "./schemas/practice-plan";
import { TRAINING_LEVELS, type TrainingLevelId } from "./training";
import { METRES_PER_FOOT, toLongUnit, longUnitLabel, type UnitSystem } from "./units";

/** Fewer putts than this in the window: "log more first", no plan. */
export const MIN_PLAN_PUTTS = 80;
/** A band is judged only with at least this many putts in it. */
export const MIN_BAND_ATTEMPTS = 15;
/** The player's own rounds weigh the bands once they hold at least this many putts faced (two rounds' first putts). */
export const MIN_COURSE_PUTTS = 36;
/** A plan works on at most this many bands (the costliest). */
export const MAX_TARGET_BANDS = 2;
export const RUNGS_PER_BAND = 3;
/**
 * Putts a week wanted at each target length: about 40, so that a rise of some 20 percentage points in a band's make
 * rate is clear of chance after two or three weeks (two-proportion test at 95 %, normal approximation [derived]).
 */
export const WEEKLY_PUTTS_PER_TARGET_BAND = 40;
/** Sessions a week: at least two, more when one run of the ladder a session would not give each band its putts. */
export const MIN_SESSIONS_PER_WEEK = 2;
/** A band's last edge when it is open-ended (the ladder needs a top): 1.5 × its lower edge, at most 25 m. */
const OPEN_BAND_FACTOR = 1.5;
/** Holes in a round: the published distribution is of first putts, one a hole putted. */
export const HOLES_PER_ROUND = 18;

/**
 * Share of a club golfer's first putts on the course shorter than each length, ft — used when the player has logged
 * too few rounds. [memory: the shape of amateur first-putt lengths as shot-tracking summaries describe it (about a
 * third inside 10 ft, about half inside 15–20 ft, a fifth beyond 30 ft); not a published table — docs/sources.md,
 * "Practice plan"]. Linear between points; 1 beyond the last.
 */
export const PUBLISHED_FIRST_PUTT_CDF: readonly { ft: number; share: number }[] = [
  { ft: 0, share: 0 },
  { ft: 3, share: 0.08 },
  { ft: 6, share: 0.2 },
  { ft: 10, share: 0.34 },
  { ft: 15, share: 0.49 },
  { ft: 20, share: 0.61 },
  { ft: 30, share: 0.79 },
  { ft: 45, share: 0.93 },
  { ft: 60, share: 0.98 },
  { ft: 90, share: 1 },
];

/** Share of first putts shorter than distanceM by the published (from memory) distribution. */
export function publishedFirstPuttShareBelow(distanceM: number): number {
  const ft = distanceM / METRES_PER_FOOT;
  const pts = PUBLISHED_FIRST_PUTT_CDF;
  if (ft <= 0) return 0;
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1]!;
    const b = pts[i]!;
    if (ft <= b.ft) return a.share + ((ft - a.ft) / (b.ft - a.ft)) * (b.share - a.share);
  }
  return 1;
}

export type PlanPutt = { distanceM: number; holed: boolean };
export type PlanInput = {
  /** Every attempt from a known length in the window: practice putts, and each hole's first putt (one-putt = holed). */
  putts: readonly PlanPutt[];
  /** The course: rounds logged and the lengths of the putts faced in them (first putts, and second putts when known). */
  course: { rounds: number; facedM: readonly number[] };
  /** Band edges, m (inner boundaries, as the make rates use them). */
  edgesM: readonly number[];
  units: UnitSystem;
};

/** Whether a distance (m) falls in the band (its lower edge in, its upper edge out). */
export function inBand(d: number, b: Band): boolean {
  return d >= b.fromM && (b.toM === null || d < b.toM);
}

function bandTop(b: Band): number {
  return b.toM ?? Math.min(25, b.fromM * OPEN_BAND_FACTOR);
}

function bandWords(b: Band, units: UnitSystem): string {
  const f = (m: number) => Math.round(toLongUnit(m, units) * 10) / 10;
  return b.toM === null ? `${f(b.fromM)}+ ${longUnitLabel(units)}` : `${f(b.fromM)}–${f(b.toM)} ${longUnitLabel(units)}`;
}

/** The per-band analysis: make rate and interval, the baseline over the same lengths, the loss and its weight. */
export function analyseBands(input: PlanInput): { bands: PlanBand[]; frequency: PlanProposal["frequency"] } {
  const bands = bandsFromEdges(input.edgesM);
  const own = input.course.facedM.length >= MIN_COURSE_PUTTS && input.course.rounds > 0;
  const shares = bands.map((b) =>
    own
      ? input.course.facedM.filter((d) => inBand(d, b)).length / input.course.facedM.length
      : publishedFirstPuttShareBelow(b.toM ?? Number.POSITIVE_INFINITY) - publishedFirstPuttShareBelow(b.fromM),
  );
  const facedPerRound = bands.map((b, i) =>
    own ? input.course.facedM.filter((d) => inBand(d, b)).length / input.course.rounds : shares[i]! * HOLES_PER_ROUND,
  );
  const out = bands.map((b, i): PlanBand => {
    const ps = input.putts.filter((p) => inBand(p.distanceM, b));
    const attempts = ps.length;
    const made = ps.filter((p) => p.holed).length;
    const baselineRate =
      attempts > 0 ? ps.reduce((s, p) => s + tourOnePuttRate(p.distanceM), 0) / attempts : tourOnePuttRate((b.fromM + bandTop(b)) / 2);
    const ci95 = wilsonInterval(made, attempts);
    const rate = attempts > 0 ? made / attempts : null;
    const lossPerPutt = rate === null ? null : baselineRate - rate;
    const lossCi95: [number, number] | null = ci95 === null ? null : [baselineRate - ci95[1], baselineRate - ci95[0]];
    const judged = attempts >= MIN_BAND_ATTEMPTS;
    return {
      fromM: b.fromM,
      toM: b.toM,
      attempts,
      made,
      rate,
      ci95,
      baselineRate,
      lossPerPutt,
      lossCi95,
      courseShare: Math.min(1, Math.max(0, shares[i]!)),
      facedPerRound: facedPerRound[i]!,
      strokesPerRound: lossPerPutt === null ? null : lossPerPutt * facedPerRound[i]!,
      judged,
      clearLoss: judged && lossCi95 !== null && lossCi95[0] > 0,
      target: false,
    };
  });
  const frequency = {
    source: own ? ("rounds" as const) : ("published" as const),
    coursePutts: input.course.facedM.length,
    rounds: input.course.rounds,
    note: own
      ? `Weighted by the ${input.course.facedM.length} putts faced in ${input.course.rounds} logged round${input.course.rounds === 1 ? "" : "s"}.`
      : `Fewer than ${MIN_COURSE_PUTTS} putts from logged rounds, so the bands are weighted by a typical club golfer's first-putt lengths (from memory, not a published table).`,
  };
  return { bands: out, frequency };
}

/** Rung lengths inside a band: RUNGS_PER_BAND evenly spread, rounded to whole feet or tenths of a metre. */
function rungLengths(b: Band, units: UnitSystem): number[] {
  const top = bandTop(b);
  const out: number[] = [];
  for (let k = 0; k < RUNGS_PER_BAND; k++) {
    const raw = b.fromM + ((k + 0.5) / RUNGS_PER_BAND) * (top - b.fromM);
    const rounded = units === "imperial" ? Math.round(raw / METRES_PER_FOOT) * METRES_PER_FOOT : Math.round(raw * 10) / 10;
    const d = Math.min(30, Math.max(0.3, Math.round(rounded * 100) / 100));
    if (!out.some((x) => Math.abs(x - d) < 0.01)) out.push(d);
  }
  return out;
}

/**
 * A rung's pass rule: hole the share halfway between the player's present rate at that length (the tour's rate less
 * the band's loss) and the tour's — a stretch that can be met. At least one ball.
 */
function rungFor(distanceM: number, band: PlanBand, units: UnitSystem): Rung {
  const balls = distanceM < 3 ? 10 : 8;
  const tour = tourOnePuttRate(distanceM);
  const goal = Math.max(0.05, tour - (band.lossPerPutt ?? 0) / 2);
  const made = Math.min(balls, Math.max(1, Math.round(goal * balls)));
  return {
    distanceM,
    balls,
    passRule: { kind: "make", made },
    note: `From your plan: ${bandWords(band, units)} costs about ${(band.strokesPerRound ?? 0).toFixed(2)} strokes a round`,
  };
}

/** The read-training level whose putt lengths cover the target bands best (ties: the gentler level). */
export function trainingLevelFor(targets: readonly PlanBand[]): TrainingLevelId {
  const lo = Math.min(...targets.map((b) => b.fromM));
  const hi = Math.max(...targets.map((b) => bandTop(b)));
  const order: TrainingLevelId[] = ["gentle", "club", "testing"];
  let best: TrainingLevelId = "club";
  let bestOverlap = -1;
  for (const id of order) {
    const [a, z] = TRAINING_LEVELS[id].distanceM;
    const overlap = Math.max(0, Math.min(hi, z) - Math.max(lo, a)) / Math.max(1e-9, hi - lo);
    if (overlap > bestOverlap + 1e-9) {
      best = id;
      bestOverlap = overlap;
    }
  }
  return best;
}

/** One run of the ladder a session; enough sessions for WEEKLY_PUTTS_PER_TARGET_BAND putts at each target length. */
export function weeklyVolume(ladder: LadderInput, targetCount: number): WeeklyVolume {
  const puttsPerSession = ladder.rungs.reduce((s, r) => s + r.balls, 0);
  const perBandPerSession = puttsPerSession / targetCount;
  const sessions = Math.max(MIN_SESSIONS_PER_WEEK, Math.ceil(WEEKLY_PUTTS_PER_TARGET_BAND / perBandPerSession));
  const puttsPerWeek = puttsPerSession * sessions;
  return { sessions, puttsPerSession, puttsPerWeek, puttsPerTargetBand: Math.round(puttsPerWeek / targetCount) };
}

/**
 * The plan from a player's log: "log more first" with too few putts; "no clear loss" when no band's loss is clear of
 * its interval; else a plan for the (at most two) bands that cost the most strokes a round.
 * @example buildPracticePlan({ putts, course: { rounds: 0, facedM: [] }, edgesM: DEFAULT_BAND_EDGES_M.imperial, units: "imperial" })
 */
export function buildPracticePlan(input: PlanInput): PlanProposal {
  const { bands, frequency } = analyseBands(input);
  const puttsLogged = input.putts.length;
  const base = { puttsLogged, bands, frequency };
  const judged = bands.filter((b) => b.judged).length;
  if (puttsLogged < MIN_PLAN_PUTTS || judged === 0) {
    const need = Math.max(MIN_PLAN_PUTTS - puttsLogged, judged === 0 ? MIN_BAND_ATTEMPTS : 0);
    return {
      status: "log-more",
      puttsNeeded: need,
      message: `Log more first: ${puttsLogged} putt${puttsLogged === 1 ? "" : "s"} so far; about ${need} more (at least ${MIN_BAND_ATTEMPTS} at a length) before a plan can tell where the strokes go.`,
      ...base,
    };
  }
  const ranked = bands
    .map((b, i) => ({ b, i }))
    .filter(({ b }) => b.clearLoss && (b.strokesPerRound ?? 0) > 0)
    .sort((x, y) => y.b.strokesPerRound! - x.b.strokesPerRound! || x.i - y.i);
  if (ranked.length === 0) {
    return {
      status: "no-clear-loss",
      message:
        "No length stands out: at every length you have logged enough of, your make rate is within reach of the tour's. Keep practising a mix and check back.",
      ...base,
    };
  }
  const targets = ranked.slice(0, MAX_TARGET_BANDS).map((r) => r.i);
  const marked = bands.map((b, i) => ({ ...b, target: targets.includes(i) }));
  const targetBands = targets.map((i) => marked[i]!);
  // The ladder runs short to long, as ladders do.
  const rungs = [...targetBands]
    .sort((a, b) => a.fromM - b.fromM)
    .flatMap((b) => rungLengths(b, input.units).map((d) => rungFor(d, b, input.units)));
  const words = targetBands.map((b) => bandWords(b, input.units));
  const ladder: LadderInput = {
    name: `Practice plan: ${words.join(" and ")}`.slice(0, 80),
    description: `Built from where your strokes go: ${targetBands
      .map((b) => `${bandWords(b, input.units)} costs about ${b.strokesPerRound!.toFixed(2)} strokes a round`)
      .join("; ")}.`.slice(0, 500),
    failRule: "drop-one",
    rungs,
  };
  const plan: PlanReady = {
    status: "plan",
    message: `Work on ${words.join(" and ")}: that is where you lose the most strokes a round against the tour, and the loss is clear of its interval.`,
    ...base,
    bands: marked,
    targets,
    ladder,
    weekly: weeklyVolume(ladder, targets.length),
    trainingLevel: trainingLevelFor(targetBands),
    units: input.units,
  };
  return plan;
}
