// The weekly check of a running practice plan (shared/practice-plan.ts builds the plan): each target band's putts
// that week against the weeks before the plan, with a Wilson interval and a two-proportion z-test.
import { inBand, type PlanPutt } from "./practice-plan";
import type { Band } from "./stats/bands";
import { twoProportionZTest } from "./stats/two-proportion";
import { wilsonInterval } from "./stats/wilson";
import type { BandMove, PlanReady, PlanWeek, WeekBand } from "./schemas/practice-plan";

/** Attempts of one band in a period. */
export type BandCount = { attempts: number; made: number };

/**
 * Whether a target band moved in a week against the weeks before the plan: the week's rate with its Wilson interval,
 * and the two-proportion z-test (p < 0.05 two-sided: "better" or "worse"; otherwise "not clear").
 */
export function weekMove(
  before: BandCount,
  week: BandCount,
): Pick<WeekBand, "attempts" | "made" | "rate" | "ci95" | "difference" | "pValue" | "move"> {
  const t = twoProportionZTest(before.made, before.attempts, week.made, week.attempts);
  let move: BandMove = "not-clear";
  if (week.attempts === 0) move = "no-putts";
  else if (t.pValue !== null && t.pValue < 0.05 && t.difference !== null) move = t.difference > 0 ? "better" : "worse";
  return {
    attempts: week.attempts,
    made: week.made,
    rate: week.attempts === 0 ? null : week.made / week.attempts,
    ci95: wilsonInterval(week.made, week.attempts),
    difference: t.difference,
    pValue: t.pValue,
    move,
  };
}

/** Adds days to an ISO date (UTC). */
export function addDays(isoDate: string, days: number): string {
  const d = new Date(`${isoDate}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/**
 * The weekly check of a running plan: week k covers startedOn + 7(k−1) … + 6 (up to `today`); each target band's
 * attempts that week against the same band over the window before the start.
 */
export function weeklyCheck(
  plan: PlanReady,
  startedOn: string,
  today: string,
  putts: readonly (PlanPutt & { day: string })[],
): { before: Pick<WeekBand, "fromM" | "toM" | "attempts" | "made" | "rate" | "ci95">[]; weeks: PlanWeek[] } {
  const targets = plan.targets.map((i) => plan.bands[i]!);
  const count = (b: Band, from: string | null, to: string): BandCount => {
    const ps = putts.filter((p) => (from === null || p.day >= from) && p.day <= to && inBand(p.distanceM, b));
    return { attempts: ps.length, made: ps.filter((p) => p.holed).length };
  };
  const dayBefore = addDays(startedOn, -1);
  const beforeCounts = targets.map((b) => count(b, null, dayBefore));
  const before = targets.map((b, i) => {
    const c = beforeCounts[i]!;
    return {
      fromM: b.fromM,
      toM: b.toM,
      attempts: c.attempts,
      made: c.made,
      rate: c.attempts === 0 ? null : c.made / c.attempts,
      ci95: wilsonInterval(c.made, c.attempts),
    };
  });
  const weeks: PlanWeek[] = [];
  for (let k = 1, from = startedOn; from <= today; k++, from = addDays(from, 7)) {
    const end = addDays(from, 6);
    const to = end < today ? end : today;
    weeks.push({
      week: k,
      from,
      to,
      bands: targets.map((b, i) => ({ fromM: b.fromM, toM: b.toM, ...weekMove(beforeCounts[i]!, count(b, from, to)) })),
    });
  }
  return { before, weeks };
}
