// The read form works in the user's units as text; SI numbers stand behind each field so that switching units
// never drifts: a field remembers the exact SI value behind the text it shows, and while the text is unchanged
// that exact value is used (10 ft → "3.05 m" → back to "10 ft", not 10.01).
// zod/mini, not zod: the form is on the first page a visitor sees, and zod's mini builders are a few KiB where the
// full API (shared/schemas/*) is 20 KiB of brotli the page would wait for. The same core checks both.
import * as z from "zod/mini";
import { READ_LIMITS } from "#shared/read-limits";
import {
  fromLongUnit,
  fromShortUnit,
  longUnitLabel,
  METRES_PER_FOOT,
  mpsToFtps,
  parseDecimal,
  shortUnitLabel,
  toLongUnit,
  toShortUnit,
  type UnitSystem,
} from "#shared/units";
import type { PaceMode, ReadValues } from "../../../lib/read-url";

export type ReadFormValues = {
  distance: string;
  slope: string;
  fallLine: string;
  stimp: string;
  paceMode: PaceMode;
  rollPast: string;
  entrySpeed: string;
};

export type NumericField = Exclude<keyof ReadFormValues, "paceMode">;
export const NUMERIC_FIELDS: ReadonlyArray<NumericField> = ["distance", "slope", "fallLine", "stimp", "rollPast", "entrySpeed"];

/** Per field: the text shown and the exact SI value it stands for. */
export type ExactMemory = Partial<Record<NumericField, { text: string; si: number }>>;

type FieldSpec = {
  /** SI value → the number shown in these units, and back. */
  toUnit: (si: number, units: UnitSystem) => number;
  fromUnit: (value: number, units: UnitSystem) => number;
  decimals: (units: UnitSystem) => number;
  unit: (units: UnitSystem) => string;
  limits: { min: number; max: number };
  what: string;
};

const same = (v: number) => v;

export const FIELD_SPECS: Record<NumericField, FieldSpec> = {
  distance: {
    toUnit: toLongUnit,
    fromUnit: fromLongUnit,
    decimals: (u) => (u === "imperial" ? 1 : 2),
    unit: longUnitLabel,
    limits: READ_LIMITS.distanceM,
    what: "a distance",
  },
  slope: { toUnit: same, fromUnit: same, decimals: () => 1, unit: () => "%", limits: READ_LIMITS.slopePct, what: "a slope" },
  fallLine: { toUnit: same, fromUnit: same, decimals: () => 0, unit: () => "°", limits: READ_LIMITS.fallLineDeg, what: "a direction" },
  stimp: { toUnit: same, fromUnit: same, decimals: () => 1, unit: () => "ft", limits: READ_LIMITS.stimpFt, what: "a Stimp reading" },
  rollPast: {
    toUnit: toShortUnit,
    fromUnit: fromShortUnit,
    decimals: () => 0,
    unit: shortUnitLabel,
    limits: READ_LIMITS.rollPastM,
    what: "a length",
  },
  entrySpeed: {
    toUnit: (v, u) => (u === "imperial" ? mpsToFtps(v) : v),
    fromUnit: (v, u) => (u === "imperial" ? v * METRES_PER_FOOT : v),
    decimals: (u) => (u === "imperial" ? 1 : 2),
    unit: (u) => (u === "imperial" ? "ft/s" : "m/s"),
    limits: READ_LIMITS.entrySpeedMps,
    what: "a speed",
  },
};

function roundTo(value: number, decimals: number, dir: "up" | "down" | "near"): number {
  const f = 10 ** decimals;
  const scaled = value * f;
  // A little slack so 98.42519… rounds down to 98.4 and 1.0 stays 1.0 in spite of float dust.
  const r = dir === "up" ? Math.ceil(scaled - 1e-9) : dir === "down" ? Math.floor(scaled + 1e-9) : Math.round(scaled);
  return r / f + 0; // + 0 turns -0 into 0
}

/** A number as a form shows it: at most `decimals` places, no trailing zeros. */
export function formatNumber(value: number, decimals: number): string {
  const r = roundTo(value, decimals, "near");
  return String(Object.is(r, -0) ? 0 : r);
}

/** The field's limits in the user's units, rounded inward so whatever passes here also passes the API. */
export function fieldLimits(field: NumericField, units: UnitSystem): { min: number; max: number; unit: string } {
  const spec = FIELD_SPECS[field];
  const d = Math.max(spec.decimals(units), 1);
  return {
    min: roundTo(spec.toUnit(spec.limits.min, units), d, "up"),
    max: roundTo(spec.toUnit(spec.limits.max, units), d, "down"),
    unit: spec.unit(units),
  };
}

/** "3,5" and " 3.5 " both mean 3.5; anything else that is not a plain number is NaN. */
export function parseNumber(text: string): number {
  return parseDecimal(text) ?? Number.NaN;
}

function rangeMessage(field: NumericField, units: UnitSystem): string {
  const { min, max, unit } = fieldLimits(field, units);
  const sep = unit === "%" || unit === "°" ? "" : " ";
  return `Enter ${FIELD_SPECS[field].what} from ${min} to ${max}${sep}${unit}.`;
}

