import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from "react";
import clsx from "clsx";

const control =
  "block w-full min-h-12 rounded-xl border-2 bg-white px-4 text-base text-ink-900 placeholder:text-ink-300 " +
  "transition-colors focus:border-ink-700 focus:outline-none focus-visible:outline-3 focus-visible:outline-offset-1 focus-visible:outline-coral-500";

function controlClasses(invalid: boolean, extra?: string) {
  return clsx(control, invalid ? "border-bad-600 focus:border-bad-600" : "border-ink-900/15 hover:border-ink-900/30", extra);
}

type FieldShellProps = {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  hintId: string;
  errorId: string;
  children: ReactNode;
  className?: string;
};

function FieldShell({ id, label, hint, error, hintId, errorId, children, className }: FieldShellProps) {
  return (
    <div className={clsx("flex flex-col gap-1.5", className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink-800">
        {label}
      </label>
      {children}
      {hint && !error ? (
        <p id={hintId} className="text-sm text-ink-500">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-bad-600">
          <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 size-4 shrink-0 fill-current">
            <path d="M8 1a7 7 0 1 0 0 14A7 7 0 0 0 8 1Zm-.75 3.5h1.5v4.5h-1.5V4.5Zm0 6h1.5V12h-1.5v-1.5Z" />
          </svg>
          {error}
        </p>
      ) : null}
    </div>
  );
}

function describedBy(hint: unknown, error: string | undefined, hintId: string, errorId: string, extra?: string) {
  const ids = [error ? errorId : hint ? hintId : undefined, extra].filter(Boolean);
  return ids.length ? ids.join(" ") : undefined;
}

export type InputFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, "id"> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  id?: string;
  containerClassName?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A text-like input with its label, an optional hint and an error message wired for screen readers. */
export function InputField({ label, hint, error, id, className, containerClassName, ref, ...rest }: InputFieldProps) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  return (
    <FieldShell id={inputId} label={label} hint={hint} error={error} hintId={hintId} errorId={errorId} className={containerClassName}>
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(hint, error, hintId, errorId, rest["aria-describedby"])}
        className={controlClasses(Boolean(error), className)}
        {...rest}
      />
    </FieldShell>
  );
}

export type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, "id"> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  id?: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  containerClassName?: string;
  ref?: Ref<HTMLSelectElement>;
};

export function SelectField({ label, hint, error, id, options, className, containerClassName, ref, ...rest }: SelectFieldProps) {
  const autoId = useId();
  const selectId = id ?? autoId;
  const hintId = `${selectId}-hint`;
  const errorId = `${selectId}-error`;
  return (
    <FieldShell id={selectId} label={label} hint={hint} error={error} hintId={hintId} errorId={errorId} className={containerClassName}>
      <div className="relative">
        <select
          ref={ref}
          id={selectId}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(hint, error, hintId, errorId)}
          className={controlClasses(Boolean(error), clsx("appearance-none pr-11", className))}
          {...rest}
        >
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <svg
          aria-hidden="true"
          viewBox="0 0 20 20"
          className="pointer-events-none absolute top-1/2 right-4 size-5 -translate-y-1/2 fill-ink-500"
        >
          <path d="M5.3 7.3a1 1 0 0 1 1.4 0L10 10.6l3.3-3.3a1 1 0 1 1 1.4 1.4l-4 4a1 1 0 0 1-1.4 0l-4-4a1 1 0 0 1 0-1.4Z" />
        </svg>
      </div>
    </FieldShell>
  );
}
