import { toLongUnit, longUnitLabel, type UnitSystem } from "#shared/units";

function edge(m: number, units: UnitSystem): string {
  return String(Math.round(toLongUnit(m, units) * 10) / 10);
}

/** A distance band for people: "3–6 ft", "10+ m". */
export function bandLabel(fromM: number, toM: number | null, units: UnitSystem): string {
  const unit = longUnitLabel(units);
  if (toM === null) return `${edge(fromM, units)}+ ${unit}`;
  return `${edge(fromM, units)}–${edge(toM, units)} ${unit}`;
}
