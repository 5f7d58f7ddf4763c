import type { ReactNode } from "react";
import clsx from "clsx";

export type PageHeaderProps = {
  title: ReactNode;
  eyebrow?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  /** On a phone only the eyebrow and the title: the description and the actions show from Tailwind's sm up, and take
   *  no room below it (a page whose main action must show without scrolling puts its actions elsewhere there). */
  shortOnPhone?: boolean;
  className?: string;
};

export function PageHeader({ title, eyebrow, description, actions, shortOnPhone = false, className }: PageHeaderProps) {
  return (
    <header className={clsx("mb-6 flex flex-col gap-4 sm:mb-8 sm:flex-row sm:items-end sm:justify-between", className)}>
      <div className="min-w-0">
        {eyebrow ? <p className="mb-1 text-sm font-semibold tracking-wide text-coral-700 uppercase">{eyebrow}</p> : null}
        <h1 className="text-3xl font-semibold tracking-tight text-ink-900 sm:text-4xl">{title}</h1>
        {description ? (
          <p className={clsx("mt-2 max-w-2xl text-lg text-ink-500", shortOnPhone && "hidden sm:block")}>{description}</p>
        ) : null}
      </div>
      {actions ? <div className={clsx("shrink-0 flex-wrap gap-2", shortOnPhone ? "hidden sm:flex" : "flex")}>{actions}</div> : null}
    </header>
  );
}
