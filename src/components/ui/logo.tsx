import clsx from "clsx";

/** Borrowline's mark: a ball, the curving line it rolls on, and the hole. */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 32 32" className={clsx("size-8 shrink-0", className)}>
      <rect width="32" height="32" rx="8" className="fill-ink-800" />
      <path
        d="M8 25 C 9 15, 17 10, 23 9"
        fill="none"
        className="stroke-coral-400"
        strokeWidth="2.5"
        strokeLinecap="round"
        strokeDasharray="0.1 4.2"
      />
      <circle cx="8" cy="25" r="3" className="fill-sand-50" />
      <circle cx="23.5" cy="8.5" r="3.5" fill="none" className="stroke-sand-50" strokeWidth="2" />
    </svg>
  );
}
