import type { ButtonHTMLAttributes, ReactNode, Ref } from "react";
import { Link, type LinkProps } from "react-router";
import clsx from "clsx";
import { Spinner } from "./spinner";

export type ButtonVariant = "primary" | "accent" | "secondary" | "ghost" | "danger" | "on-dark";
export type ButtonSize = "md" | "lg" | "sm";

const base =
  "inline-flex select-none items-center justify-center gap-2 rounded-xl font-medium transition-colors " +
  "focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500 " +
  "disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-ink-900 text-sand-50 hover:bg-ink-700 active:bg-ink-800",
  accent: "bg-coral-500 text-ink-950 hover:bg-coral-400 active:bg-coral-600",
  secondary: "border-2 border-ink-900/15 bg-sand-50 text-ink-900 hover:border-ink-900/30 hover:bg-white",
  ghost: "text-ink-800 hover:bg-ink-900/5 active:bg-ink-900/10",
  danger: "bg-bad-600 text-white hover:bg-bad-800",
  "on-dark": "border border-sand-50/25 text-sand-50 hover:bg-sand-50/10 active:bg-sand-50/15",
};

// Every size keeps a touch target of at least 44 px.
const sizes: Record<ButtonSize, string> = {
  sm: "min-h-11 px-3 text-sm",
  md: "min-h-12 px-5 text-base",
  lg: "min-h-14 px-7 text-lg",
};

export function buttonClasses(variant: ButtonVariant = "primary", size: ButtonSize = "md", extra?: string): string {
  return clsx(base, variants[variant], sizes[size], extra);
}

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /**
   * Shows a spinner and announces the busy state; the button stays focusable but ignores clicks (`pending`).
   */
  loading?: boolean;
  /**
   * While an action runs: `aria-disabled`, not `disabled`, so a focused button keeps the focus (a disabled one drops
   * it on <body>); clicks and a form's Enter are ignored until it is done. `aria-disabled` given directly acts the same
   * (a control that cannot act now but should keep the focus, such as "Undo" with nothing left to undo).
   */
  pending?: boolean;
  /** Replaces the label while loading, e.g. "Signing in…". */
  loadingText?: ReactNode;
  fullWidth?: boolean;
  ref?: Ref<HTMLButtonElement>;
};

export function Button({
  variant = "primary",
  size = "md",
  loading = false,
  loadingText,
  fullWidth = false,
  className,
  children,
  disabled,
  pending = false,
  type = "button",
  onClick,
  ...rest
}: ButtonProps) {
  const ariaDisabled = rest["aria-disabled"];
  const inactive = pending || loading || ariaDisabled === true || ariaDisabled === "true";
  return (
    <button
      {...rest}
      type={type}
      className={buttonClasses(variant, size, clsx(fullWidth && "w-full", className))}
      disabled={disabled}
      aria-disabled={inactive || undefined}
      aria-busy={loading || undefined}
      onClick={(e) => {
        // preventDefault also stops a submit button's form (and a field's Enter, which clicks it).
        if (inactive) e.preventDefault();
        else onClick?.(e);
      }}
    >
      {loading ? <Spinner size="sm" label="" /> : null}
      {loading && loadingText ? loadingText : children}
    </button>
  );
}

export type ButtonLinkProps = LinkProps & { variant?: ButtonVariant; size?: ButtonSize; fullWidth?: boolean };

export function ButtonLink({ variant = "primary", size = "md", fullWidth = false, className, ...rest }: ButtonLinkProps) {
  return (
    <Link
      className={buttonClasses(variant, size, clsx(fullWidth && "w-full", typeof className === "string" ? className : undefined))}
      {...rest}
    />
  );
}
