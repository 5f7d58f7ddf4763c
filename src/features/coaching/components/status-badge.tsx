import clsx from "clsx";
import type { ReactNode } from "react";

export type BadgeTone = "neutral" | "ok" | "warn" | "bad" | "accent";

const tones: Record<BadgeTone, string> = {
  neutral: "bg-ink-50 text-ink-700 ring-ink-900/10",
  ok: "bg-ok-50 text-ok-800 ring-ok-600/30",
  warn: "bg-warn-50 text-warn-800 ring-warn-600/30",
  bad: "bg-bad-50 text-bad-800 ring-bad-600/30",
  accent: "bg-coral-50 text-coral-800 ring-coral-500/30",
};

/** A small status word in a pill; the word carries the meaning, the colour only helps. */
export function Badge({ tone = "neutral", children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span
      className={clsx(
        "inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap ring-1",
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