function numberField(field: NumericField, units: UnitSystem) {
  const { min, max } = fieldLimits(field, units);
  const message = rangeMessage(field, units);
  return z.string().check(
    z.refine((text) => {
      const n = parseNumber(text);
      return Number.isFinite(n) && n >= min && n <= max;
    }, message),
  );
}

function buildReadFormSchema(units: UnitSystem) {
  const pace = { rollPast: numberField("rollPast", units), entrySpeed: numberField("entrySpeed", units) };
  return z
    .object({
      distance: numberField("distance", units),
      slope: numberField("slope", units),
      fallLine: numberField("fallLine", units),
      stimp: numberField("stimp", units),
      paceMode: z.enum(["rollPast", "entrySpeed"]),
      rollPast: z.string(),
      entrySpeed: z.string(),
    })
    .check(
      z.superRefine((v, ctx) => {
        // Only the pace in use is checked.
        const field = v.paceMode === "entrySpeed" ? "entrySpeed" : "rollPast";
        if (!pace[field].safeParse(v[field]).success)
          ctx.addIssue({ code: "custom", path: [field], message: rangeMessage(field, units), input: v[field] });
      }),
    );
}

const formSchemas = new Map<UnitSystem, ReturnType<typeof buildReadFormSchema>>();

/** The form's schema, with the API's limits (shared/schemas/reads.ts) in the user's units. Built once per unit system:
 *  the form asks for it on every render and keystroke, and building zod schemas is a measurable part of the page's
 *  first load on a phone (profiled at 4× CPU slowdown). */
export function readFormSchema(units: UnitSystem) {
  let schema = formSchemas.get(units);
  if (!schema) formSchemas.set(units, (schema = buildReadFormSchema(units)));
  return schema;
}

const SI_KEYS: Record<NumericField, Exclude<keyof ReadValues, "paceMode">> = {
  distance: "distanceM",
  slope: "slopePct",
  fallLine: "fallLineDeg",
  stimp: "stimpFt",
  rollPast: "rollPastM",
  entrySpeed: "entrySpeedMps",
};

/** SI values → the form's text in these units, and the memory of the exact values behind it. */
export function toFormValues(v: ReadValues, units: UnitSystem): { values: ReadFormValues; memory: ExactMemory } {
  const memory: ExactMemory = {};
  const text = (field: NumericField) => {
    const spec = FIELD_SPECS[field];
    const si = v[SI_KEYS[field]];
    const shown = formatNumber(spec.toUnit(si, units), spec.decimals(units));
    memory[field] = { text: shown, si };
    return shown;
  };
  const values: ReadFormValues = {
    distance: text("distance"),
    slope: text("slope"),
    fallLine: text("fallLine"),
    stimp: text("stimp"),
    paceMode: v.paceMode,
    rollPast: text("rollPast"),
    entrySpeed: text("entrySpeed"),
  };
  return { values, memory };
}

/** One field's SI value: the remembered exact value while its text is unchanged, else the text converted. */
export function fieldSi(field: NumericField, text: string, units: UnitSystem, memory: ExactMemory): number {
  const kept = memory[field];
  if (kept && kept.text === text) return kept.si;
  return FIELD_SPECS[field].fromUnit(parseNumber(text), units);
}

/** The form's text → SI values (NaN where a field is not a number). */
export function fromFormValues(values: ReadFormValues, units: UnitSystem, memory: ExactMemory): ReadValues {
  const si = (field: NumericField) => fieldSi(field, values[field], units, memory);
  return {
    distanceM: si("distance"),
    slopePct: si("slope"),
    fallLineDeg: si("fallLine"),
    stimpFt: si("stimp"),
    paceMode: values.paceMode,
    rollPastM: si("rollPast"),
    entrySpeedMps: si("entrySpeed"),
  };
}

/**
 * Re-express the form in other units. Fields that are not numbers keep their text (the user is still typing);
 * every other field shows its exact SI value in the new units.
 */
export function convertFormValues(
  values: ReadFormValues,
  from: UnitSystem,
  to: UnitSystem,
  memory: ExactMemory,
): { values: ReadFormValues; memory: ExactMemory } {
  const next: ReadFormValues = { ...values };
  const nextMemory: ExactMemory = {};
  for (const field of NUMERIC_FIELDS) {
    const si = fieldSi(field, values[field], from, memory);
    if (!Number.isFinite(si)) continue;
    const spec = FIELD_SPECS[field];
    const shown = formatNumber(spec.toUnit(si, to), spec.decimals(to));
    next[field] = shown;
    nextMemory[field] = { text: shown, si };
  }
  return { values: next, memory: nextMemory };
}

/** Maps the API's field names (distanceM, pace.rollPastM …) to the form's fields. */
export function formFieldForApi(apiField: string): NumericField | undefined {
  const key = apiField.split(".").pop();
  const map: Record<string, NumericField> = {
    distanceM: "distance",
    slopePct: "slope",
    fallLineDeg: "fallLine",
    stimpFt: "stimp",
    rollPastM: "rollPast",
    entrySpeedMps: "entrySpeed",
  };
  return key ? map[key] : undefined;
}

export type ChartFormValues = { slope: string; stimp: string; rollPast: string };

/** The break chart's three inputs, with the same limits and messages as the read form. */
export function chartFormSchema(units: UnitSystem) {
  return z.object({ slope: numberField("slope", units), stimp: numberField("stimp", units), rollPast: numberField("rollPast", units) });
}
