import type { ReactNode } from "react";
import clsx from "clsx";

export type AlertTone = "info" | "success" | "warning" | "error";

const tones: Record<AlertTone, string> = {
  info: "border-ink-300 bg-ink-50 text-ink-800",
  success: "border-ok-600/40 bg-ok-50 text-ok-800",
  warning: "border-warn-600/40 bg-warn-50 text-warn-800",
  error: "border-bad-600/40 bg-bad-50 text-bad-800",
};

const icons: Record<AlertTone, string> = {
  info: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm-.9 4h1.8v1.8H9.1V6Zm0 3.2h1.8V14H9.1V9.2Z",
  success: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm3.6 5.3-4.4 5.2a.9.9 0 0 1-1.3.1L5.6 10.5l1.2-1.3 1.6 1.5 3.8-4.5 1.4 1.1Z",
  warning: "M10 2.5 1.5 17h17L10 2.5Zm-.9 5h1.8v4.6H9.1V7.5Zm0 6h1.8v1.8H9.1v-1.8Z",
  error: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm-.9 4h1.8v5H9.1V6Zm0 6.2h1.8V14H9.1v-1.8Z",
};

export type AlertProps = {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  /** Extra controls at the end, e.g. a dismiss button. */
  action?: ReactNode;
  className?: string;
};

/** A callout. Errors are announced at once (role="alert"); other tones politely (role="status"). */
export function Alert({ tone = "info", title, children, action, className }: AlertProps) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={clsx("flex items-start gap-3 rounded-xl border px-4 py-3", tones[tone], className)}
    >
      <svg aria-hidden="true" viewBox="0 0 20 20" className="mt-0.5 size-5 shrink-0 fill-current">
        <path d={icons[tone]} />
      </svg>
      <div className="min-w-0 flex-1 text-sm leading-relaxed">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className={clsx(title && "mt-0.5")}>{children}</div> : null}
      </div>
      {action}
    </div>
  );
}
