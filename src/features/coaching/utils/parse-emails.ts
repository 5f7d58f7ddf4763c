import { invitationInputSchema } from "#shared/schemas/squads";

/** Addresses typed or pasted into the invite box: split on commas, semicolons, spaces or lines; each checked
 *  with the shared invitation schema; repeats (in any case) kept once. */
export function parseEmails(text: string): { valid: string[]; invalid: string[] } {
  const valid: string[] = [];
  const invalid: string[] = [];
  for (const part of text.split(/[\s,;]+/)) {
    const raw = part.replace(/^<|>$/g, "").trim();
    if (!raw) continue;
    const parsed = invitationInputSchema.safeParse({ email: raw });
    if (!parsed.success) {
      if (!invalid.includes(raw)) invalid.push(raw);
    } else if (!valid.includes(parsed.data.email)) {
      valid.push(parsed.data.email);
    }
  }
  return { valid, invalid };
}
