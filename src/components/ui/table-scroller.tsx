import clsx from "clsx";
import type { HTMLAttributes, ReactNode } from "react";

export type TableScrollerProps = {
  /** What the table holds (spoken as the region's name). */
  label: string;
  /** false: no bleed or card frame (the caller's className lays it out). */
  framed?: boolean;
  children: ReactNode;
} & Omit<HTMLAttributes<HTMLDivElement>, "aria-label">;

/**
 * A wide table's sideways scroll on a phone: a named region a keyboard can reach and scroll with the arrow keys
 * (an unreachable scroll box strands keyboard users). Full bleed on a phone, a rounded card from `sm` up.
 */
export function TableScroller({ label, framed = true, className, children, ...rest }: TableScrollerProps) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={clsx("overflow-x-auto", framed && "-mx-4 sm:mx-0 sm:rounded-xl sm:ring-1 sm:ring-ink-900/10", className)}
      {...rest}
    >
      {children}
    </div>
  );
}
