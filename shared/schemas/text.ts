import { z } from "zod";

// The one text rule for every free-text field the API stores (names, notes, labels, tags, column names)
// and for better-auth's `name`: PostgreSQL text cannot hold NUL, a lone UTF-16 surrogate cannot be stored
// as UTF-8 (PostgreSQL refuses it, PGlite silently turns it into U+FFFD), and neither control characters nor
// direction overrides belong in a name or a note. New lines only where a field allows them.

/* eslint-disable no-control-regex -- matching control characters is the point */
/** C0 and C1 controls and DEL, new lines included. */
const CONTROL = /[\u0000-\u001F\u007F-\u009F]/;
/** The same without \n and \r, for fields that allow new lines. */
const CONTROL_EXCEPT_NEWLINES = /[\u0000-\u0009\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
/* eslint-enable no-control-regex */
/** Bidirectional embeddings, overrides and isolates (U+202A–U+202E, U+2066–U+2069): they make text display as something else. */
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export type TextOptions = {
  /** Longest accepted length in characters (after trimming). */
  max: number;
  /** Shortest accepted length (after trimming); 0 allows an empty string. */
  min?: number;
  minMessage?: string;
  /** Allow \n and \r (notes, descriptions). */
  multiline?: boolean;
};

/** Why `s` is not acceptable text, or null. Shared by the zod schema and the auth guard. */
export function textProblem(s: string, multiline = false): string | null {
  if (s.includes("\u0000")) return "The NUL character is not allowed";
  if (LONE_SURROGATE.test(s)) return "Not valid Unicode text (a lone surrogate)";
  if ((multiline ? CONTROL_EXCEPT_NEWLINES : CONTROL).test(s)) {
    return multiline
      ? "Control characters other than new lines are not allowed"
      : "Control characters (new lines included) are not allowed";
  }
  if (BIDI_CONTROL.test(s)) return "Text-direction override characters are not allowed";
  return null;
}

/** A trimmed, length-capped text field without NUL, lone surrogates, control or direction-override characters. */
export function text({ max, min = 0, minMessage = "Cannot be empty", multiline = false }: TextOptions) {
  return z
    .string()
    .superRefine((s, ctx) => {
      const problem = textProblem(s, multiline);
      if (problem) ctx.addIssue({ code: "custom", message: problem, abort: true });
    })
    .trim()
    .max(max, `At most ${max} characters`)
    .min(min, minMessage);
}

/** A single-line text field (names, labels, tags). */
export function plainText(max: number, min = 0, minMessage = "Cannot be empty") {
  return text({ max, min, minMessage });
}

/** A text field that may hold several lines (notes, descriptions). */
export function multilineText(max: number) {
  return text({ max, multiline: true });
}

/** A person's name: on sign-up, on a profile update, wherever better-auth stores `name`. */
export const PERSON_NAME_MAX = 100;
export const personNameSchema = text({ max: PERSON_NAME_MAX, min: 1, minMessage: "Enter your name." });
