// The ladder builder's form values (lengths in the user's unit, numbers as typed) and their way to and from
// the API's LadderInput (SI). Validation is the shared schema's; its messages are placed beside the fields.
import { parseDecimal } from "#shared/units";
import type { z } from "zod";
import { holedToPass, ladderInputSchema, type FailRule, type Ladder, type LadderInput } from "#shared/schemas/ladders";
import type { BreakType } from "#shared/schemas/putts";
import { formatLength, fromLongUnit, longUnitLabel, toLongUnit, type UnitSystem } from "#shared/units";

export type RungFormValues = {
  /** Distance in the user's long unit (ft or m), as typed. */
  distance: string;
  balls: string;
  passKind: "make" | "in-a-row";
  /** Holed needed: k of "make k of n", or n of "n in a row". */
  need: string;
  breakType: BreakType | "";
  note: string;
};

export type LadderFormValues = {
  name: string;
  description: string;
  failRule: FailRule;
  rungs: RungFormValues[];
};

/** Form paths with a message: "name", "rungs", "rungs.2.need", ... */
export type LadderFormErrors = Record<string, string>;

function parseNumber(text: string): number {
  return parseDecimal(text) ?? Number.NaN;
}

/** A length for an input: 6 (ft) or 1.8 (m), without float noise. */
function lengthForInput(m: number, units: UnitSystem): string {
  const v = toLongUnit(m, units);
  return String(Math.round(v * (units === "imperial" ? 10 : 100)) / (units === "imperial" ? 10 : 100));
}

export function rungToForm(rung: LadderInput["rungs"][number], units: UnitSystem): RungFormValues {
  return {
    distance: lengthForInput(rung.distanceM, units),
    balls: String(rung.balls),
    passKind: rung.passRule.kind,
    need: String(holedToPass(rung.passRule)),
    breakType: rung.breakType ?? "",
    note: rung.note ?? "",
  };
}

export function ladderToForm(ladder: Pick<Ladder, "name" | "description" | "failRule" | "rungs">, units: UnitSystem): LadderFormValues {
  return {
    name: ladder.name,
    description: ladder.description ?? "",
    failRule: ladder.failRule,
    rungs: ladder.rungs.map((r) => rungToForm(r, units)),
  };
}

/** A new ladder starts with one short rung: 3 ft (or 1 m), hole 3 of 5. */
export function emptyLadderForm(units: UnitSystem): LadderFormValues {
  return {
    name: "",
    description: "",
    failRule: "repeat",
    rungs: [{ distance: units === "imperial" ? "3" : "1", balls: "5", passKind: "make", need: "3", breakType: "", note: "" }],
  };
}

/** The rung a coach adds after `last`: the same set-up one step further (1 ft or 0.5 m). */
export function nextRung(last: RungFormValues | undefined, units: UnitSystem): RungFormValues {
  const step = units === "imperial" ? 1 : 0.5;
  if (!last) return emptyLadderForm(units).rungs[0]!;
  const d = parseNumber(last.distance);
  return { ...last, distance: Number.isFinite(d) ? String(Math.round((d + step) * 100) / 100) : last.distance, note: "" };
}

export function rungToInput(r: RungFormValues, units: UnitSystem): LadderInput["rungs"][number] {
  const need = parseNumber(r.need);
  const distance = parseNumber(r.distance);
  return {
    // Millimetres are plenty; the stored value stays stable when a coach saves twice.
    distanceM: Number.isFinite(distance) ? Math.round(fromLongUnit(distance, units) * 1000) / 1000 : Number.NaN,
    balls: parseNumber(r.balls),
    passRule: r.passKind === "make" ? { kind: "make", made: need } : { kind: "in-a-row", count: need },
    ...(r.breakType ? { breakType: r.breakType } : {}),
    ...(r.note.trim() ? { note: r.note.trim() } : {}),
  };
}

export function formToLadderInput(v: LadderFormValues, units: UnitSystem): LadderInput {
  return {
    name: v.name.trim(),
    ...(v.description.trim() ? { description: v.description.trim() } : {}),
    failRule: v.failRule,
    rungs: v.rungs.map((r) => rungToInput(r, units)),
  };
}

/** Messages for the checks the shared schema states without words of its own (number bounds, types), in the user's unit. */
function friendly(issue: z.core.$ZodIssue, field: string, units: UnitSystem): string {
  const tooSmall = issue.code === "too_small";
  const tooBig = issue.code === "too_big";
  if (field === "distance") {
    if (tooSmall) return `At least ${formatLength(0.3, units)}`;
    if (tooBig) return `At most ${formatLength(30, units)}`;
    return `Enter the distance in ${longUnitLabel(units)}`;
  }
  if (field === "balls") {
    if (tooSmall) return "At least 1 ball";
    if (tooBig) return "At most 50 balls";
    return "Enter a whole number of balls";
  }
  if (field === "need") {
    if (tooSmall) return "At least 1";
    if (tooBig) return "At most 50";
    return "Enter a whole number";
  }
  if (tooBig && "maximum" in issue) return `At most ${String(issue.maximum)} characters`;
  return issue.message;
}

/** Where an issue of the shared schema (path in LadderInput) belongs in the form, and its message. */
function place(issue: z.core.$ZodIssue, units: UnitSystem): [string, string] {
  const [head, index, field, sub] = issue.path;
  if (head !== "rungs" || index === undefined)
    return [String(head ?? "form"), head === "name" && issue.code === "too_big" ? "At most 80 characters" : issue.message];
  if (head === "rungs" && typeof index !== "number") return ["rungs", issue.message];
  const at = `rungs.${String(index)}`;
  if (field === "distanceM") return [`${at}.distance`, friendly(issue, "distance", units)];
  if (field === "balls") return [`${at}.balls`, friendly(issue, "balls", units)];
  // The schema's own "Needs 3 holed but the rung has only 2 balls" sits on passRule itself.
  if (field === "passRule" && sub === undefined) return [`${at}.need`, issue.message];
  if (field === "passRule") return [`${at}.need`, friendly(issue, "need", units)];
  if (field === "note") return [`${at}.note`, friendly(issue, "note", units)];
  return [at, issue.message];
}

/** Validates the form with the shared ladder schema: the API's input, or messages keyed by form path (first per field). */
export function validateLadderForm(
  v: LadderFormValues,
  units: UnitSystem,
): { ok: true; input: LadderInput } | { ok: false; errors: LadderFormErrors } {
  const parsed = ladderInputSchema.safeParse(formToLadderInput(v, units));
  if (parsed.success) return { ok: true, input: parsed.data };
  const errors: LadderFormErrors = {};
  for (const issue of parsed.error.issues) {
    const [path, message] = place(issue, units);
    errors[path] ??= message;
  }
  return { ok: false, errors };
}

/** Server field errors ("rungs.1.passRule") in form paths. */
export function serverFieldsToForm(fields: Record<string, string>): LadderFormErrors {
  const out: LadderFormErrors = {};
  for (const [key, message] of Object.entries(fields)) {
    const m = /^rungs\.(\d+)\.(distanceM|balls|passRule(?:\.\w+)?|note|breakType)$/.exec(key);
    if (!m) {
      out[key] = message;
      continue;
    }
    const field = m[2]!.startsWith("passRule") ? "need" : m[2] === "distanceM" ? "distance" : m[2]!;
    out[`rungs.${m[1]}.${field}`] = message;
  }
  return out;
}
