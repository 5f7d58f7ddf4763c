import { useEffect, useState } from "react";
import type { ReadResponse } from "#shared/schemas/reads";
import { formatLength, formatShort, type UnitSystem } from "#shared/units";
import { aimWords } from "../utils/answer-text";

export type AnswerBarProps = { read: ReadResponse | undefined; cannotStop: boolean; units: UnitSystem; targetId: string };

/**
 * On a phone the form is long: this bar keeps the answer in sight at the bottom while the golfer types or turns
 * the dial, and hides once the full answer is on screen.
 */
export function AnswerBar({ read, cannotStop, units, targetId }: AnswerBarProps) {
  const [targetVisible, setTargetVisible] = useState(false);
  useEffect(() => {
    const target = document.getElementById(targetId);
    if (!target || typeof IntersectionObserver === "undefined") return;
    const observer = new IntersectionObserver(([entry]) => setTargetVisible(Boolean(entry?.isIntersecting)), { threshold: 0.05 });
    observer.observe(target);
    return () => observer.disconnect();
  }, [targetId]);

  if (targetVisible || (!read && !cannotStop)) return null;
  const aim = read ? aimWords(read.aimOffsetM, read.startLineDeg, units) : null;
  return (
    <div className="fixed inset-x-0 bottom-0 z-30 border-t border-sand-50/10 bg-ink-900 px-4 py-3 text-sand-50 shadow-[0_-4px_16px_rgb(11_17_32/0.25)] lg:hidden print:hidden">
      <div className="mx-auto flex max-w-6xl items-center gap-3">
        <div className="min-w-0 flex-1" aria-hidden="true">
          <p className="text-base leading-snug font-semibold">{cannotStop ? "This ball would not stop" : aim?.headline}</p>
          {read && !cannotStop ? (
            <p className="truncate text-sm text-sand-200">
              {formatShort(read.rollPastM, units)} past · as a flat {formatLength(Math.max(0, read.flatPuttLengthM), units)} putt
            </p>
          ) : null}
        </div>
        <a
          href={`#${targetId}`}
          className="flex min-h-11 shrink-0 items-center rounded-lg border border-sand-50/25 px-3 text-sm font-medium hover:bg-sand-50/10"
        >
          See the line
        </a>
      </div>
    </div>
  );
}
