import clsx from "clsx";

export type ChipOption<T extends string | number> = { value: T; label: string };

export type ChipGroupProps<T extends string | number> = {
  /** Read by screen readers as the group's name; shown when `showLegend`. */
  legend: string;
  showLegend?: boolean;
  options: ReadonlyArray<ChipOption<T>>;
  value: T | null;
  /** Called with the option tapped; with `allowNone`, tapping the chosen one again gives null. */
  onChange: (value: T | null) => void;
  allowNone?: boolean;
  disabled?: boolean;
  /** Grid columns on a phone; chips wrap onto more rows. */
  columns?: 2 | 3 | 4 | 5;
  className?: string;
};

const cols = { 2: "grid-cols-2", 3: "grid-cols-3", 4: "grid-cols-4", 5: "grid-cols-5" } as const;

/** A row of large toggle buttons (at least 56 px tall) for one choice; aria-pressed marks the chosen one. */
export function ChipGroup<T extends string | number>({
  legend,
  showLegend = true,
  options,
  value,
  onChange,
  allowNone = false,
  disabled = false,
  columns = 4,
  className,
}: ChipGroupProps<T>) {
  return (
    <fieldset className={clsx("min-w-0", className)} disabled={disabled}>
      <legend className={showLegend ? "mb-2 text-sm font-medium text-ink-700" : "sr-only"}>{legend}</legend>
      <div className={clsx("grid gap-2", cols[columns])}>
        {options.map((o) => {
          const on = value === o.value;
          return (
            <button
              key={String(o.value)}
              type="button"
              aria-pressed={on}
              onClick={() => onChange(on && allowNone ? null : o.value)}
              className={clsx(
                "min-h-14 rounded-xl border-2 px-2 text-base font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-40",
                "focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500",
                on ? "border-ink-900 bg-ink-900 text-sand-50" : "border-ink-900/15 bg-white text-ink-900 hover:border-ink-900/30",
              )}
            >
              {o.label}
            </button>
          );
        })}
      </div>
    </fieldset>
  );
}
