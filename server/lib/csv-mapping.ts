// How a CSV file of putts maps onto putts: guessing the mapping from the headers, reading a mapping, converting a
// row (units, yes/no words, sides, break types) with row-level errors. Pure: no database, no request.
import { z } from "zod";
import { isoDateSchema } from "../../shared/schemas/common";
import { plainText } from "../../shared/schemas/text";
import { BREAK_TYPES, csvMappingSchema, holedHasNoMiss, puttFieldsSchema, type CsvMapping } from "../../shared/schemas/putts";
import { fromLongUnit, fromShortUnit, METRES_PER_FOOT, type UnitSystem } from "../../shared/units";
import { unguard } from "./csv";
import { badRequest } from "./http-error";
import { zodFields } from "../middleware/validate";

const norm = (h: string) =>
  h
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, " ")
    .trim();

/** Header words we recognise (our own export's names first), for the suggested mapping. */
const HEADER_HINTS: { key: keyof CsvMapping; pattern: RegExp }[] = [
  { key: "date", pattern: /^(date|day|session date|practice date)$/ },
  { key: "distance", pattern: /^(distance|dist|length|putt length|putt distance)( (m|ft|feet|metres|meters))?$/ },
  { key: "holed", pattern: /^(holed|made|make|in|result)$/ },
  { key: "missSide", pattern: /^(miss side|side|missed side)$/ },
  { key: "missLength", pattern: /^(miss length|leave|miss distance|miss|past short)( (m|cm|ft|in|inches))?$/ },
  { key: "breakType", pattern: /^(break type|break|slope)$/ },
  { key: "green", pattern: /^(green|green name|practice green)$/ },
  { key: "session", pattern: /^(session|session id|session name)$/ },
];

export function suggestMapping(headers: string[], units: UnitSystem): Partial<CsvMapping> {
  const out: Partial<CsvMapping> = {};
  for (const h of headers) {
    const n = norm(h);
    const hint = HEADER_HINTS.find((x) => x.pattern.test(n) && out[x.key] === undefined);
    if (!hint) continue;
    (out as Record<string, string>)[hint.key] = h;
    if (hint.key === "distance")
      out.distanceUnit = / (ft|feet)$/.test(n) ? "ft" : / (m|metres|meters)$/.test(n) ? "m" : units === "imperial" ? "ft" : "m";
    if (hint.key === "missLength") {
      const u = n.match(/ (m|cm|ft|in|inches)$/)?.[1];
      if (u) out.missLengthUnit = u === "inches" ? "in" : (u as CsvMapping["missLengthUnit"]);
    }
  }
  return out;
}

const HOLED_WORDS: Record<string, boolean> = {
  true: true,
  yes: true,
  y: true,
  "1": true,
  holed: true,
  made: true,
  make: true,
  in: true,
  false: false,
  no: false,
  n: false,
  "0": false,
  missed: false,
  miss: false,
  out: false,
};
const SIDE_WORDS: Record<string, "left" | "right"> = { left: "left", l: "left", right: "right", r: "right" };
/** Maps the API's field names back to the mapping's, so row errors name what the user mapped. */
const FIELD_OF: Record<string, keyof CsvMapping> = {
  distanceM: "distance",
  holed: "holed",
  missSide: "missSide",
  missLengthM: "missLength",
  breakType: "breakType",
};

const csvPuttSchema = puttFieldsSchema.superRefine(holedHasNoMiss);
const greenNameSchema = plainText(80);
export type CsvPutt = z.infer<typeof csvPuttSchema> & { date: string; group: string; greenName: string | null };

/** A plain decimal ("1.5", "-.4"); anything else (hex, exponents, words) is not a number here. */
export function parseNumber(cell: string): number | null {
  const t = cell.trim();
  if (t === "" || !/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) return null;
  return Number(t);
}

