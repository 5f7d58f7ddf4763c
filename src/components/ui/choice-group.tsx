import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from "react";
import clsx from "clsx";

export type Choice = {
  value: string;
  label: string;
  description?: ReactNode;
  /** Shown but not choosable (say why in the description). */ disabled?: boolean;
};

export type ChoiceGroupProps = {
  legend: ReactNode;
  choices: ReadonlyArray<Choice>;
  error?: string;
  hint?: ReactNode;
  /** Spread onto every radio, e.g. react-hook-form's `register("role")`. Needs at least a `name`. */
  inputProps: Omit<InputHTMLAttributes<HTMLInputElement>, "type" | "value" | "checked"> & { name: string; ref?: Ref<HTMLInputElement> };
  /** For a controlled group (without react-hook-form): the chosen value and the change handler. */
  value?: string;
  onValueChange?: (value: string) => void;
  columns?: 1 | 2;
  className?: string;
};

/** A set of radio buttons drawn as large cards; arrow keys move between them as with any radio group. */
export function ChoiceGroup({ legend, choices, error, hint, inputProps, value, onValueChange, columns = 2, className }: ChoiceGroupProps) {
  const id = useId();
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const described = error ? errorId : hint ? hintId : undefined;
  return (
    <fieldset className={clsx("flex flex-col gap-2", className)} aria-describedby={described}>
      <legend className="mb-1.5 text-sm font-medium text-ink-800">{legend}</legend>
      <div className={clsx("grid gap-2", columns === 2 && "sm:grid-cols-2")}>
        {choices.map((choice) => {
          const inputId = `${id}-${choice.value}`;
          return (
            <label
              key={choice.value}
              htmlFor={inputId}
              className={clsx(
                "group relative flex min-h-14 items-start gap-3 rounded-xl border-2 bg-white px-4 py-3 transition-colors",
                "has-checked:border-ink-900 has-checked:bg-ink-50 has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-coral-500",
                choice.disabled ? "cursor-not-allowed border-dashed border-ink-900/15 bg-ink-50" : "cursor-pointer",
                error ? "border-bad-600" : !choice.disabled && "border-ink-900/15 hover:border-ink-900/30",
              )}
            >
              <input
                {...inputProps}
                id={inputId}
                type="radio"
                value={choice.value}
                disabled={choice.disabled || inputProps.disabled}
                {...(value !== undefined ? { checked: value === choice.value, onChange: () => onValueChange?.(choice.value) } : null)}
                aria-invalid={error ? true : undefined}
                aria-describedby={described}
                className="peer sr-only"
              />
              <span
                aria-hidden="true"
                className="mt-0.5 flex size-5 shrink-0 items-center justify-center rounded-full border-2 border-ink-400 group-has-checked:border-ink-900"
              >
                <span className="size-2.5 scale-0 rounded-full bg-coral-500 transition-transform group-has-checked:scale-100" />
              </span>
              <span className="flex flex-col">
                <span className="font-medium text-ink-900">{choice.label}</span>
                {choice.description ? <span className="text-sm text-ink-500">{choice.description}</span> : null}
              </span>
            </label>
          );
        })}
      </div>
      {hint && !error ? (
        <p id={hintId} className="text-sm text-ink-500">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} className="text-sm font-medium text-bad-600">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
