import type { ReactNode } from "react";
import clsx from "clsx";

export type StepperProps = {
  /** What is being set, e.g. "Distance"; names the buttons for screen readers ("Distance shorter"). */
  label: string;
  value: ReactNode;
  onDecrease: () => void;
  onIncrease: () => void;
  decreaseLabel?: string;
  increaseLabel?: string;
  canDecrease?: boolean;
  canIncrease?: boolean;
  disabled?: boolean;
  size?: "lg" | "md";
  className?: string;
};

const stepButton =
  "flex shrink-0 items-center justify-center rounded-xl border-2 border-ink-900/15 bg-white text-ink-900 transition-colors " +
  "hover:border-ink-900/30 active:bg-ink-50 disabled:cursor-not-allowed disabled:opacity-40 " +
  "focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500";

/** − value + with big touch targets (56 px or more); the value is announced when it changes. */
export function Stepper({
  label,
  value,
  onDecrease,
  onIncrease,
  decreaseLabel = `${label} less`,
  increaseLabel = `${label} more`,
  canDecrease = true,
  canIncrease = true,
  disabled = false,
  size = "lg",
  className,
}: StepperProps) {
  const box = size === "lg" ? "size-16" : "size-14";
  return (
    <div className={clsx("flex items-center gap-3", className)} role="group" aria-label={label}>
      <button
        type="button"
        className={clsx(stepButton, box)}
        aria-label={decreaseLabel}
        onClick={onDecrease}
        disabled={disabled || !canDecrease}
      >
        <svg aria-hidden="true" viewBox="0 0 20 20" className="size-6 fill-current">
          <path d="M4 9h12v2H4z" />
        </svg>
      </button>
      <output
        aria-live="polite"
        className={clsx(
          "min-w-0 flex-1 text-center font-semibold tabular-nums",
          size === "lg" ? "text-4xl" : "text-2xl",
          disabled && "opacity-50",
        )}
      >
        {value}
      </output>
      <button
        type="button"
        className={clsx(stepButton, box)}
        aria-label={increaseLabel}
        onClick={onIncrease}
        disabled={disabled || !canIncrease}
      >
        <svg aria-hidden="true" viewBox="0 0 20 20" className="size-6 fill-current">
          <path d="M9 4h2v5h5v2h-5v5H9v-5H4V9h5z" />
        </svg>
      </button>
    </div>
  );
}
