import type { ReactNode } from "react";
import { Card } from "../../../components/ui";

export type AuthLayoutProps = { title: string; description?: ReactNode; children: ReactNode; footer?: ReactNode };

/** The frame around the account forms: one readable column, wide enough for a thumb on a phone. */
export function AuthLayout({ title, description, children, footer }: AuthLayoutProps) {
  return (
    <div className="mx-auto w-full max-w-lg">
      <Card className="px-5 py-7 sm:px-9 sm:py-9">
        <h1 className="text-2xl font-semibold tracking-tight sm:text-3xl">{title}</h1>
        {description ? <p className="mt-2 text-ink-500">{description}</p> : null}
        <div className="mt-7">{children}</div>
      </Card>
      {footer ? <div className="mt-6 text-center text-ink-600">{footer}</div> : null}
    </div>
  );
}
