import { Link, type LinkProps } from "react-router";
import clsx from "clsx";

export const textLinkClasses =
  "font-medium text-ink-900 underline decoration-coral-500 decoration-2 underline-offset-4 hover:decoration-ink-900 rounded-sm";

export function TextLink({ className, ...rest }: LinkProps) {
  return <Link className={clsx(textLinkClasses, typeof className === "string" ? className : undefined)} {...rest} />;
}
