import { formatLength, type UnitSystem } from "../../../../shared/units";

/** A roll-past for people: "45 cm" or "1 ft 6 in"; 0 reads "0 cm" / "0 in". */
export function rollPastWords(m: number, units: UnitSystem): string {
  if (units === "metric") return `${Math.round(m * 100)} cm`;
  return m < 0.0127 ? "0 in" : formatLength(m, units);
}

/** Where a roll-past sits between dying and firm, in words. */
export function paceFeel(rollPastM: number): string {
  if (rollPastM < 0.05) return "dying: just reaches the hole";
  if (rollPastM < 0.3) return "soft";
  if (rollPastM < 0.7) return "a makeable pace";
  if (rollPastM < 1.1) return "firm";
  return "very firm";
}
