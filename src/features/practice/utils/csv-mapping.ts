// The CSV import's column mapping as the screen edits it, and what the server's answer means for the player.
import type { CsvMapping, CsvPreview, CsvRowError } from "#shared/schemas/putts";
import { ApiError } from "../../../lib/api-client";

export type ColumnField = "date" | "distance" | "holed" | "missSide" | "missLength" | "breakType" | "green" | "session";

export const COLUMN_FIELDS: ReadonlyArray<{ key: ColumnField; label: string; required: boolean; hint: string }> = [
  { key: "date", label: "Day", required: true, hint: "YYYY-MM-DD" },
  { key: "distance", label: "Distance", required: true, hint: "a number, in the unit chosen below" },
  { key: "holed", label: "Holed", required: true, hint: "yes/no, true/false, 1/0 or holed/missed" },
  { key: "missSide", label: "Miss side", required: false, hint: "left or right" },
  { key: "missLength", label: "Miss length", required: false, hint: "negative = short of the hole" },
  { key: "breakType", label: "Break", required: false, hint: "uphill, downhill, left-to-right, right-to-left, straight" },
  { key: "green", label: "Green", required: false, hint: "a name; new names become greens" },
  { key: "session", label: "Session", required: false, hint: "groups rows into sessions (else day + green)" },
];

export type MappingState = Record<ColumnField, string> & { distanceUnit: "ft" | "m"; missLengthUnit: "" | "m" | "cm" | "ft" | "in" };

/** The selects start from the server's suggestion; a suggested column the file lacks is dropped. */
export function initialMapping(preview: Pick<CsvPreview, "headers" | "suggestedMapping">, fallbackUnit: "ft" | "m"): MappingState {
  const s = preview.suggestedMapping;
  const pick = (k: ColumnField) => {
    const v = s[k];
    return typeof v === "string" && preview.headers.includes(v) ? v : "";
  };
  return {
    date: pick("date"),
    distance: pick("distance"),
    holed: pick("holed"),
    missSide: pick("missSide"),
    missLength: pick("missLength"),
    breakType: pick("breakType"),
    green: pick("green"),
    session: pick("session"),
    distanceUnit: s.distanceUnit ?? fallbackUnit,
    missLengthUnit: s.missLengthUnit ?? "",
  };
}

export type MappingCheck = { ok: true; mapping: CsvMapping } | { ok: false; missing: string[]; duplicates: string[] };

/** The mapping to send, or which required fields are unmapped and which columns are used twice. */
export function toCsvMapping(state: MappingState): MappingCheck {
  const missing = COLUMN_FIELDS.filter((f) => f.required && !state[f.key]).map((f) => f.label);
  const used = COLUMN_FIELDS.map((f) => state[f.key]).filter(Boolean);
  const duplicates = [...new Set(used.filter((c, i) => used.indexOf(c) !== i))];
  if (missing.length > 0 || duplicates.length > 0) return { ok: false, missing, duplicates };
  const mapping: CsvMapping = { date: state.date, distance: state.distance, distanceUnit: state.distanceUnit, holed: state.holed };
  for (const f of ["missSide", "missLength", "breakType", "green", "session"] as const) if (state[f]) mapping[f] = state[f];
  if (state.missLength && state.missLengthUnit) mapping.missLengthUnit = state.missLengthUnit;
  return { ok: true, mapping };
}

/** Rows without any error: what "import the valid rows only" would store. */
export function validRowCount(rowCount: number, errors: ReadonlyArray<CsvRowError>): number {
  return Math.max(0, rowCount - new Set(errors.map((e) => e.row)).size);
}

/** The mapping's field names as the player saw them ("missLength" → "Miss length"). */
export function fieldLabel(field: string): string {
  if (field === "row") return "whole row";
  return COLUMN_FIELDS.find((f) => f.key === field)?.label ?? field;
}

/** Plain words for an upload the server refused. */
export function uploadProblem(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 413) return "That file is too large: the limit is 1 MB. Split it into smaller files and import them one by one.";
    if (error.status === 415)
      return "That file is not a CSV. In your spreadsheet choose Save as / Download as “CSV (UTF-8)”, then try again.";
    if (error.status === 0) return error.message;
    const fields = Object.values(error.fields);
    return fields.length > 0 && !/invalid row/.test(fields[0]!) ? `${error.message} (${fields.join("; ")})` : error.message;
  }
  return error instanceof Error ? error.message : "The upload failed.";
}