/** One data row as a putt, or the reasons it cannot be one (field, message). */
export function convertRow(
  cells: string[],
  col: Record<string, number>,
  m: CsvMapping,
): { putt?: CsvPutt; errors: { field: string; message: string }[] } {
  const errors: { field: string; message: string }[] = [];
  const cell = (key: keyof CsvMapping) => (col[key] === undefined ? "" : unguard((cells[col[key]!] ?? "").trim()));
  const date = cell("date");
  if (!isoDateSchema.safeParse(date).success)
    errors.push({ field: "date", message: date === "" ? "missing date" : `"${date}" is not a date as YYYY-MM-DD` });
  const rawDistance = parseNumber(cell("distance"));
  if (rawDistance === null) errors.push({ field: "distance", message: `"${cell("distance")}" is not a number` });
  const holedWord = cell("holed").toLowerCase();
  const holed = HOLED_WORDS[holedWord];
  if (holed === undefined) errors.push({ field: "holed", message: `"${cell("holed")}" is not yes/no, true/false, 1/0 or holed/missed` });
  const sideWord = cell("missSide").toLowerCase();
  const missSide = sideWord === "" ? null : SIDE_WORDS[sideWord];
  if (missSide === undefined) errors.push({ field: "missSide", message: `"${cell("missSide")}" is not left or right` });
  const lengthCell = cell("missLength");
  const rawLength = lengthCell === "" ? null : parseNumber(lengthCell);
  if (lengthCell !== "" && rawLength === null) errors.push({ field: "missLength", message: `"${lengthCell}" is not a number` });
  const breakWord = cell("breakType")
    .toLowerCase()
    .replace(/[\s_]+/g, "-");
  const breakType =
    breakWord === ""
      ? null
      : (BREAK_TYPES as readonly string[]).includes(breakWord)
        ? (breakWord as (typeof BREAK_TYPES)[number])
        : undefined;
  if (breakType === undefined)
    errors.push({ field: "breakType", message: `"${cell("breakType")}" is not one of ${BREAK_TYPES.join(", ")}` });
  const greenCheck = greenNameSchema.safeParse(cell("green"));
  if (!greenCheck.success) errors.push({ field: "green", message: greenCheck.error.issues[0]?.message ?? "not a green name" });
  if (errors.length > 0) return { errors };

  const shortUnit = m.missLengthUnit ?? m.distanceUnit;
  const lengthM =
    rawLength === null
      ? null
      : shortUnit === "m"
        ? rawLength
        : shortUnit === "ft"
          ? rawLength * METRES_PER_FOOT
          : fromShortUnit(rawLength, shortUnit === "in" ? "imperial" : "metric");
  const candidate = {
    distanceM: fromLongUnit(rawDistance!, m.distanceUnit === "ft" ? "imperial" : "metric"),
    holed: holed!,
    missSide,
    missLengthM: lengthM,
    breakType,
  };
  const checked = csvPuttSchema.safeParse(candidate);
  if (!checked.success) {
    for (const [path, message] of Object.entries(zodFields(checked.error))) errors.push({ field: FIELD_OF[path] ?? path, message });
    return { errors };
  }
  const greenName = cell("green") || null;
  const group = `${date}\u0000${m.session ? cell("session") : (greenName ?? "").toLowerCase()}`;
  return { putt: { ...checked.data, date, group, greenName }, errors };
}

/** The import's `mapping` field, checked against the file's headers: the mapping and each key's column. */
export function readMapping(raw: string, headers: string[]): { mapping: CsvMapping; col: Record<string, number> } {
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch {
    throw badRequest("The mapping is not valid JSON.", { mapping: "not valid JSON" });
  }
  const parsed = csvMappingSchema.safeParse(json);
  if (!parsed.success) {
    const fields = Object.fromEntries(
      Object.entries(zodFields(parsed.error)).map(([k, v]) => [k === "body" ? "mapping" : `mapping.${k}`, v]),
    );
    throw badRequest("The mapping is not valid.", fields);
  }
  const mapping = parsed.data;
  const col: Record<string, number> = {};
  const fields: Record<string, string> = {};
  for (const key of ["date", "distance", "holed", "missSide", "missLength", "breakType", "green", "session"] as const) {
    const name = mapping[key];
    if (name === undefined) continue;
    const at = headers.map((h, i) => (h === name ? i : -1)).filter((i) => i >= 0);
    if (at.length === 0) fields[`mapping.${key}`] = `No column named "${name}"`;
    else if (at.length > 1) fields[`mapping.${key}`] = `${at.length} columns are named "${name}"`;
    else col[key] = at[0]!;
  }
  if (Object.keys(fields).length > 0) throw badRequest("The mapping names columns the file does not have.", fields);
  return { mapping, col };
}
