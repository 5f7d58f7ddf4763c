// The plain-language summary of where a player loses the most strokes against the tour baseline, from the
// per-band misses and strokes (GET /api/stats/misses). Pure, so it is tested without the page.
import type { MissBand } from "#shared/schemas/stats";
import type { UnitSystem } from "#shared/units";
import { bandLabel } from "./bands";

/** Below this many putts a band is too thin to single out. */
export const SUMMARY_MIN_PUTTS = 10;

const share = (n: number, of: number) => Math.round((n / of) * 100);

/** What the misses in a band lean towards, in words ("most misses finish short (7 of 10)"), or null when even. */
export function missLean(b: MissBand): string | null {
  const parts: string[] = [];
  const sided = b.left + b.right;
  if (sided >= 4 && Math.max(b.left, b.right) >= 0.65 * sided) {
    parts.push(`${b.left > b.right ? "left" : "right"} (${Math.max(b.left, b.right)} of ${sided} with a side logged)`);
  }
  const lengthed = b.short + b.long;
  if (lengthed >= 4 && Math.max(b.short, b.long) >= 0.65 * lengthed) {
    parts.push(`${b.short > b.long ? "short" : "past the hole"} (${Math.max(b.short, b.long)} of ${lengthed} with a leave logged)`);
  }
  return parts.length === 0 ? null : `most misses finish ${parts.join(" and ")}`;
}

/**
 * Two or three short sentences: the band that costs the most strokes against the tour (per putt and in
 * total), which way its misses lean, and the band that holds up best. Null when there are too few putts.
 */
export function strokesSummary(bands: readonly MissBand[], units: UnitSystem, name = "You"): string[] | null {
  const usable = bands.filter((b) => b.attempts >= SUMMARY_MIN_PUTTS);
  if (usable.length === 0) return null;
  const worst = [...usable].sort((a, b) => a.strokesGained - b.strokesGained)[0]!;
  const best = [...usable].sort((a, b) => b.strokesGained / b.attempts - a.strokesGained / a.attempts)[0]!;
  const label = (b: MissBand) => bandLabel(b.fromM, b.toM, units);
  const lines: string[] = [];
  const they = name === "You" ? "you" : "they";
  if (worst.strokesGained < 0) {
    lines.push(
      `${name} lose${name === "You" ? "" : "s"} the most strokes from ${label(worst)}: ${Math.abs(worst.strokesGained).toFixed(1)} over ${worst.attempts} putts ` +
        `(${Math.abs(worst.strokesGained / worst.attempts).toFixed(2)} a putt) against a tour player from the same spots, holing ${share(worst.made, worst.attempts)} %.`,
    );
    const lean = missLean(worst);
    if (lean) lines.push(`From there, ${lean}.`);
  } else {
    lines.push(
      `${name} hold${name === "You" ? "" : "s"} their own against the tour baseline in every band with ${SUMMARY_MIN_PUTTS} or more putts.`.replace(
        "their own",
        name === "You" ? "your own" : "their own",
      ),
    );
  }
  if (best !== worst && best.strokesGained / best.attempts > worst.strokesGained / worst.attempts) {
    lines.push(
      `The best band is ${label(best)}, where ${they} ${best.strokesGained >= 0 ? "gain" : "lose only"} ${Math.abs(best.strokesGained / best.attempts).toFixed(2)} a putt.`,
    );
  }
  return lines;
}
