/**
 * Every unit conversion lives here. Storage and computation are SI; Stimp stays in feet,
 * as the trade quotes it.
 */
export const UNIT_SYSTEMS = ["imperial", "metric"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

import { FOOT_M } from "../physics/constants";

/** International foot (exact by definition, 1959): physics/constants.ts's FOOT_M, the one source. */
export const METRES_PER_FOOT = FOOT_M;
export const METRES_PER_INCH = 0.0254;
/** Hole diameter from the Rules of Golf, Definitions "Hole": 4.25 in = 107.95 mm (one constant, in physics/). */
import { HOLE_DIAMETER_M } from "../physics/constants";
export { HOLE_DIAMETER_M };

export function feetToMetres(ft: number): number {
  return ft * METRES_PER_FOOT;
}
export function metresToFeet(m: number): number {
  return m / METRES_PER_FOOT;
}
export function inchesToMetres(inches: number): number {
  return inches * METRES_PER_INCH;
}
export function metresToInches(m: number): number {
  return m / METRES_PER_INCH;
}
export function metresToHoleWidths(m: number): number {
  return m / HOLE_DIAMETER_M;
}

/** A long distance (putt length) in the user's unit: feet or metres. */
export function toLongUnit(m: number, units: UnitSystem): number {
  return units === "imperial" ? metresToFeet(m) : m;
}
export function fromLongUnit(value: number, units: UnitSystem): number {
  return units === "imperial" ? feetToMetres(value) : value;
}
/** A short distance (aim offset, miss length) in the user's unit: inches or centimetres. */
export function toShortUnit(m: number, units: UnitSystem): number {
  return units === "imperial" ? metresToInches(m) : m * 100;
}
export function fromShortUnit(value: number, units: UnitSystem): number {
  return units === "imperial" ? inchesToMetres(value) : value / 100;
}
export function longUnitLabel(units: UnitSystem): "ft" | "m" {
  return units === "imperial" ? "ft" : "m";
}
export function shortUnitLabel(units: UnitSystem): "in" | "cm" {
  return units === "imperial" ? "in" : "cm";
}

/** "12 ft 4 in" or "3.76 m" — a putt length for people. */
export function formatLength(m: number, units: UnitSystem): string {
  if (units === "metric") return `${m.toFixed(m < 10 ? 2 : 1)} m`;
  const totalInches = Math.round(metresToInches(Math.abs(m)));
  const ft = Math.floor(totalInches / 12);
  const inches = totalInches % 12;
  const sign = m < 0 ? "-" : "";
  if (ft === 0) return `${sign}${inches} in`;
  return inches === 0 ? `${sign}${ft} ft` : `${sign}${ft} ft ${inches} in`;
}

/** "14 in" or "36 cm" — an aim offset or miss length for people. */
export function formatShort(m: number, units: UnitSystem): string {
  const v = toShortUnit(Math.abs(m), units);
  return `${v < 10 ? v.toFixed(1) : Math.round(v)} ${shortUnitLabel(units)}`;
}

/** Metres per second in feet per second. */
export function mpsToFtps(mps: number): number {
  return mps / METRES_PER_FOOT;
}

/**
 * The one parser for a number a person typed or a link carried: " 3.5 ", "3,5" (comma decimals) and "+2" are
 * numbers; "", "0x1A", "1e3", "Infinity", "3.5 ft" and "1,234.5" are not (null). Never `Number(text)`, which turns
 * "0x1A" into 26 and "" into 0.
 */
export function parseDecimal(text: string | null | undefined): number | null {
  if (text === null || text === undefined) return null;
  const t = text.trim().replace(",", ".");
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  const n = Number.parseFloat(t);
  return Number.isFinite(n) ? n : null;
}
