// Plain words for the practice plan's numbers, in the user's units.
import type { BandMove, PlanBand } from "#shared/schemas/practice-plan";
import type { FailRule, PassRule } from "#shared/schemas/ladders";
import { longUnitLabel, toLongUnit, type UnitSystem } from "#shared/units";

const round1 = (x: number) => Math.round(x * 10) / 10;

/** "6–10 ft", "30+ ft", "2–3 m". */
export function bandLabel(b: { fromM: number; toM: number | null }, units: UnitSystem): string {
  const f = (m: number) => round1(toLongUnit(m, units));
  return b.toM === null ? `${f(b.fromM)}+ ${longUnitLabel(units)}` : `${f(b.fromM)}–${f(b.toM)} ${longUnitLabel(units)}`;
}

/**
 * The plan's ladder's name in the reader's units: "Practice plan: 6–10 ft and 10–15 ft". The server names it in the
 * player's units; a coach (or the player, since) in other units would read feet among metres (issue 18).
 */
export function planLadderName(
  plan: { bands: readonly { fromM: number; toM: number | null }[]; targets: readonly number[] },
  units: UnitSystem,
): string {
  return `Practice plan: ${plan.targets.map((i) => bandLabel(plan.bands[i]!, units)).join(" and ")}`;
}

export const pct = (x: number) => `${Math.round(x * 100)} %`;

/** "20 % (11–35 %)" or "no putts". */
export function rateWithRange(rate: number | null, ci95: readonly [number, number] | null): string {
  if (rate === null || ci95 === null) return "no putts";
  return `${pct(rate)} (${Math.round(ci95[0] * 100)}–${Math.round(ci95[1] * 100)} %)`;
}

/** Strokes a round, signed words: "0.76 lost", "0.10 gained". */
export function strokesWords(strokesPerRound: number | null): string {
  if (strokesPerRound === null) return "—";
  return strokesPerRound >= 0 ? `${strokesPerRound.toFixed(2)} lost` : `${(-strokesPerRound).toFixed(2)} gained`;
}

export function bandVerdict(b: PlanBand): string {
  if (b.attempts === 0) return "Not logged";
  if (!b.judged) return "Too few putts to judge";
  if (b.clearLoss) return b.target ? "Clear loss: in the plan" : "Clear loss";
  return "Within the range";
}

export function passRuleText(rule: PassRule, balls: number): string {
  return rule.kind === "make" ? `hole ${rule.made} of ${balls}` : `hole ${rule.count} in a row (${balls} balls)`;
}

export const FAIL_RULE_TEXT: Record<FailRule, string> = {
  repeat: "A missed rung is played again.",
  "drop-one": "A missed rung sends you down one rung.",
  restart: "A missed rung sends you back to the first.",
};

export const MOVE_TEXT: Record<BandMove, string> = {
  better: "Better — clear of chance",
  worse: "Worse — clear of chance",
  "not-clear": "No clear change yet",
  "no-putts": "No putts at this length",
};
