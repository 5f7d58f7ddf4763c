import type { ReactNode } from "react";
import clsx from "clsx";

export type EmptyStateProps = { title: ReactNode; children?: ReactNode; action?: ReactNode; className?: string };

export function EmptyState({ title, children, action, className }: EmptyStateProps) {
  return (
    <div
      className={clsx(
        "flex flex-col items-center gap-3 rounded-(--radius-card) border-2 border-dashed border-ink-900/15 px-6 py-12 text-center",
        className,
      )}
    >
      <svg aria-hidden="true" viewBox="0 0 48 48" className="size-12 text-ink-300">
        <circle cx="24" cy="24" r="9" fill="none" stroke="currentColor" strokeWidth="3" />
        <path d="M6 40 Q 14 26 24 24" fill="none" stroke="currentColor" strokeWidth="3" strokeDasharray="3 5" strokeLinecap="round" />
      </svg>
      <p className="text-lg font-semibold text-ink-800">{title}</p>
      {children ? <div className="max-w-md text-ink-500">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
