// Words for a logged putt and for a session's running tally.
import type { BreakType, MissSide } from "#shared/schemas/putts";
import { formatLength, formatShort, type UnitSystem } from "#shared/units";

export const BREAK_LABELS: Record<BreakType, string> = {
  uphill: "Uphill",
  downhill: "Downhill",
  "left-to-right": "Left-to-right",
  "right-to-left": "Right-to-left",
  straight: "Straight",
};

export type PuttLike = {
  distanceM: number;
  holed: boolean;
  missSide: MissSide | null;
  missLengthM: number | null;
  breakType: BreakType | null;
};

/** "left, 30 cm short" / "12 in long" / "" for a miss without details. */
export function missText(p: Pick<PuttLike, "missSide" | "missLengthM">, units: UnitSystem): string {
  const parts: string[] = [];
  if (p.missSide) parts.push(p.missSide);
  if (p.missLengthM !== null && p.missLengthM !== 0)
    parts.push(`${formatShort(p.missLengthM, units)} ${p.missLengthM < 0 ? "short" : "long"}`);
  return parts.join(", ");
}

/** "Holed" / "Missed left, 30 cm short". */
export function resultText(p: PuttLike, units: UnitSystem): string {
  if (p.holed) return "Holed";
  const miss = missText(p, units);
  return miss ? `Missed ${miss}` : "Missed";
}

/** One line for a list: "8 ft · Missed left, 12 in long · Uphill". */
export function puttLine(p: PuttLike, units: UnitSystem): string {
  return [formatLength(p.distanceM, units), resultText(p, units), p.breakType ? BREAK_LABELS[p.breakType] : null]
    .filter(Boolean)
    .join(" · ");
}

export type Tally = { putts: number; holed: number; rate: number | null };

export function tally(putts: ReadonlyArray<{ holed: boolean }>): Tally {
  const holed = putts.filter((p) => p.holed).length;
  return { putts: putts.length, holed, rate: putts.length === 0 ? null : holed / putts.length };
}

/** "67 %" or "–". */
export function percent(rate: number | null, digits = 0): string {
  return rate === null ? "–" : `${(rate * 100).toFixed(digits)} %`;
}

/** "3 putts waiting to be saved" / "1 putt waiting to be saved". */
export function waitingText(n: number): string {
  return `${n} ${n === 1 ? "putt" : "putts"} waiting to be saved`;
}
