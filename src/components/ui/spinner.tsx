import clsx from "clsx";

const sizes = { sm: "size-4 border-2", md: "size-6 border-[3px]", lg: "size-10 border-4" } as const;

export type SpinnerProps = {
  size?: keyof typeof sizes;
  /** Announced to screen readers; pass "" when the surrounding control already says it is busy. */
  label?: string;
  className?: string;
};

export function Spinner({ size = "md", label = "Loading", className }: SpinnerProps) {
  const ring = (
    <span
      aria-hidden="true"
      className={clsx("inline-block animate-spin rounded-full border-current border-r-transparent", sizes[size], className)}
    />
  );
  if (!label) return ring;
  return (
    <span role="status" className="inline-flex items-center gap-2">
      {ring}
      <span className="sr-only">{label}</span>
    </span>
  );
}

/** A centred spinner for a whole page or panel. */
export function PageSpinner({ label = "Loading" }: { label?: string }) {
  return (
    <div className="flex min-h-[40vh] items-center justify-center text-ink-500">
      <Spinner size="lg" label={label} />
    </div>
  );
}
