import { z } from "zod";

// C0 control characters other than tab, newline and carriage return: PostgreSQL text cannot hold NUL,
// and none of them belongs in a name or a note.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

/** A trimmed free-text field of at most `max` characters without control characters. */
export function plainText(max: number, min = 0, minMessage = "Cannot be empty") {
  const base = z.string().trim().max(max, `At most ${max} characters`);
  return (min > 0 ? base.min(min, minMessage) : base).refine((s) => !CONTROL.test(s), { message: "Control characters are not allowed" });
}
