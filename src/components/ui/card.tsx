import type { HTMLAttributes, ReactNode } from "react";
import clsx from "clsx";

export type CardProps = HTMLAttributes<HTMLDivElement> & { tone?: "paper" | "ink"; padded?: boolean };

export function Card({ tone = "paper", padded = true, className, ...rest }: CardProps) {
  return (
    <div
      className={clsx(
        "rounded-(--radius-card) shadow-(--shadow-card)",
        tone === "paper" ? "bg-sand-50 text-ink-900 ring-1 ring-ink-900/5" : "bg-ink-900 text-sand-50",
        padded && "p-5 sm:p-7",
        className,
      )}
      {...rest}
    />
  );
}

export function CardTitle({ children, className, as: As = "h2" }: { children: ReactNode; className?: string; as?: "h2" | "h3" }) {
  return <As className={clsx("text-lg font-semibold tracking-tight", className)}>{children}</As>;
}
